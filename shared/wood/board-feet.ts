import { requireFinite, requireSize, WoodMathError } from './errors';
import { WOOD_LIMITS } from './limits';
import { roundHalfAwayFromZero } from './rounding';

export type BoardFeetInput = { thicknessIn: number; widthIn: number; lengthIn: number };
export type LumberTallyInput = { nominalQuarters: number; widthIn: number; lengthFt: number };

/** One board foot is 1 in × 12 in × 12 in = 144 in³ (hardwood grading rules' definition). */
export const CUBIC_INCHES_PER_BOARD_FOOT = 144;

/** Measured volume in board feet, unrounded: T × W × L(in) ÷ 144. */
export function boardFeet({ thicknessIn, widthIn, lengthIn }: BoardFeetInput): number {
  requireSize(thicknessIn, 'thicknessIn', WOOD_LIMITS.thicknessIn);
  requireSize(widthIn, 'widthIn', WOOD_LIMITS.widthIn);
  requireSize(lengthIn, 'lengthIn', WOOD_LIMITS.lengthIn);
  return (thicknessIn * widthIn * lengthIn) / CUBIC_INCHES_PER_BOARD_FOOT;
}

/** Board feet as shown to buyers and returned by the API: 2 decimals. */
export function roundBoardFeet(bf: number): number {
  requireFinite(bf, 'boardFeet');
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
  if (widthsIn.length > WOOD_LIMITS.widthStations) {
    throw new WoodMathError(`widthsIn may hold at most ${WOOD_LIMITS.widthStations} measured widths`, 'widthsIn');
  }
  widthsIn.forEach((w, i) => requireSize(w, `widthsIn[${i}]`, WOOD_LIMITS.widthIn));
  return widthsIn.reduce((sum, w) => sum + w, 0) / widthsIn.length;
}

/**
 * The grading-rules tally, kept apart from measured volume. The board-measure rule of the
 * hardwood grading rules: surface measure (W in × L ft ÷ 12) is rounded to the nearest whole
 * foot, a fraction of one half or more counting as the next foot, then multiplied by the
 * nominal thickness in quarters ÷ 4; stock thinner than 4/4 tallies as 4/4. (The half-up case
 * and the under-4/4 rule are common practice as stated here, from memory of the rules.)
 */
export function lumberTallyBoardFeet({ nominalQuarters, widthIn, lengthFt }: LumberTallyInput): number {
  requireSize(nominalQuarters, 'nominalQuarters', WOOD_LIMITS.nominalQuarters);
  if (!Number.isInteger(nominalQuarters)) {
    throw new WoodMathError(`nominalQuarters must be a whole number of quarters (got ${nominalQuarters})`, 'nominalQuarters');
  }
  requireSize(widthIn, 'widthIn', WOOD_LIMITS.widthIn);
  requireSize(lengthFt, 'lengthFt', WOOD_LIMITS.lengthFt);
  const surfaceMeasure = roundHalfAwayFromZero((widthIn * lengthFt) / 12, 0);
  return (surfaceMeasure * Math.max(nominalQuarters, 4)) / 4;
}
