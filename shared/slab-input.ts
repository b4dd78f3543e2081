import type { DryingForecast } from './wood/index';
import { z } from 'zod';
import { parseInches, WoodMathError } from './wood/index';
import { LIVE_EDGE, SLAB_STATUSES, type SlabStatus } from './slabs';
import { inchesInput } from './measure-input';

/** What a buyer should know about before cutting; the yard records where each one is. Trade terms. */
export const DEFECT_KINDS = [
  'knot', 'loose-knot', 'check', 'shake', 'wane', 'pith', 'rot', 'insect-holes', 'embedded-metal', 'bark-inclusion', 'void', 'other',
] as const;
export type DefectKind = (typeof DEFECT_KINDS)[number];
export const DEFECT_LABELS: Record<DefectKind, string> = {
  knot: 'Knot (sound)',
  'loose-knot': 'Loose knot',
  check: 'Check (end or surface crack)',
  shake: 'Shake (split along the growth rings)',
  wane: 'Wane (bark or missing wood on an edge)',
  pith: 'Pith (the tree’s centre)',
  rot: 'Rot or soft spot',
  'insect-holes': 'Insect holes',
  'embedded-metal': 'Embedded metal (nail, wire, shot)',
  'bark-inclusion': 'Bark inclusion',
  void: 'Void',
  other: 'Other',
};
/** Which side of the slab a defect shows on. */
export const DEFECT_FACES = ['top', 'bottom', 'edge', 'end', 'through'] as const;
export type DefectFace = (typeof DEFECT_FACES)[number];
export const DEFECT_FACE_LABELS: Record<DefectFace, string> = {
  top: 'top face', bottom: 'bottom face', edge: 'edge', end: 'end', through: 'through both faces',
};

export type SlabDefectInput = { kind: DefectKind; note: string; fromButtIn?: number | null; face?: DefectFace | null };

/** One defect in plain words, e.g. "Loose knot, top face, 34 in from the butt end — about 1 in across". */
export function describeDefect(d: { kind: string; note: string; fromButtIn?: number | null; face?: string | null }, length: (inches: number) => string): string {
  const label = (DEFECT_LABELS as Record<string, string>)[d.kind] ?? 'Other';
  const parts = [label.replace(/ \(.*\)$/, '')];
  if (d.face) parts.push((DEFECT_FACE_LABELS as Record<string, string>)[d.face] ?? '');
  if (d.fromButtIn !== undefined && d.fromButtIn !== null) parts.push(`${length(d.fromButtIn)} from the butt end`);
  const where = parts.filter(Boolean).join(', ');
  return d.note ? `${where} — ${d.note}` : where;
}

export const SLAB_LIMITS = {
  minStations: 2, maxStations: 8, maxThicknessIn: 12, maxWidthIn: 120, maxLengthIn: 600,
  maxPriceCents: 10_000_000, maxFigures: 10, maxDefects: 20,
} as const;

/**
 * What makes a slab change state: the yard crew editing it, a buyer's hold, a hold ending
 * (released, expired or let go by the office), a paid checkout, the hand-over at pickup, a refund.
 */
export const SLAB_MOVE_CAUSES = ['yard', 'hold', 'hold-ended', 'sale', 'pickup', 'refund'] as const;
export type SlabMoveCause = (typeof SLAB_MOVE_CAUSES)[number];

/**
 * The one table of allowed moves: from → to → what may make that move. The server's slab-state
 * module moves slabs through this table and nothing else writes a slab's status. Staff move slabs
 * between drying, ready, listed and withdrawn; `held`, `sold` and `picked-up` are reached only
 * through holds, checkout and pickup; a refund puts a sold or collected slab back on sale or
 * withdraws it.
 */
export const SLAB_MOVES: { readonly [F in SlabStatus]: { readonly [T in SlabStatus]?: readonly SlabMoveCause[] } } = {
  drying: { ready: ['yard'], withdrawn: ['yard'] },
  ready: { listed: ['yard'], withdrawn: ['yard'] },
  listed: { ready: ['yard'], held: ['hold'], withdrawn: ['yard'] },
  held: { listed: ['hold-ended'], sold: ['sale'] },
  sold: { 'picked-up': ['pickup'], listed: ['refund'], withdrawn: ['refund'] },
  'picked-up': { listed: ['refund'], withdrawn: ['refund'] },
  withdrawn: { drying: ['yard'], ready: ['yard'] },
};

