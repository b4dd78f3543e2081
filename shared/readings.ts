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

const blankToUndefined = (v: unknown) => (v === '' || v === null ? undefined : v);

const number = (label: string, min: number, max: number) =>
  z.coerce
    .number({ error: `${label} must be a number` })
    .refine(Number.isFinite, `${label} must be a number`)
    .pipe(z.number().min(min, `${label} must be at least ${min}`).max(max, `${label} must be at most ${max}`));

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
  mcPercent: number('Moisture content', MC_LIMITS.min, MC_LIMITS.max),
  meterKind: z.enum(METER_KINDS, { error: 'Meter must be pin, pinless or oven-dry' }),
  location: z.string().trim().max(80, 'Keep the location under 80 characters').default(''),
  depthIn: optionalNumber('Depth', 0, 12),
  ambientTempF: optionalNumber('Air temperature', AMBIENT_TEMP_F_LIMITS.min, AMBIENT_TEMP_F_LIMITS.max),
  ambientRhPercent: optionalNumber('Relative humidity', 0, 100),
});

/** One reading for one slab (the slab comes from the URL). */
export const createReadingSchema = readingFieldsSchema.strict();
export const updateReadingSchema = readingFieldsSchema.partial();
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
  .refine((r) => r.slabId !== undefined || r.slabCode !== undefined, { path: ['slabCode'], message: 'Enter a slab code' });

export const batchReadingsSchema = z
  .object({
    readings: z.array(batchReadingRowSchema).min(1, 'Add at least one reading').max(BATCH_MAX_ROWS, `At most ${BATCH_MAX_ROWS} readings at once`),
  })
  .strict();
export type BatchReadingsInput = z.input<typeof batchReadingsSchema>;

export type ReadingView = {
  id: number; slabId: number; measuredOn: string; mcPercent: number; meterKind: MeterKind; location: string;
  depthIn: number | null; ambientTempF: number | null; ambientRhPercent: number | null; recordedBy: string | null; createdAt: string;
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
};
