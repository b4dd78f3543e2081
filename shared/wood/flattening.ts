import { requireNonNegative, requirePositive } from './errors';
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
  removedPerFaceIn: { first: number; second: number };
  finishedThicknessIn: number;
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
  requirePositive(widthIn, 'widthIn');
  requirePositive(lengthIn, 'lengthIn');
  return (widthIn * lengthIn) / 144;
}

/**
 * Model (common practice): cup and twist bend the whole slab, so once the first
 * face is cut flat down to its low spot, the second face still carries the same
 * deviation and loses as much again ("flattening costs twice the cup"). Each
 * face also gets at least one pass, because a sawn face needs cleaning up.
 * Passes are counted per face and summed.
 */
export function flatteningEstimate(input: FlatteningInput): FlatteningEstimate {
  const {
    thicknessIn, widthIn, lengthIn, deviationIn,
    passDepthIn = DEFAULT_PASS_DEPTH_IN,
    minFinishedThicknessIn = DEFAULT_MIN_FINISHED_THICKNESS_IN,
  } = input;
  requirePositive(thicknessIn, 'thicknessIn');
  requireNonNegative(deviationIn, 'deviationIn');
  requirePositive(passDepthIn, 'passDepthIn');
  requirePositive(minFinishedThicknessIn, 'minFinishedThicknessIn');
  const area = faceAreaSqFt(widthIn, lengthIn);

  const perFace = Math.max(deviationIn, passDepthIn);
  // 1e-9 keeps 0.3 / 0.1 = 3.0000000000000004 from counting as 4 passes
  const passesPerFace = Math.ceil(perFace / passDepthIn - 1e-9);
  const finished = Math.max(0, thicknessIn - 2 * perFace);
  const estimate: FlatteningEstimate = {
    removedPerFaceIn: { first: perFace, second: perFace },
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
