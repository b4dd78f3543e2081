import { z } from 'zod';
import { SAWING_METHODS, type SlabStatus } from './slabs';
import { inchesInput } from './measure-input';

/** Limits for a log record; a log longer than 100 ft or wider than 10 ft is a typing slip. */
export const LOG_LIMITS = { maxLengthIn: 1200, maxDiameterIn: 120, maxNoteChars: 1000 } as const;

export const LOG_CODE_PATTERN = /^[A-Z0-9][A-Z0-9-]{0,29}$/;

/** Rejects 2026-02-31, which Date would roll over into March. */
const isRealDate = (s: string) => {
  const d = new Date(`${s}T00:00:00Z`);
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === s;
};

const isoDate = (label: string) =>
  z.string().regex(/^\d{4}-\d{2}-\d{2}$/, `${label} must be a date (YYYY-MM-DD)`)
    .refine(isRealDate, `${label} is not a real date`);


const logFields = z.object({
  speciesSlug: z.string({ error: 'Choose a species' }).regex(/^[a-z0-9-]{1,60}$/, 'Choose a species'),
  code: z.string().trim().toUpperCase().regex(LOG_CODE_PATTERN, 'Use capital letters, digits and dashes (up to 30)').optional(),
  originNote: z.string().max(LOG_LIMITS.maxNoteChars, 'Keep the origin note under 1000 characters').optional(),
  felledOn: isoDate('Felled date').nullable().optional(),
  milledOn: isoDate('Milled date').nullable().optional(),
  lengthIn: inchesInput('Length', { max: LOG_LIMITS.maxLengthIn }),
  buttDiameterIn: inchesInput('Butt diameter', { max: LOG_LIMITS.maxDiameterIn }),
  topDiameterIn: inchesInput('Top diameter', { max: LOG_LIMITS.maxDiameterIn }),
  sawingMethod: z.enum(SAWING_METHODS, { error: `Sawing method must be one of ${SAWING_METHODS.join(', ')}` }),
  notes: z.string().max(LOG_LIMITS.maxNoteChars, 'Keep the notes under 1000 characters').optional(),
});

type LogFieldsPartial = Partial<z.infer<typeof logFields>>;

/** Cross-field checks, shared by create and update (update only checks fields it was given). */
function checkLog(v: LogFieldsPartial, ctx: z.RefinementCtx) {
  if (v.buttDiameterIn !== undefined && v.topDiameterIn !== undefined && v.topDiameterIn > v.buttDiameterIn) {
    ctx.addIssue({ code: 'custom', path: ['topDiameterIn'], message: 'The top (small end) cannot be wider than the butt' });
  }
  if (v.felledOn && v.milledOn && v.milledOn < v.felledOn) {
    ctx.addIssue({ code: 'custom', path: ['milledOn'], message: 'A log cannot be milled before it was felled' });
  }
}

export const createLogSchema = logFields.superRefine(checkLog);
export const updateLogSchema = logFields.partial().superRefine(checkLog);

export type CreateLogInput = z.input<typeof createLogSchema>;
export type CreateLog = z.output<typeof createLogSchema>;
export type UpdateLog = z.output<typeof updateLogSchema>;

export type LogSummary = {
  id: number;
  code: string;
  species: { slug: string; name: string };
  originNote: string;
  felledOn: string | null;
  milledOn: string | null;
  lengthIn: number;
  buttDiameterIn: number;
  topDiameterIn: number;
  sawingMethod: (typeof SAWING_METHODS)[number];
  notes: string;
  createdAt: string;
  slabCount: number;
};

export type LogSlab = {
  id: number; code: string; sequenceInLog: number; status: SlabStatus; thicknessIn: number;
  widthIn: number; lengthIn: number; boardFeet: number; priceCents: number; yardStack: string;
};

/** `targetMcPercent`: the mill's drying target, which the cut plan dries its slabs to. */
export type LogDetail = LogSummary & { slabs: LogSlab[]; targetMcPercent: number };
