import type { DryingForecast, LiftingAdvice } from './wood/index';
import { z } from 'zod';
import type { MatchedSetView } from './matched-sets';
import { parseInches } from './wood/format';

export const SLAB_STATUSES = ['drying', 'ready', 'listed', 'held', 'sold', 'picked-up', 'withdrawn'] as const;
export type SlabStatus = (typeof SLAB_STATUSES)[number];

/** A slab in these statuses has been paid for: its price is the one its sale recorded, never recomputed. */
export const SOLD_STATUSES: readonly SlabStatus[] = ['sold', 'picked-up'];
export const isSold = (status: string) => (SOLD_STATUSES as readonly string[]).includes(status);

/** Statuses a visitor can see in the catalogue and on a slab page. */
export const PUBLIC_STATUSES: readonly SlabStatus[] = ['drying', 'ready', 'listed', 'held', 'sold', 'picked-up'];

export const AVAILABILITY = {
  available: ['listed', 'held'],
  upcoming: ['drying', 'ready'],
  all: ['drying', 'ready', 'listed', 'held'],
} as const satisfies Record<string, readonly SlabStatus[]>;

export const LIVE_EDGE = ['none', 'one', 'both'] as const;
export const LIVE_EDGE_LABELS: Record<(typeof LIVE_EDGE)[number], string> = {
  none: 'Square edges',
  one: 'Live edge, one side',
  both: 'Live edge, both sides',
};

export const SAWING_METHODS = ['flatsawn', 'quartersawn', 'through-and-through', 'live-edge-slabbing'] as const;
export const METER_KINDS = ['pin', 'pinless', 'oven-dry'] as const;

export const SLAB_SORTS = ['newest', 'price-asc', 'price-desc', 'board-feet-desc', 'board-feet-asc'] as const;
export const SLAB_SORT_LABELS: Record<(typeof SLAB_SORTS)[number], string> = {
  newest: 'Newest first',
  'price-asc': 'Price, low to high',
  'price-desc': 'Price, high to low',
  'board-feet-desc': 'Most board feet',
  'board-feet-asc': 'Fewest board feet',
};

/** Drying states as stored (the words for them live in shared/wood DRYING_STATES). */
export const DRYING_STATE_VALUES = ['green', 'air-drying', 'air-dry', 'shop-dry'] as const;

const emptyToUndefined = (v: unknown) => (v === '' ? undefined : v);

/**
 * The catalogue's filter names, as the filter boxes label them: every message about a filter
 * starts with the words the buyer sees beside it.
 */
export const CATALOGUE_FILTER_LABELS = {
  minThicknessIn: 'Thickness from',
  maxThicknessIn: 'Thickness to',
  minLengthIn: 'Length at least',
  minWidthIn: 'Width at least',
  maxPriceCents: 'Price up to',
} as const;
const L = CATALOGUE_FILTER_LABELS;

const filterInches = (label: string, max: number, thickness = false) =>
  z.preprocess((v, ctx) => {
    if (typeof v !== 'string' || v.trim() === '') return v;
    try {
      return parseInches(v, { thickness });
    } catch (e) {
      ctx.addIssue({ code: 'custom', message: `${label}: ${e instanceof Error ? e.message : 'not a size we can read.'}` });
      return v;
    }
  }, z.number({ error: `${label} must be a size in inches` })
    .min(0, `${label} cannot be below 0`)
    .max(max, `${label} must be at most ${max} in`)
    .optional());

/** Catalogue query: every value arrives as a string from the URL. Sizes may be written "2 1/4" or "8/4". */
export const slabListQuerySchema = z
  .object({
    species: z.string().regex(/^[a-z0-9-]{1,60}$/, 'Unknown species').optional(),
    minThicknessIn: filterInches(L.minThicknessIn, 48, true),
    maxThicknessIn: filterInches(L.maxThicknessIn, 48, true),
    minLengthIn: filterInches(L.minLengthIn, 1200),
    minWidthIn: filterInches(L.minWidthIn, 240),
    maxPriceCents: z.coerce.number({ error: `${L.maxPriceCents} must be an amount in dollars` }).int(`${L.maxPriceCents} must be whole cents`).min(0, `${L.maxPriceCents} cannot be below $0`).max(100_000_000, `${L.maxPriceCents} is more than any slab costs`).optional(),
    liveEdge: z.enum(['any', ...['none', 'one', 'both', 'yes']] as const, { error: 'Choose an edge from the list' }).optional(),
    dryingState: z.enum(DRYING_STATE_VALUES, { error: 'Choose a dryness from the list' }).optional(),
    availability: z.enum(['available', 'upcoming', 'all'], { error: 'Choose what to show from the list' }).default('available'),
    logId: z.coerce.number().int().positive().optional(),
    q: z.string().max(80, 'Search text is too long').optional(),
    sort: z.enum(SLAB_SORTS, { error: 'Choose a sort order from the list' }).default('newest'),
    page: z.coerce.number({ error: 'Page must be a number' }).int('Page must be a whole number').min(1, 'Page starts at 1').max(100000).default(1),
    pageSize: z.coerce.number({ error: 'Page size must be a number' }).int('Page size must be a whole number').min(1, 'Page size must be 1–100').max(100, 'Page size must be 1–100').default(24),
  })
  .strict()
  .refine((q) => q.minThicknessIn === undefined || q.maxThicknessIn === undefined || q.minThicknessIn <= q.maxThicknessIn, {
    path: ['maxThicknessIn'],
    message: `${L.minThicknessIn} is more than ${L.maxThicknessIn.toLowerCase()}`,
  });