/** The states a new slab may start in. */
export const SLAB_START_STATUSES = ['drying', 'ready'] as const satisfies readonly SlabStatus[];

/** Whether `cause` may move a slab from `from` to `to`. */
export const mayMoveSlab = (from: SlabStatus, to: SlabStatus, cause: SlabMoveCause) =>
  SLAB_MOVES[from][to]?.includes(cause) ?? false;

/** Every state a slab may be reached from by `cause` (what the conditional update matches on). */
export const slabMoveSources = (to: SlabStatus, cause: SlabMoveCause): SlabStatus[] =>
  SLAB_STATUSES.filter((from) => mayMoveSlab(from, to, cause));

/** Next states from `from`, whatever the cause (read from SLAB_MOVES). */
export const SLAB_TRANSITIONS = Object.fromEntries(
  SLAB_STATUSES.map((from) => [from, Object.keys(SLAB_MOVES[from]) as SlabStatus[]]),
) as unknown as Record<SlabStatus, readonly SlabStatus[]>;

/** Status names as the yard crew reads them (buyers see their own wording on the slab page). */
export const YARD_STATUS_LABELS: Record<SlabStatus, string> = {
  drying: 'Drying on sticks',
  ready: 'Dry, not yet for sale',
  listed: 'For sale',
  held: 'Held for a buyer',
  sold: 'Sold, awaiting pickup',
  'picked-up': 'Collected',
  withdrawn: 'Withdrawn',
};

/**
 * Listing a slab that reads more than this many points of moisture content above the mill's target
 * asks for a second "yes": furniture built from it will still shrink and may check. Stickerline's
 * own threshold, not a trade rule.
 */
export const WET_LISTING_MARGIN_POINTS = 4;
export const isWellAboveTarget = (mcPercent: number, targetMcPercent: number) => mcPercent > targetMcPercent + WET_LISTING_MARGIN_POINTS;
export const wetListingMessage = (mcPercent: number, targetMcPercent: number) =>
  `This slab last read ${mcPercent} % moisture content, well above the mill's target of ${targetMcPercent} %. `
  + 'Furniture made from it may still shrink or check. Confirm to list it anyway.';

/** Whether a seller or admin may move a slab from `from` to `to` by editing it. */
export const canStaffMove = (from: SlabStatus, to: SlabStatus) => mayMoveSlab(from, to, 'yard');

/** The statuses a staff status select offers: the current one plus the legal next ones. */
export const staffStatusChoices = (from: SlabStatus): SlabStatus[] =>
  [from, ...SLAB_TRANSITIONS[from].filter((to) => canStaffMove(from, to))];


const shortText = (label: string, max: number) => z.string().max(max, `${label}: keep it under ${max} characters`);

export const figureSlugSchema = z.string().regex(/^[a-z][a-z0-9-]{0,39}$/, 'Use lower-case letters, digits and dashes');

export const defectSchema = z.object({
  kind: z.enum(DEFECT_KINDS, { error: 'Choose the kind of defect from the list' }),
  note: shortText('Defect note', 300),
  // Typed like every other size ("34", "34 1/2"); an empty box means "not measured".
  fromButtIn: z.preprocess((value, ctx) => {
    if (value === '' || value === undefined) return null;
    if (typeof value !== 'string') return value;
    try {
      return parseInches(value);
    } catch (e) {
      ctx.addIssue({ code: 'custom', message: e instanceof WoodMathError ? e.message : 'That distance could not be read.' });
      return value;
    }
  }, z.number({ error: 'Distance from the butt end must be a number of inches' })
    .min(0, 'Distance from the butt end cannot be negative').max(SLAB_LIMITS.maxLengthIn, `Distance from the butt end must be at most ${SLAB_LIMITS.maxLengthIn} in`)
    .nullable()).optional(),
  face: z.enum(DEFECT_FACES, { error: 'Choose the face from the list' }).nullable().optional(),
});

