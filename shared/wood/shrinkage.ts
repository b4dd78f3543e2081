import { requireSize, WoodMathError } from './errors';
import { WOOD_LIMITS } from './limits';
import { FIBER_SATURATION_MC } from './moisture';
import { getSpecies, requireSpeciesMoistureContent } from './species';

export type Grain = 'flatsawn' | 'quartersawn';

export type DimensionalChangeInput = {
  dimensionIn: number;
  speciesSlug: string;
  grain: Grain;
  fromMcPercent: number;
  toMcPercent: number;
};

export type DimensionalChangeDetail = {
  /** Signed: negative means the piece gets smaller. */
  changeIn: number;
  /** New size ÷ old size. */
  ratio: number;
  method: 'shrinkage-from-green';
  /** Plain-words statement of the model and its source, for the page. */
  note: string;
};

/** The span in which the handbook's linear coefficients hold (WH2010 ch. 13, Table 13-5); used for cross-checks only. */
export const COEFFICIENT_MC_RANGE = { min: 6, max: 14 } as const;

/** The one movement model, named for the page. */
export const MOVEMENT_METHOD_NOTE =
  'Movement is worked out from the species’ own green-to-oven-dry shrinkage (USDA Wood Handbook Table 4-3), ' +
  'taken as linear from fiber saturation (about 30 % moisture) down to oven-dry (Wood Handbook Eq. 4-9). ' +
  'Above fiber saturation wood does not change size.';

/** Shrinkage from green at MC x, % of green size (WH2021 Eq. 4-9); none above fiber saturation. */
export function shrinkageFromGreenPercent(totalShrinkagePercent: number, mcPercent: number): number {
  const x = Math.min(Math.max(mcPercent, 0), FIBER_SATURATION_MC);
  return totalShrinkagePercent * (1 - x / FIBER_SATURATION_MC);
}

/** Size at MC x as a share of the green size: 1 − S_x/100. Continuous, rising to 1 at fiber saturation, flat above. */
export function relativeSizeAtMc(totalShrinkagePercent: number, mcPercent: number): number {
  return 1 - shrinkageFromGreenPercent(totalShrinkagePercent, mcPercent) / 100;
}

/**
 * Width change of a board as it dries or takes up water. Flatsawn width moves
 * tangentially to the growth rings, quartersawn width radially.
 *
 * One model over the whole range: the size at each MC is a fixed share of the green size
 * (Eq. 4-9 with the species' own Table 4-3 row), and a change is the ratio of the two sizes.
 * So the result is continuous and monotonic in both moisture contents, and drying in steps
 * (A → B → C) ends at the same size as drying straight through (A → C).
 * The Table 13-5 coefficients (6–14 % MC) are kept on the species only as a cross-check.
 */
export function dimensionalChangeDetail(input: DimensionalChangeInput): DimensionalChangeDetail {
  const { dimensionIn, speciesSlug, grain, fromMcPercent, toMcPercent } = input;
  requireSize(dimensionIn, 'dimensionIn', WOOD_LIMITS.lengthIn);
  if (grain !== 'flatsawn' && grain !== 'quartersawn') {
    throw new WoodMathError(`grain must be "flatsawn" or "quartersawn" (got ${String(grain)})`, 'grain');
  }
  const species = getSpecies(speciesSlug);
  requireSpeciesMoistureContent(species, fromMcPercent, 'fromMcPercent');
  requireSpeciesMoistureContent(species, toMcPercent, 'toMcPercent');
  const direction = grain === 'flatsawn' ? 'tangential' : 'radial';
  const total = species.shrinkage[direction];
  const ratio = relativeSizeAtMc(total, toMcPercent) / relativeSizeAtMc(total, fromMcPercent);
  const aboveFsp = fromMcPercent > FIBER_SATURATION_MC || toMcPercent > FIBER_SATURATION_MC;
  return {
    changeIn: dimensionIn * (ratio - 1),
    ratio,
    method: 'shrinkage-from-green',
    note:
      `${MOVEMENT_METHOD_NOTE} ${species.name}, ${direction}: ${total} % from green to oven-dry.` +
      (aboveFsp ? ` Moisture above ${FIBER_SATURATION_MC} % is counted as ${FIBER_SATURATION_MC} %.` : ''),
  };
}

export function dimensionalChangeIn(input: DimensionalChangeInput): number {
  return dimensionalChangeDetail(input).changeIn;
}