/** Accepts raw URL params: empty strings are treated as absent. */
export function parseSlabListQuery(raw: Record<string, unknown>) {
  const cleaned = Object.fromEntries(Object.entries(raw).map(([k, v]) => [k, emptyToUndefined(v)]));
  return slabListQuerySchema.safeParse(cleaned);
}

export type SlabListQuery = z.infer<typeof slabListQuerySchema>;

export type SpeciesRef = { slug: string; name: string };

export type SlabListItem = {
  id: number;
  code: string;
  species: SpeciesRef;
  thicknessIn: number;
  widthIn: number;
  lengthIn: number;
  boardFeet: number;
  /** Asking price; for a sold slab the price it sold at, or null when no sale was recorded ("Sold"). */
  priceCents: number | null;
  status: SlabStatus;
  dryingState: string;
  moisturePercent: number | null;
  coverPhotoUrl: string | null;
  coverThumbUrl: string | null;
  liveEdge: (typeof LIVE_EDGE)[number];
  figures: string[];
  logId: number;
  sequenceInLog: number;
};

export type SlabListResponse = { items: SlabListItem[]; total: number; page: number; pageSize: number };

export type PriceLine = { code: string; label: string; amountCents: number };
export type PriceBreakdownView = { boardFeet: number; lines: PriceLine[]; slabCents: number; flatteningCents: number; totalCents: number };

export type SlabPhotoView = {
  id: number; displayUrl: string; thumbUrl: string; width: number; height: number;
  isCover: boolean; isIllustration: boolean; altText: string; position: number;
  /** Which side of the slab it shows (PHOTO_VIEWS in shared/photos.ts), or null. */
  view: string | null;
};

export type MoistureReadingView = {
  id: number; measuredOn: string; mcPercent: number; meterKind: string; location: string;
  depthIn: number | null; ambientTempF: number | null; ambientRhPercent: number | null;
};

export type LogNeighbour = {
  id: number; code: string; sequenceInLog: number; status: SlabStatus; thicknessIn: number;
  widthIn: number; lengthIn: number; priceCents: number | null; coverThumbUrl: string | null; isThisSlab: boolean;
};

export type SlabDetail = Omit<SlabListItem, 'species'> & {
  species: SpeciesRef & { botanicalName: string; ratePerBoardFootCents: number };
  widthsIn: number[];
  figureNotes: string;
  defects: { kind: string; note: string; fromButtIn?: number | null; face?: string | null }[];
  description: string;
  yardStack: string;
  yardPosition: string;
  priceOverrideReason: string | null;
  createdAt: string;
  listedAt: string | null;
  log: { id: number; code: string; originNote: string; felledOn: string | null; milledOn: string | null; sawingMethod: string; lengthIn: number };
  photos: SlabPhotoView[];
  moistureReadings: MoistureReadingView[];
  neighbours: LogNeighbour[];
  /** The book-matched set the yard marked this slab into (the one record of "book-matched"), or null. */
  matchedSet: MatchedSetView | null;
  /** How the price is worked out; for a sold slab the breakdown recorded at its sale (null when none was). */
  priceBreakdown: PriceBreakdownView | null;
  /** Estimated weight at the latest reading, or at the species' typical green MC when there is none. */
  weightLb: number;
  weightAtMcPercent: number;
  /** Whether the weight uses a reading or the typical green MC, and a sentence saying so. */
  weightBasis: 'reading' | 'typical-green';
  weightNote: string;
  lifting: LiftingAdvice;
  /** When the slab should reach the air-dry line, from its own readings (or the rule of thumb). */
  dryingForecast: DryingForecast;
  airDryReadyOn: string | null;
  targetMcPercent: number;
  flatteningPriceCents: number;
};

/** The price as a buyer reads it: "$1,234.00", "Sold for $1,234.00", or just "Sold". */
export function priceWords(status: string, priceCents: number | null, format: (cents: number) => string): string {
  if (!isSold(status)) return priceCents === null ? '' : format(priceCents);
  return priceCents === null ? 'Sold' : `Sold for ${format(priceCents)}`;
}

/** What each status means to a buyer, in Stickerline's words. */
export const STATUS_LABELS: Record<SlabStatus, string> = {
  drying: 'Still drying',
  ready: 'Dry — being readied',
  listed: 'For sale',
  held: 'On hold for a buyer',
  sold: 'Sold',
  'picked-up': 'Sold and collected',
  withdrawn: 'Withdrawn',
};

export const SAWING_METHOD_LABELS: Record<(typeof SAWING_METHODS)[number], string> = {
  flatsawn: 'Flatsawn',
  quartersawn: 'Quartersawn',
  'through-and-through': 'Through-and-through',
  'live-edge-slabbing': 'Live-edge slabbing',
};

