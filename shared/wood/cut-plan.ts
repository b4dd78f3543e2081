import { requireAtMost, requireInRange, requireNonNegative, requireSize } from './errors';
import { WOOD_LIMITS } from './limits';
import { dimensionalChangeIn } from './shrinkage';
import { DEFAULT_MIN_FINISHED_THICKNESS_IN, DEFAULT_PASS_DEPTH_IN } from './flattening';
import { FIBER_SATURATION_MC } from './moisture';

/** A chainsaw mill's kerf, about 3/8 in (common practice); a bandsaw mill takes nearer 1/8 in. */
export const CHAINSAW_KERF_IN = 0.375;
/** One cleanup pass per face (common practice), the same pass depth as the flattening estimate. */
export const DEFAULT_FLATTEN_ALLOWANCE_IN = 2 * DEFAULT_PASS_DEPTH_IN;

export type CutPlanInput = {
  diameterIn: number;
  greenThicknessIn: number;
  kerfIn?: number;
  speciesSlug: string;
  sawingMethod?: string;
  /** Thickness lost to flattening both faces; defaults to one pass per face. */
  flattenAllowanceIn?: number;
  /** Moisture content the slabs are dried to; defaults to 8 % for indoor furniture. */
  dryToMcPercent?: number;
};

export type PlannedSlab = {
  index: number;
  /** Distance of the slab's centre line from the pith, signed (negative = first side sawn). */
  offsetIn: number;
  greenThicknessIn: number;
  /** Chord of the log's circle at the slab's centre line. */
  widthIn: number;
  /** Chord at the face farther from the pith: the width both faces share. */
  narrowFaceWidthIn: number;
  driedThicknessIn: number;
  flattenedThicknessIn: number;
  /** False when flattening would leave less than the mill's 1 in minimum. */
  flattenable: boolean;
  containsPith: boolean;
};

export type CutPlan = {
  count: number;
  slabs: PlannedSlab[];
  kerfCuts: number;
  kerfTotalIn: number;
  /** Share of the log's end-grain area turned into sawdust by the kerfs. */
  kerfAreaPercent: number;
  /** Wood left over at the two outer edges, split evenly. */
  offcutEachSideIn: number;
  thicknessShrinkDirection: 'radial' | 'tangential';
  shrinkageNote: string;
};

const chord = (radius: number, d: number) => (Math.abs(d) >= radius ? 0 : 2 * Math.sqrt(radius * radius - d * d));

/** Area of the circle between the centre line and a parallel line at distance d (integral of the chord). */
const halfStripArea = (r: number, d: number) => {
  const x = Math.max(-r, Math.min(r, d));
  return x * Math.sqrt(r * r - x * x) + r * r * Math.asin(x / r);
};

/**
 * Slabs sawn across a log's diameter, centred so the pith falls mid-log, as a plan before cutting:
 * n = floor((D + kerf) / (t + kerf)) because n slabs need n·t + (n − 1)·kerf ≤ D. Each slab's width is
 * the chord of the circle at its position. Drying shrinks the thickness of a flatsawn slab radially
 * (the faces lie along the rings), a quartersawn slab's tangentially; the shrinkage comes from the
 * Wood Handbook green-to-dry values via dimensionalChangeIn. Flattening then takes an allowance.
 */
export function cutPlan(input: CutPlanInput): CutPlan {
  const {
    diameterIn, greenThicknessIn, kerfIn = CHAINSAW_KERF_IN, speciesSlug, sawingMethod,
    flattenAllowanceIn = DEFAULT_FLATTEN_ALLOWANCE_IN, dryToMcPercent = 8,
  } = input;
  requireSize(diameterIn, 'diameterIn', WOOD_LIMITS.diameterIn);
  requireSize(greenThicknessIn, 'greenThicknessIn', WOOD_LIMITS.thicknessIn);
  requireNonNegative(kerfIn, 'kerfIn');
  requireAtMost(kerfIn, 'kerfIn', WOOD_LIMITS.kerfIn, 'in');
  requireNonNegative(flattenAllowanceIn, 'flattenAllowanceIn');
  requireAtMost(flattenAllowanceIn, 'flattenAllowanceIn', WOOD_LIMITS.thicknessIn, 'in');
  requireInRange(dryToMcPercent, 'dryToMcPercent', 0, FIBER_SATURATION_MC);

  const r = diameterIn / 2;
  const count = Math.floor((diameterIn + kerfIn) / (greenThicknessIn + kerfIn) + 1e-9);
  const used = count * greenThicknessIn + Math.max(0, count - 1) * kerfIn;
  const start = -used / 2;
  const direction = sawingMethod === 'quartersawn' ? 'tangential' : 'radial';
  // dimensionalChangeIn names the grain of a board's width: a flatsawn width moves tangentially,
  // a quartersawn width radially. A slab's thickness runs the other way round.
  const driedThicknessIn = greenThicknessIn + dimensionalChangeIn({
    dimensionIn: greenThicknessIn, speciesSlug, grain: direction === 'radial' ? 'quartersawn' : 'flatsawn',
    fromMcPercent: FIBER_SATURATION_MC, toMcPercent: dryToMcPercent,
  });
  const flattenedThicknessIn = Math.max(0, driedThicknessIn - flattenAllowanceIn);

  const slabs: PlannedSlab[] = [];
  let kerfArea = 0;
  for (let i = 0; i < count; i++) {
    const near = start + i * (greenThicknessIn + kerfIn);
    const far = near + greenThicknessIn;
    const offsetIn = (near + far) / 2;
    const outer = Math.abs(near) > Math.abs(far) ? near : far;
    slabs.push({
      index: i + 1, offsetIn, greenThicknessIn, widthIn: chord(r, offsetIn), narrowFaceWidthIn: chord(r, outer),
      driedThicknessIn, flattenedThicknessIn, flattenable: flattenedThicknessIn >= DEFAULT_MIN_FINISHED_THICKNESS_IN - 1e-9,
      containsPith: near <= 0 && far >= 0,
    });
    if (i < count - 1) kerfArea += halfStripArea(r, far + kerfIn) - halfStripArea(r, far);
  }
  const kerfCuts = Math.max(0, count - 1);
  return {
    count, slabs, kerfCuts, kerfTotalIn: kerfCuts * kerfIn,
    kerfAreaPercent: (kerfArea / (Math.PI * r * r)) * 100,
    offcutEachSideIn: (diameterIn - used) / 2,
    thicknessShrinkDirection: direction,
    shrinkageNote: direction === 'radial'
      ? 'A flatsawn slab’s thickness runs across the growth rings, so it shrinks by the species’ radial shrinkage (Wood Handbook Table 4-3, scaled below fiber saturation).'
      : 'A quartersawn slab’s thickness runs along the growth rings, so it shrinks by the species’ tangential shrinkage (Wood Handbook Table 4-3, scaled below fiber saturation).',
  };
}