/** A defect's distance from the butt end must fall on the slab. */
export function defectsOffTheSlab(defects: { fromButtIn?: number | null }[] | undefined, lengthIn: number): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  defects?.forEach((d, i) => {
    if (d.fromButtIn != null && d.fromButtIn > lengthIn) out[`defects.${i}.fromButtIn`] = [`The slab is only ${lengthIn} in long`];
  });
  return out;
}

const slabFields = z.object({
  logId: z.number({ error: 'Choose the log this slab came from' }).int().positive('Choose the log this slab came from'),
  sequenceInLog: z.number({ error: 'Sequence must be a number' }).int('Sequence must be a whole number').min(1, 'Sequence starts at 1').max(999),
  thicknessIn: inchesInput('Thickness', { max: SLAB_LIMITS.maxThicknessIn, thickness: true }),
  widthsIn: z.array(inchesInput('Width', { max: SLAB_LIMITS.maxWidthIn }), { error: 'Measure the width at 2 to 8 stations' })
    .min(SLAB_LIMITS.minStations, 'Measure the width at 2 to 8 stations along the slab')
    .max(SLAB_LIMITS.maxStations, 'Measure the width at no more than 8 stations'),
  lengthIn: inchesInput('Length', { max: SLAB_LIMITS.maxLengthIn }),
  liveEdge: z.enum(LIVE_EDGE, { error: 'Live edge must be none, one or both' }),
  figures: z.array(figureSlugSchema).max(SLAB_LIMITS.maxFigures, 'Up to 10 figures'),
  figureNotes: shortText('Figure notes', 1000),
  defects: z.array(defectSchema).max(SLAB_LIMITS.maxDefects, 'Up to 20 defects'),
  yardStack: shortText('Stack', 40),
  yardPosition: shortText('Position', 40),
  priceOverrideCents: z.number({ error: 'Price must be a number of cents' }).int('Price must be whole cents')
    .min(1, 'Price must be more than 0').max(SLAB_LIMITS.maxPriceCents, 'Price is too high').nullable(),
  priceOverrideReason: shortText('Reason', 300).nullable(),
  description: shortText('Description', 4000),
});

type SlabFieldsPartial = Partial<z.infer<typeof slabFields>>;

/** A set price needs a reason, so the office can see why the formula was overruled. */
function checkOverride(v: SlabFieldsPartial, ctx: z.RefinementCtx) {
  if (v.priceOverrideCents != null && !v.priceOverrideReason?.trim()) {
    ctx.addIssue({ code: 'custom', path: ['priceOverrideReason'], message: 'Say why the price is set by hand' });
  }
}

export const createSlabSchema = slabFields
  .partial({
    sequenceInLog: true, liveEdge: true, figures: true, figureNotes: true, defects: true, yardStack: true,
    yardPosition: true, priceOverrideCents: true, priceOverrideReason: true, description: true,
  })
  .extend({ status: z.enum(SLAB_START_STATUSES, { error: 'A new slab starts as drying or ready' }).optional() })
  .superRefine(checkOverride);

export const updateSlabSchema = slabFields.omit({ logId: true }).partial()
  .extend({
    status: z.enum(SLAB_STATUSES, { error: `Status must be one of ${SLAB_STATUSES.join(', ')}` }).optional(),
    /** The person saw the "well above target MC" warning and lists the slab anyway. */
    confirmAboveTargetMc: z.literal(true, { error: 'Send true to confirm' }).optional(),
  })
  .superRefine(checkOverride);

export type CreateSlab = z.output<typeof createSlabSchema>;
export type UpdateSlab = z.output<typeof updateSlabSchema>;

export const createFigureKindSchema = z.object({
  slug: figureSlugSchema,
  label: z.string().trim().min(1, 'Give the figure a name').max(60),
  premiumMultiplier: z.number({ error: 'Multiplier must be a number' }).min(0.5, 'At least 0.5').max(5, 'At most 5'),
});
export type CreateFigureKind = z.output<typeof createFigureKindSchema>;
export type FigureKind = CreateFigureKind;

