import type { DryingForecast } from './wood/index';
import { z } from 'zod';
import { METER_KINDS } from './slabs';
import type { DryingState } from './wood/index';

export { METER_KINDS };
export type MeterKind = (typeof METER_KINDS)[number];

export const METER_KIND_LABELS: Record<MeterKind, string> = {
  pin: 'Pin meter',
  pinless: 'Pinless meter',
  'oven-dry': 'Oven-dry sample',
};

/** Oven-dry basis lets green wood pass 100 %; above 200 % is a misread in practice. */
export const MC_LIMITS = { min: 0, max: 200 } as const;
export const AMBIENT_TEMP_F_LIMITS = { min: -40, max: 130 } as const;
export const BATCH_MAX_ROWS = 100;

/**
 * What each kind of meter can actually read, % MC. A value outside its range is a misread, a wrong
 * meter setting or a typo, so it is refused.
 * - Pin (resistance) meters: about 6 % up to the fibre saturation point (~30 %), the scale running on to
 *   about 40 % with falling accuracy (from memory; USDA FPL Wood Handbook FPL-GTR-190 ch. 13 describes
 *   resistance meters as reliable only below fibre saturation).
 * - Pinless (dielectric) meters: about 5 % to 30 % (from memory).
 * - Oven-dry samples (ASTM D4442): water as a share of dry wood, so green wood can exceed 100 %; the
 *   upper bound is the species' maximum moisture content (checked on the server, which knows the
 *   species), and wood in air never reaches 0 % — the driest equilibrium in the Wood Handbook's EMC
 *   table is above 1 % (from memory).
 */
export const METER_MC_RANGES: Record<MeterKind, { min: number; max: number }> = {
  pin: { min: 6, max: 40 },
  pinless: { min: 5, max: 30 },
  'oven-dry': { min: 1, max: MC_LIMITS.max },
};

/** The message for a reading outside its meter's range (shared so the form and the server agree). */
export function meterRangeMessage(kind: MeterKind): string {
  const r = METER_MC_RANGES[kind];
  return kind === 'oven-dry'
    ? `An oven-dry moisture content must be at least ${r.min} %`
    : `A ${METER_KIND_LABELS[kind].toLowerCase()} reads from ${r.min} % to ${r.max} % — check the meter and the number`;
}

const blankToUndefined = (v: unknown) => (v === '' || v === null ? undefined : v);
/** '' and spaces mean "nothing typed": absent, never zero. Numeric text (from forms and scanners) becomes a number. */
const typedNumber = (v: unknown) => {
  if (v === null || v === undefined) return undefined;
  if (typeof v !== 'string') return v;
  const t = v.trim();
  if (t === '') return undefined;
  const n = Number(t.replace(',', '.'));
  return Number.isNaN(n) ? v : n;
};

const number = (label: string, min: number, max: number, requiredMessage = `Enter the ${label.toLowerCase()}`) =>
  z.preprocess(
    typedNumber,
    z.number({ error: (iss) => (iss.input === undefined ? requiredMessage : `${label} must be a number`) })
      .refine(Number.isFinite, `${label} must be a number`)
      .pipe(z.number().min(min, `${label} must be at least ${min}`).max(max, `${label} must be at most ${max}`)),
  );

const optionalNumber = (label: string, min: number, max: number) =>
  z.preprocess(blankToUndefined, number(label, min, max).optional());

/**
 * "Today" with the widest time-zone lead (UTC+14), so a reading taken this morning in any yard
 * is never refused as a future date by a server that still lives in yesterday.
 */
export function latestAllowedReadingDate(now = new Date()): string {
  return new Date(now.getTime() + 14 * 3_600_000).toISOString().slice(0, 10);
}

export const measuredOnSchema = z
  .string({ error: 'Enter the date of the reading' })
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Enter the date as YYYY-MM-DD')
  .refine((s) => !Number.isNaN(Date.parse(`${s}T00:00:00Z`)) && new Date(`${s}T00:00:00Z`).toISOString().startsWith(s), 'That is not a real date')
  .refine((s) => s <= latestAllowedReadingDate(), 'The reading date cannot be in the future')
  .refine((s) => s >= '1990-01-01', 'The reading date is too far in the past');

