import { requireAtMost, requireInRange, requireNonNegative, requireSize } from './errors';
import { WOOD_LIMITS } from './limits';
import { roundHalfAwayFromZero } from './rounding';

export type FlatteningInput = {
  thicknessIn: number;
  widthIn: number;
  lengthIn: number;
  /** Largest departure of a face from flat (cup plus twist), measured with straightedges or winding sticks. */
  deviationIn: number;
  passDepthIn?: number;
  minFinishedThicknessIn?: number;
};

export type FlatteningEstimate = {
  /** Depth actually cut from each face: its passes × the pass depth. */
  removedPerFaceIn: { first: number; second: number };
  /** Passes on each face. */
  passesPerFace: { first: number; second: number };
  passDepthIn: number;
  /** Starting thickness minus everything the passes remove. */
  finishedThicknessIn: number;
  /** All passes, both faces. */
  passes: number;
  faceAreaSqFt: number;
  feasible: boolean;
  reason?: string;
};

/** A router-sled pass of 1/8 in (common practice). */
export const DEFAULT_PASS_DEPTH_IN = 1 / 8;
/** Stickerline will not sell a flattened slab thinner than 1 in. */
export const DEFAULT_MIN_FINISHED_THICKNESS_IN = 1;

/** Area of one face in square feet: W × L ÷ 144. */
export function faceAreaSqFt(widthIn: number, lengthIn: number): number {
  requireSize(widthIn, 'widthIn', WOOD_LIMITS.widthIn);
  requireSize(lengthIn, 'lengthIn', WOOD_LIMITS.lengthIn);
  return (widthIn * lengthIn) / 144;
}

/**
 * Model (common practice): cup and twist bend the whole slab, so once the first
 * face is cut flat down to its low spot, the second face still carries the same
 * deviation and loses as much again ("flattening costs twice the cup"). Each
 * face also gets at least one pass, because a sawn face needs cleaning up.
 * The sled cuts whole passes, so each face loses passes × pass depth, and the
 * finished thickness is what those passes leave: passes × pass depth = stock removed.
 */
export function flatteningEstimate(input: FlatteningInput): FlatteningEstimate {
  const {
    thicknessIn, widthIn, lengthIn, deviationIn,
    passDepthIn = DEFAULT_PASS_DEPTH_IN,
    minFinishedThicknessIn = DEFAULT_MIN_FINISHED_THICKNESS_IN,
  } = input;
  requireSize(thicknessIn, 'thicknessIn', WOOD_LIMITS.thicknessIn);
  requireNonNegative(deviationIn, 'deviationIn');
  requireAtMost(deviationIn, 'deviationIn', WOOD_LIMITS.deviationIn, 'in');
  requireInRange(passDepthIn, 'passDepthIn', WOOD_LIMITS.minPassDepthIn, WOOD_LIMITS.maxPassDepthIn);
  requireSize(minFinishedThicknessIn, 'minFinishedThicknessIn', WOOD_LIMITS.thicknessIn);
  const area = faceAreaSqFt(widthIn, lengthIn);

  const perFace = Math.max(deviationIn, passDepthIn);
  // 1e-9 keeps 0.3 / 0.1 = 3.0000000000000004 from counting as 4 passes
  const passesPerFace = Math.ceil(perFace / passDepthIn - 1e-9);
  const removedPerFace = passesPerFace * passDepthIn;
  const finished = Math.max(0, thicknessIn - 2 * removedPerFace);
  const estimate: FlatteningEstimate = {
    removedPerFaceIn: { first: removedPerFace, second: removedPerFace },
    passesPerFace: { first: passesPerFace, second: passesPerFace },
    passDepthIn,
    finishedThicknessIn: finished,
    passes: passesPerFace * 2,
    faceAreaSqFt: area,
    feasible: finished >= minFinishedThicknessIn - 1e-9,
  };
  if (!estimate.feasible) {
    estimate.reason =
      `Flattening would leave about ${roundHalfAwayFromZero(finished, 2)} in, ` +
      `below the ${minFinishedThicknessIn} in minimum finished thickness.`;
  }
  return estimate;
}
