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

export type FieldProblems = Record<string, string[]>;

/**
 * Dates a log record cannot have: felled or milled after today — today as the calendar reads at the
 * mill (MILL_TIME_ZONE), which the server passes in and the form gets from the server.
 * (Milled before felled is checked by the schema itself.)
 */
export function logDateProblems(v: { felledOn?: string | null; milledOn?: string | null }, millToday: string): FieldProblems {
  const out: FieldProblems = {};
  if (v.felledOn && v.felledOn > millToday) out.felledOn = [`A log cannot be felled in the future (today at the mill is ${millToday})`];
  if (v.milledOn && v.milledOn > millToday) out.milledOn = [`A log cannot be milled in the future (today at the mill is ${millToday})`];
  return out;
}

/**
 * How much wider than its log's butt diameter a slab may measure. A butt is usually measured a
 * little above the root flare, and the flare makes the end of a butt slab wider than that diameter
 * (common practice). 5 % is Stickerline's own allowance for it; anything wider is a typing slip or
 * the wrong log.
 */
export const FLARE_ALLOWANCE = 0.05;

export const widestSlabFor = (buttDiameterIn: number) => Math.round(buttDiameterIn * (1 + FLARE_ALLOWANCE) * 100) / 100;

type LogSize = { code: string; buttDiameterIn: number; lengthIn: number };

/** Field messages for a slab that could not have come out of `log`: wider than its butt (plus flare) or longer than it. */
export function slabFitsLog(slab: { widthsIn?: number[]; lengthIn?: number }, log: LogSize): FieldProblems {
  const out: FieldProblems = {};
  const widest = widestSlabFor(log.buttDiameterIn);
  (slab.widthsIn ?? []).forEach((w, i) => {
    if (w > widest) {
      out[`widthsIn.${i}`] = [`Wider than log ${log.code} allows: its butt is ${log.buttDiameterIn} in across (up to ${widest} in with flare)`];
    }
  });
  if (slab.lengthIn !== undefined && slab.lengthIn > log.lengthIn) {
    out.lengthIn = [`Longer than log ${log.code}, which is ${log.lengthIn} in long`];
  }
  return out;
}

/** Field messages for a log edit that its recorded slabs contradict (a slab wider than the new butt, longer than the new length). */
export function logFitsSlabs(log: { buttDiameterIn?: number; lengthIn?: number }, slabs: { widestIn: number | null; longestIn: number | null }): FieldProblems {
  const out: FieldProblems = {};
  if (log.buttDiameterIn !== undefined && slabs.widestIn !== null && slabs.widestIn > widestSlabFor(log.buttDiameterIn)) {
    out.buttDiameterIn = [`A slab from this log is ${slabs.widestIn} in wide; the butt must be at least ${Math.ceil((slabs.widestIn / (1 + FLARE_ALLOWANCE)) * 100) / 100} in across`];
  }
  if (log.lengthIn !== undefined && slabs.longestIn !== null && slabs.longestIn > log.lengthIn) {
    out.lengthIn = [`A slab from this log is ${slabs.longestIn} in long; the log cannot be shorter`];
  }
  return out;
}

/** The next code in the yard's yearly series: L-2026-01, L-2026-02 … given the codes of that year already used. */
export function nextLogCodeIn(year: string, usedCodes: string[]): string {
  const prefix = `L-${year}-`;
  const used = usedCodes.filter((c) => c.startsWith(prefix)).map((c) => Number(c.slice(prefix.length))).filter((n) => Number.isInteger(n));
  return `${prefix}${String(Math.max(0, ...used) + 1).padStart(2, '0')}`;
}

/** The year a new log is numbered in: its felling year, else this year at the mill. */
export const logCodeYear = (felledOn: string | null | undefined, millToday: string) => (felledOn || millToday).slice(0, 4);

export type NextLogCode = { code: string; millToday: string };