export const readingFieldsSchema = z.object({
  measuredOn: measuredOnSchema,
  mcPercent: number('Moisture content', MC_LIMITS.min, MC_LIMITS.max, 'Enter the moisture content the meter shows'),
  meterKind: z.enum(METER_KINDS, { error: 'Meter must be pin, pinless or oven-dry' }),
  location: z.string().trim().max(80, 'Keep the location under 80 characters').default(''),
  depthIn: optionalNumber('Depth', 0, 12),
  ambientTempF: optionalNumber('Air temperature', AMBIENT_TEMP_F_LIMITS.min, AMBIENT_TEMP_F_LIMITS.max),
  ambientRhPercent: optionalNumber('Relative humidity', 0, 100),
  /** Sent as true after the person was asked to confirm a reading that jumps from the slab's previous one. */
  confirmed: z.boolean().optional(),
});

type MeterCheckable = { mcPercent?: number; meterKind?: MeterKind };
/** Refuses a value the chosen meter cannot show (added to each schema: zod objects with checks cannot be extended). */
function checkMeterRange(r: MeterCheckable, ctx: z.RefinementCtx, path: (string | number)[] = ['mcPercent']) {
  if (r.mcPercent === undefined || r.meterKind === undefined) return;
  const range = METER_MC_RANGES[r.meterKind];
  if (r.mcPercent < range.min || r.mcPercent > range.max) ctx.addIssue({ code: 'custom', path, message: meterRangeMessage(r.meterKind) });
}

/** One reading for one slab (the slab comes from the URL). */
export const createReadingSchema = readingFieldsSchema.strict().superRefine((r, ctx) => checkMeterRange(r, ctx));
export const updateReadingSchema = readingFieldsSchema.partial().superRefine((r, ctx) => checkMeterRange(r, ctx));
export type CreateReadingInput = z.input<typeof createReadingSchema>;
export type CreateReading = z.output<typeof createReadingSchema>;

const slabCodeSchema = z.string().trim().min(1, 'Enter a slab code').max(40, 'That slab code is too long').transform((s) => s.toUpperCase());

/** A batch row names its slab by id (from a list) or by the code painted/tagged on it (typed or scanned). */
export const batchReadingRowSchema = readingFieldsSchema
  .extend({
    slabId: z.preprocess(blankToUndefined, z.coerce.number().int().positive('Unknown slab').optional()),
    slabCode: z.preprocess(blankToUndefined, slabCodeSchema.optional()),
  })
  .strict()
  .refine((r) => r.slabId !== undefined || r.slabCode !== undefined, { path: ['slabCode'], message: 'Enter a slab code' })
  .superRefine((r, ctx) => checkMeterRange(r, ctx));

export const batchReadingsSchema = z
  .object({
    readings: z.array(batchReadingRowSchema).min(1, 'Add at least one reading').max(BATCH_MAX_ROWS, `At most ${BATCH_MAX_ROWS} readings at once`),
  })
  .strict();
export type BatchReadingsInput = z.input<typeof batchReadingsSchema>;

/** in-line: followed plausibly from the previous reading; confirmed: jumped and was confirmed; unconfirmed: not shown to buyers. */
export const READING_REVIEWS = ['in-line', 'confirmed', 'unconfirmed'] as const;
export type ReadingReview = (typeof READING_REVIEWS)[number];

export type ReadingView = {
  id: number; slabId: number; measuredOn: string; mcPercent: number; meterKind: MeterKind; location: string;
  depthIn: number | null; ambientTempF: number | null; ambientRhPercent: number | null; recordedBy: string | null; createdAt: string;
  review: ReadingReview;
};

export type ReadingSaved = {
  reading: ReadingView;
  slab: { id: number; code: string; dryingState: DryingState; previousDryingState: string };
  targetMcPercent: number;
  /** Equilibrium MC for the air at the time, when temperature and humidity were both given. */
  emcPercent: number | null;
};

