import type { DryingForecast } from './wood/index';
import { z } from 'zod';
import { LIVE_EDGE, SLAB_STATUSES, type SlabStatus } from './slabs';
import { inchesInput } from './measure-input';

export const DEFECT_KINDS = ['check', 'bark-inclusion', 'void', 'insect-holes', 'other'] as const;
export const DEFECT_LABELS: Record<(typeof DEFECT_KINDS)[number], string> = {
  check: 'Check (end or surface crack)',
  'bark-inclusion': 'Bark inclusion',
  void: 'Void',
  'insect-holes': 'Insect holes',
  other: 'Other',
};

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

/** Whether a seller or admin may move a slab from `from` to `to` by editing it. */
export const canStaffMove = (from: SlabStatus, to: SlabStatus) => mayMoveSlab(from, to, 'yard');

/** The statuses a staff status select offers: the current one plus the legal next ones. */
export const staffStatusChoices = (from: SlabStatus): SlabStatus[] =>
  [from, ...SLAB_TRANSITIONS[from].filter((to) => canStaffMove(from, to))];


const shortText = (label: string, max: number) => z.string().max(max, `${label}: keep it under ${max} characters`);

export const figureSlugSchema = z.string().regex(/^[a-z][a-z0-9-]{0,39}$/, 'Use lower-case letters, digits and dashes');

export const defectSchema = z.object({
  kind: z.enum(DEFECT_KINDS, { error: `Defect kind must be one of ${DEFECT_KINDS.join(', ')}` }),
  note: shortText('Defect note', 300),
});

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
  .extend({ status: z.enum(SLAB_STATUSES, { error: `Status must be one of ${SLAB_STATUSES.join(', ')}` }).optional() })
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
  figureNotes: string; defects: { kind: (typeof DEFECT_KINDS)[number]; note: string }[]; description: string;
  priceOverrideReason: string | null; speciesRatePerBoardFootCents: number;
};
