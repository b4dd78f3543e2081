import { requirePositive, WoodMathError } from './errors';
import { FIBER_SATURATION_MC, requireMoistureContent } from './moisture';
import { getSpecies } from './species';

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
  method: 'coefficient' | 'shrinkage-from-green';
  note: string;
};

/** The MC span in which the handbook's linear coefficients hold (WH2010 ch. 13, Table 13-5). */
export const COEFFICIENT_MC_RANGE = { min: 6, max: 14 } as const;

const inCoefficientRange = (mc: number) => mc >= COEFFICIENT_MC_RANGE.min && mc <= COEFFICIENT_MC_RANGE.max;

/** Shrinkage from green at MC x, % of green size (WH2021 Eq. 4-9); none above fiber saturation. */
export function shrinkageFromGreenPercent(totalShrinkagePercent: number, mcPercent: number): number {
  const x = Math.min(mcPercent, FIBER_SATURATION_MC);
  return totalShrinkagePercent * (1 - x / FIBER_SATURATION_MC);
}

/**
 * Width change of a board as it dries or takes up water. Flatsawn width moves
 * tangentially to the growth rings, quartersawn width radially.
 */
export function dimensionalChangeDetail(input: DimensionalChangeInput): DimensionalChangeDetail {
  const { dimensionIn, speciesSlug, grain, fromMcPercent, toMcPercent } = input;
  requirePositive(dimensionIn, 'dimensionIn');
  requireMoistureContent(fromMcPercent, 'fromMcPercent');
  requireMoistureContent(toMcPercent, 'toMcPercent');
  if (grain !== 'flatsawn' && grain !== 'quartersawn') {
    throw new WoodMathError(`grain must be "flatsawn" or "quartersawn" (got ${String(grain)})`, 'grain');
  }
  const species = getSpecies(speciesSlug);
  const direction = grain === 'flatsawn' ? 'tangential' : 'radial';

  if (inCoefficientRange(fromMcPercent) && inCoefficientRange(toMcPercent)) {
    const c = grain === 'flatsawn' ? species.tangentialCoefficient : species.radialCoefficient;
    return {
      changeIn: dimensionIn * c * (toMcPercent - fromMcPercent),
      method: 'coefficient',
      note: `Both moisture contents lie in 6–14 %, so the ${direction} coefficient ${c} per % MC is used (Wood Handbook Table 13-5).`,
    };
  }

  const total = species.shrinkage[direction];
  const sizeFactor = (mc: number) => 1 - shrinkageFromGreenPercent(total, mc) / 100;
  const changeIn = dimensionIn * (sizeFactor(toMcPercent) / sizeFactor(fromMcPercent) - 1);
  const aboveFsp = fromMcPercent > FIBER_SATURATION_MC || toMcPercent > FIBER_SATURATION_MC;
  const clampNote = aboveFsp
    ? ` Above fiber saturation (${FIBER_SATURATION_MC} % MC) wood does not change size, so moisture above it is treated as ${FIBER_SATURATION_MC} %.`
    : '';
  return {
    changeIn,
    method: 'shrinkage-from-green',
    note:
      `A moisture content lies outside 6–14 %, so the ${direction} shrinkage from green (${total} %) is scaled ` +
      `linearly below fiber saturation (Wood Handbook Eq. 4-9).${clampNote}`,
  };
}

export function dimensionalChangeIn(input: DimensionalChangeInput): number {
  return dimensionalChangeDetail(input).changeIn;
}
