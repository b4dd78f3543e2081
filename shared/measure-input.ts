import { z } from 'zod';
import { parseDollarsToCents, parseInches, WoodMathError } from './wood/index';

/**
 * Sizes and money as forms and URLs send them. Each box is text, read once here by the shared
 * parsers, so the browser's form and the server's route accept exactly the same writing
 * ("2 1/4", "2-1/4", "8/4" for a thickness, "$1,000"). A number passes through unchanged.
 */

type InchesOptions = { max: number; thickness?: boolean };

const readInches = (thickness: boolean) => (value: unknown, ctx: z.RefinementCtx) => {
  if (typeof value !== 'string') return value;
  if (value.trim() === '') return undefined;
  try {
    return parseInches(value, { thickness });
  } catch (e) {
    ctx.addIssue({ code: 'custom', message: e instanceof WoodMathError ? e.message : 'That size could not be read.' });
    return value;
  }
};

const inchNumber = (label: string, { max }: InchesOptions) =>
  z.number({ error: `Enter the ${label.toLowerCase()} in inches` })
    .positive(`${label} must be more than 0`)
    .max(max, `${label} must be at most ${max} in`);

/** A required inch size. */
export const inchesInput = (label: string, options: InchesOptions) =>
  z.preprocess(readInches(options.thickness ?? false), inchNumber(label, options));

/** An inch size that may be left empty (filters). */
export const optionalInchesInput = (label: string, options: InchesOptions) =>
  z.preprocess(readInches(options.thickness ?? false), inchNumber(label, options).optional());

/** Whole cents from what a person types as dollars ("1000.50", "$1,000"); a number is taken as cents already. */
export const dollarsInput = (label: string) =>
  z.preprocess((value: unknown, ctx) => {
    if (typeof value !== 'string') return value;
    if (value.trim() === '') return undefined;
    try {
      return parseDollarsToCents(value);
    } catch (e) {
      ctx.addIssue({ code: 'custom', message: e instanceof WoodMathError ? e.message : `${label} could not be read.` });
      return value;
    }
  }, z.number({ error: `Enter the ${label.toLowerCase()}` }).int(`${label} must be whole cents`));