export type SlabReadings = {
  slab: { id: number; code: string; dryingState: string; thicknessIn: number; milledOn: string | null };
  items: ReadingView[];
  targetMcPercent: number;
  /** One year per inch of thickness from the milling date (common practice); null without a milling date. */
  airDryReadyOn: string | null;
  /** When the slab should reach the air-dry line, from its vouched-for readings (or the rule of thumb). */
  dryingForecast: DryingForecast;
};

/**
 * When a new reading must be confirmed by the person taking it, compared with the slab's previous
 * reading by date (common practice in a drying yard, Stickerline's own thresholds):
 * - a RISE of more than 5 points: rain wets a stickered slab's surface, but a bigger rise usually means
 *   a misread, a different meter setting or the wrong slab;
 * - a DROP faster than 2 points a day since the previous reading, after 3 points of allowance for the
 *   spread between meters and spots on one slab: air drying a thick slab is far slower than that.
 * A back-dated reading with no earlier one has nothing to jump from.
 */
export const READING_JUMP_RULE = { maxRisePoints: 5, maxDropPointsPerDay: 2, spreadAllowancePoints: 3 } as const;

export type PreviousReading = { measuredOn: string; mcPercent: number };

const dayNumber = (isoDate: string) => Math.round(Date.parse(`${isoDate}T00:00:00Z`) / 86_400_000);

/** A sentence asking for confirmation, or null when the reading follows plausibly from the previous one. */
export function readingJump(previous: PreviousReading | null, next: PreviousReading): string | null {
  if (!previous) return null;
  const rise = next.mcPercent - previous.mcPercent;
  const days = Math.max(0, dayNumber(next.measuredOn) - dayNumber(previous.measuredOn));
  const was = `the previous reading (${previous.mcPercent} % on ${previous.measuredOn})`;
  if (rise > READING_JUMP_RULE.maxRisePoints) {
    return `This is ${round1(rise)} points wetter than ${was}. Check the meter and the slab, then confirm if it is right.`;
  }
  const allowedDrop = READING_JUMP_RULE.spreadAllowancePoints + READING_JUMP_RULE.maxDropPointsPerDay * days;
  if (-rise > allowedDrop) {
    return `This is ${round1(-rise)} points drier than ${was} — faster than a slab dries. Check the meter and the slab, then confirm if it is right.`;
  }
  return null;
}
const round1 = (n: number) => Math.round(n * 10) / 10;

/** The answer (409) when a reading needs the person's confirmation; resend with `confirmed: true`. */
export const READING_JUMP_CODE = 'reading_needs_confirmation';

// --- moisture rounds by stack -------------------------------------------------------------------

/** Slabs still in the yard are read about once a month while they dry (common practice for air drying). */
export const ROUND_EVERY_DAYS = 30;
/** Statuses of slabs that still sit in a stack and are worth measuring. */
export const ROUND_STATUSES = ['drying', 'ready', 'listed', 'held'] as const;

export type YardStack = { stack: string; slabCount: number; oldestReadingOn: string | null; due: boolean };
export type RoundSlab = { id: number; code: string; speciesName: string; yardPosition: string; lastMcPercent: number | null; lastReadingOn: string | null };
export type MoistureRound = { stack: string; items: RoundSlab[] };

/** A stack is due when one of its slabs has no reading, or its oldest latest reading is a round old. */
export function isRoundDue(oldestReadingOn: string | null, hasUnread: boolean, today: string): boolean {
  if (hasUnread || !oldestReadingOn) return true;
  return (Date.parse(`${today}T00:00:00Z`) - Date.parse(`${oldestReadingOn}T00:00:00Z`)) / 86_400_000 >= ROUND_EVERY_DAYS;
}

/** Yard order within a stack: by position as written ("row 1, 3rd from top"), numbers compared as numbers. */
export const byYardPosition = (a: { yardPosition: string; code: string }, b: { yardPosition: string; code: string }) =>
  a.yardPosition.localeCompare(b.yardPosition, 'en', { numeric: true, sensitivity: 'base' }) || a.code.localeCompare(b.code, 'en', { numeric: true });
