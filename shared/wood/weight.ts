import { boardFeet } from './board-feet';
import { requireMoistureContent } from './moisture';
import { shrinkageFromGreenPercent } from './shrinkage';
import { getSpecies } from './species';

export type WoodDensityInput = { speciesSlug: string; mcPercent: number };
export type SlabWeightInput = WoodDensityInput & { thicknessIn: number; widthIn: number; lengthIn: number };

/** Density of water, lb/ft³ (1000 kg/m³), as used in WH2021 Eq. 4-14. */
export const WATER_DENSITY_LB_PER_CU_FT = 62.43;

/**
 * Specific gravity on the volume at MC x (WH2021 Eqs. 4-11/4-12): the dry mass
 * is fixed while the volume shrinks by S_x, so G_x = G_b / (1 − S_x/100).
 * Above fiber saturation the volume stays green, so G_x = G_b.
 */
export function specificGravityAtMc({ speciesSlug, mcPercent }: WoodDensityInput): number {
  requireMoistureContent(mcPercent, 'mcPercent');
  const species = getSpecies(speciesSlug);
  const sx = shrinkageFromGreenPercent(species.shrinkage.volumetric, mcPercent);
  return species.basicSpecificGravity / (1 - sx / 100);
}

/** Density at MC x including its water (WH2021 Eq. 4-14): ρ = ρ_water · G_x · (1 + x/100). */
export function woodDensityLbPerCuFt(input: WoodDensityInput): number {
  const gx = specificGravityAtMc(input);
  return WATER_DENSITY_LB_PER_CU_FT * gx * (1 + input.mcPercent / 100);
}

/**
 * Weight of a slab measured at its current MC. Above fiber saturation the
 * extra water is free water in green volume, so the weight keeps rising.
 */
export function slabWeightLb(input: SlabWeightInput): number {
  const { thicknessIn, widthIn, lengthIn } = input;
  const cubicFeet = boardFeet({ thicknessIn, widthIn, lengthIn }) / 12;
  return woodDensityLbPerCuFt(input) * cubicFeet;
}
