import { boardFeet } from './board-feet';
import { shrinkageFromGreenPercent } from './shrinkage';
import { getSpecies, requireSpeciesMoistureContent } from './species';

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
  const species = getSpecies(speciesSlug);
  requireSpeciesMoistureContent(species, mcPercent, 'mcPercent');
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

/**
 * The moisture content to weigh a slab at: its latest reading when there is one; otherwise the
 * species' typical green moisture content, so a slab nobody has measured is never weighed light.
 */
export function weighingMoistureContent(speciesSlug: string, latestMcPercent: number | null):
  { mcPercent: number; basis: 'reading' | 'typical-green'; note: string } {
  const species = getSpecies(speciesSlug);
  if (latestMcPercent !== null) {
    requireSpeciesMoistureContent(species, latestMcPercent, 'mcPercent');
    return { mcPercent: latestMcPercent, basis: 'reading', note: `Weighed at its latest moisture reading, ${latestMcPercent} %.` };
  }
  return {
    mcPercent: species.greenMcPercent,
    basis: 'typical-green',
    note: `No moisture reading yet, so it is weighed as freshly sawn ${species.name.toLowerCase()} at about ` +
      `${species.greenMcPercent} % moisture (typical green wood, after USDA Wood Handbook Table 4-1; figure from memory). ` +
      'A drier slab weighs less.',
  };
}
