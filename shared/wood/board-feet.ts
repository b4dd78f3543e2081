import { requirePositive, WoodMathError } from './errors';
import { roundHalfAwayFromZero } from './rounding';

export type BoardFeetInput = { thicknessIn: number; widthIn: number; lengthIn: number };
export type LumberTallyInput = { nominalQuarters: number; widthIn: number; lengthFt: number };

/** One board foot is 1 in × 12 in × 12 in = 144 in³ (hardwood grading rules' definition). */
export const CUBIC_INCHES_PER_BOARD_FOOT = 144;

/** Measured volume in board feet, unrounded: T × W × L(in) ÷ 144. */
export function boardFeet({ thicknessIn, widthIn, lengthIn }: BoardFeetInput): number {
  requirePositive(thicknessIn, 'thicknessIn');
  requirePositive(widthIn, 'widthIn');
  requirePositive(lengthIn, 'lengthIn');
  return (thicknessIn * widthIn * lengthIn) / CUBIC_INCHES_PER_BOARD_FOOT;
}

/** Board feet as shown to buyers and returned by the API: 2 decimals. */
export function roundBoardFeet(bf: number): number {
  return roundHalfAwayFromZero(bf, 2);
}

/**
 * A live-edge slab has no single width, so it is measured at several stations
 * along its length and the mean is used (common practice).
 */
export function averageWidthIn(widthsIn: number[]): number {
  if (!Array.isArray(widthsIn) || widthsIn.length === 0) {
    throw new WoodMathError('widthsIn needs at least one measured width', 'widthsIn');
  }
  widthsIn.forEach((w, i) => requirePositive(w, `widthsIn[${i}]`));
  return widthsIn.reduce((sum, w) => sum + w, 0) / widthsIn.length;
}

/**
 * The grading-rules tally, kept apart from measured volume: surface measure
 * (W in × L ft ÷ 12) rounded to the nearest whole foot, times the nominal
 * thickness in quarters ÷ 4; stock thinner than 4/4 tallies as 4/4.
 * Halves round up (from memory).
 */
export function lumberTallyBoardFeet({ nominalQuarters, widthIn, lengthFt }: LumberTallyInput): number {
  requirePositive(nominalQuarters, 'nominalQuarters');
  if (!Number.isInteger(nominalQuarters)) {
    throw new WoodMathError(`nominalQuarters must be a whole number of quarters (got ${nominalQuarters})`, 'nominalQuarters');
  }
  requirePositive(widthIn, 'widthIn');
  requirePositive(lengthFt, 'lengthFt');
  const surfaceMeasure = roundHalfAwayFromZero((widthIn * lengthFt) / 12, 0);
  return (surfaceMeasure * Math.max(nominalQuarters, 4)) / 4;
}