export const BULK_ACTIONS = ['list', 'withdraw', 'move'] as const;
export const bulkSlabActionSchema = z.object({
  ids: z.array(z.number().int().positive()).min(1, 'Choose at least one slab').max(200, 'Up to 200 slabs at once'),
  action: z.enum(BULK_ACTIONS, { error: 'Action must be list, withdraw or move' }),
  stack: shortText('Stack', 40).trim().min(1, 'Name the stack to move to').optional(),
}).superRefine((v, ctx) => {
  if (v.action === 'move' && !v.stack) ctx.addIssue({ code: 'custom', path: ['stack'], message: 'Name the stack to move to' });
});
export type BulkSlabAction = z.output<typeof bulkSlabActionSchema>;
export type BulkResult = { id: number; ok: boolean; status?: SlabStatus; code?: string; message?: string };

export const YARD_SORTS = [
  'code', 'species', 'log', 'sequenceInLog', 'status', 'dryingState', 'thicknessIn', 'widthIn', 'lengthIn',
  'boardFeet', 'priceCents', 'yardStack', 'moisturePercent', 'photoCount', 'createdAt', 'updatedAt', 'listedAt',
  'airDryExpectedOn',
] as const;
export type YardSort = (typeof YARD_SORTS)[number];

const blankToUndefined = (v: unknown) => (v === '' ? undefined : v);

/** Inventory query, as it arrives from the URL: all strings. */
export const yardSlabQuerySchema = z.object({
  status: z.preprocess(blankToUndefined, z.string().optional()).transform((s, ctx) => {
    if (!s) return undefined;
    const list = s.split(',').filter(Boolean);
    const bad = list.filter((x) => !(SLAB_STATUSES as readonly string[]).includes(x));
    if (bad.length) ctx.addIssue({ code: 'custom', message: `Unknown status: ${bad.join(', ')}` });
    return list as SlabStatus[];
  }),
  species: z.preprocess(blankToUndefined, z.string().regex(/^[a-z0-9-]{1,60}$/, 'Unknown species').optional()),
  log: z.preprocess(blankToUndefined, z.coerce.number().int().positive('Log must be a log id').optional()),
  stack: z.preprocess(blankToUndefined, z.string().max(40).optional()),
  q: z.preprocess(blankToUndefined, z.string().max(80, 'Search text is too long').optional()),
  sort: z.preprocess(blankToUndefined, z.enum(YARD_SORTS, { error: `Sort must be one of ${YARD_SORTS.join(', ')}` }).default('code')),
  dir: z.preprocess(blankToUndefined, z.enum(['asc', 'desc'], { error: 'Direction must be asc or desc' }).default('asc')),
  page: z.preprocess(blankToUndefined, z.coerce.number().int().min(1, 'Page starts at 1').max(100000).default(1)),
  pageSize: z.preprocess(blankToUndefined, z.coerce.number().int().min(1, 'Page size must be 1–200').max(200, 'Page size must be 1–200').default(50)),
});
export type YardSlabQuery = z.output<typeof yardSlabQuerySchema>;

export type YardSlabRow = {
  id: number; code: string; species: { slug: string; name: string }; logId: number; logCode: string;
  sequenceInLog: number; status: SlabStatus; dryingState: string; thicknessIn: number; widthIn: number;
  widthsIn: number[]; lengthIn: number; boardFeet: number; priceCents: number; priceOverrideCents: number | null;
  yardStack: string; yardPosition: string; liveEdge: string; figures: string[];
  moisturePercent: number | null; lastReadingOn: string | null; photoCount: number;
  createdAt: string; updatedAt: string; listedAt: string | null;
  /** When the slab should reach the air-dry line, from its readings (or the rule of thumb); null until worked out. */
  airDry: YardDryingForecast | null;
};
export type YardDryingForecast = Pick<DryingForecast, 'expectedOn' | 'earliestOn' | 'latestOn' | 'basis' | 'method'>;
export type YardSlabPage = { items: YardSlabRow[]; total: number; page: number; pageSize: number; counts: Record<SlabStatus, number> };

/** A slab as the staff form edits it. */
export type YardSlabDetail = YardSlabRow & {
  figureNotes: string; defects: SlabDefectInput[]; description: string;
  priceOverrideReason: string | null; speciesRatePerBoardFootCents: number;
};
