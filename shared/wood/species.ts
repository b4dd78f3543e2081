import { maxMoistureContentPercent, requireMoistureContent } from './moisture';
import { WoodMathError } from './errors';

/**
 * Species properties for the wood math. Beside every value: where it comes
 * from and how sure we are.
 *   T13-5 = USDA FPL Wood Handbook FPL-GTR-190 (2010), Table 13-5 (dimensional change coefficients)
 *   T4-3  = same handbook, Table 4-3 (shrinkage green → oven-dry, % of green dimension)
 *   T5-3a = same handbook, Table 5-3a (specific gravity at 12 % MC)
 *   T4-1  = same handbook, Table 4-1 (moisture content of green wood, heartwood and sapwood)
 *   Gb    = basic specific gravity (oven-dry mass / green volume), same handbook ch. 4–5
 *   read = seen in the published text · quoted = seen in a faithful copy · from memory = unverified
 * The rates are invented: they are the demo mill's own prices, not market data.
 */
export type SpeciesShrinkage = { radial: number; tangential: number; volumetric: number };

export type Species = {
  slug: string;
  name: string;
  botanicalName: string;
  /** Change in quartersawn width per 1 % MC, between about 6 and 14 % MC. */
  radialCoefficient: number;
  /** Change in flatsawn width per 1 % MC, between about 6 and 14 % MC. */
  tangentialCoefficient: number;
  /** Green to oven-dry shrinkage, percent of the green dimension. */
  shrinkage: SpeciesShrinkage;
  basicSpecificGravity: number;
  specificGravity12: number;
  /**
   * Typical moisture content of freshly sawn (green) wood, % oven-dry basis: used to weigh a slab
   * that has no reading yet. Green wood varies a lot between trees and between heartwood and sapwood.
   */
  greenMcPercent: number;
  /**
   * Which Table 13-5 row the two coefficients come from. A group row ("commercial" red or white oak)
   * averages several species, so the coefficients are kept for cross-checks only; the movement model
   * uses the species' own Table 4-3 shrinkage.
   */
  coefficientRow: { kind: 'species' } | { kind: 'group'; name: string };
  defaultRatePerBoardFootCents: number;
};

export const SPECIES: readonly Species[] = [
  { slug: 'black-walnut', name: 'Black walnut', botanicalName: 'Juglans nigra',
    radialCoefficient: 0.0019, // T13-5, read
    tangentialCoefficient: 0.00274, // T13-5, read
    shrinkage: { radial: 5.5, tangential: 7.8, volumetric: 12.8 }, // T4-3, read
    basicSpecificGravity: 0.51, // Gb, quoted
    specificGravity12: 0.55, // T5-3a, quoted
    greenMcPercent: 90, // T4-1 heartwood 90 / sapwood 73; the larger figure so a slab is not weighed light; from memory
    coefficientRow: { kind: 'species' }, // T13-5 species row
    defaultRatePerBoardFootCents: 1400 }, // invented demo price
  { slug: 'black-cherry', name: 'Black cherry', botanicalName: 'Prunus serotina',
    radialCoefficient: 0.00126, // T13-5, read
    tangentialCoefficient: 0.00248, // T13-5, read
    shrinkage: { radial: 3.7, tangential: 7.1, volumetric: 11.5 }, // T4-3, read
    basicSpecificGravity: 0.47, // Gb, from memory
    specificGravity12: 0.5, // T5-3a, quoted
    greenMcPercent: 58, // T4-1 heartwood 58 (no sapwood figure recalled); from memory
    coefficientRow: { kind: 'species' }, // T13-5 species row
    defaultRatePerBoardFootCents: 1000 }, // invented demo price
  { slug: 'white-oak', name: 'White oak', botanicalName: 'Quercus alba',
    radialCoefficient: 0.0018, // T13-5, read
    tangentialCoefficient: 0.00365, // T13-5, read
    shrinkage: { radial: 5.6, tangential: 10.5, volumetric: 16.3 }, // T4-3, read
    basicSpecificGravity: 0.6, // Gb, quoted
    specificGravity12: 0.68, // T5-3a, quoted
    greenMcPercent: 78, // T4-1 heartwood 64 / sapwood 78; the larger figure so a slab is not weighed light; from memory
    coefficientRow: { kind: 'group', name: 'Oak, white (commercial) — a group row, not the species' }, // T13-5 row label, read
    defaultRatePerBoardFootCents: 900 }, // invented demo price
  { slug: 'northern-red-oak', name: 'Northern red oak', botanicalName: 'Quercus rubra',
    radialCoefficient: 0.00158, // T13-5, read
    tangentialCoefficient: 0.00369, // T13-5, read
    shrinkage: { radial: 4.0, tangential: 8.6, volumetric: 13.7 }, // T4-3, quoted
    basicSpecificGravity: 0.56, // Gb, from memory
    specificGravity12: 0.63, // T5-3a, quoted
    greenMcPercent: 80, // T4-1 heartwood 80 / sapwood 69; the larger figure so a slab is not weighed light; from memory
    coefficientRow: { kind: 'group', name: 'Oak, red (commercial) — a group row, not the species' }, // T13-5 row label, read
    defaultRatePerBoardFootCents: 700 }, // invented demo price
  { slug: 'sugar-maple', name: 'Sugar maple', botanicalName: 'Acer saccharum',
    radialCoefficient: 0.00165, // T13-5, read
    tangentialCoefficient: 0.00353, // T13-5, read
    shrinkage: { radial: 4.8, tangential: 9.9, volumetric: 14.7 }, // T4-3, quoted
    basicSpecificGravity: 0.56, // Gb, quoted
    specificGravity12: 0.63, // T5-3a, quoted
    greenMcPercent: 72, // T4-1 heartwood 65 / sapwood 72; the larger figure so a slab is not weighed light; from memory
    coefficientRow: { kind: 'species' }, // T13-5 species row
    defaultRatePerBoardFootCents: 850 }, // invented demo price
  { slug: 'red-maple', name: 'Red maple', botanicalName: 'Acer rubrum',
    radialCoefficient: 0.00137, // T13-5, read
    tangentialCoefficient: 0.00289, // T13-5, read
    shrinkage: { radial: 4.0, tangential: 8.2, volumetric: 12.6 }, // T4-3, from memory
    basicSpecificGravity: 0.49, // Gb, from memory
    specificGravity12: 0.54, // T5-3a, quoted
    greenMcPercent: 70, // no Table 4-1 row recalled; a figure typical of soft maples, from memory
    coefficientRow: { kind: 'species' }, // T13-5 species row
    defaultRatePerBoardFootCents: 650 }, // invented demo price
  { slug: 'sweetgum', name: 'Sweetgum', botanicalName: 'Liquidambar styraciflua',
    radialCoefficient: 0.00183, // T13-5, read
    tangentialCoefficient: 0.00365, // T13-5, read
    shrinkage: { radial: 5.3, tangential: 10.2, volumetric: 15.8 }, // T4-3, read
    basicSpecificGravity: 0.46, // Gb, from memory
    specificGravity12: 0.52, // T5-3a, quoted
    greenMcPercent: 137, // T4-1 heartwood 79 / sapwood 137; the larger figure so a slab is not weighed light; from memory
    coefficientRow: { kind: 'species' }, // T13-5 species row
    defaultRatePerBoardFootCents: 550 }, // invented demo price
  { slug: 'american-sycamore', name: 'American sycamore', botanicalName: 'Platanus occidentalis',
    radialCoefficient: 0.00172, // T13-5, read
    tangentialCoefficient: 0.00296, // T13-5, read
    shrinkage: { radial: 5.0, tangential: 8.4, volumetric: 14.1 }, // T4-3, read
    basicSpecificGravity: 0.46, // Gb, from memory
    specificGravity12: 0.49, // T5-3a, quoted
    greenMcPercent: 130, // T4-1 heartwood 114 / sapwood 130; the larger figure so a slab is not weighed light; from memory
    coefficientRow: { kind: 'species' }, // T13-5 species row
    defaultRatePerBoardFootCents: 600 }, // invented demo price
  { slug: 'douglas-fir', name: 'Douglas-fir (coast)', botanicalName: 'Pseudotsuga menziesii',
    radialCoefficient: 0.00165, // T13-5, from memory
    tangentialCoefficient: 0.00267, // T13-5, quoted
    shrinkage: { radial: 4.8, tangential: 7.6, volumetric: 12.4 }, // T4-3, read
    basicSpecificGravity: 0.45, // Gb, from memory
    specificGravity12: 0.48, // T5-3a, quoted
    greenMcPercent: 115, // T4-1 heartwood 37 / sapwood 115; the larger figure so a slab is not weighed light; from memory
    coefficientRow: { kind: 'species' }, // T13-5 species row
    defaultRatePerBoardFootCents: 500 }, // invented demo price
  { slug: 'eastern-white-pine', name: 'Eastern white pine', botanicalName: 'Pinus strobus',
    radialCoefficient: 0.00071, // T13-5, from memory
    tangentialCoefficient: 0.00212, // T13-5, from memory
    shrinkage: { radial: 2.1, tangential: 6.1, volumetric: 8.2 }, // T4-3, from memory
    basicSpecificGravity: 0.34, // Gb, from memory
    specificGravity12: 0.35, // T5-3a, quoted
    greenMcPercent: 100, // no Table 4-1 row recalled; heartwood and sapwood mixed, from memory
    coefficientRow: { kind: 'species' }, // T13-5 species row
    defaultRatePerBoardFootCents: 450 }, // invented demo price
];

const bySlug = new Map(SPECIES.map((s) => [s.slug, s]));

export function getSpecies(slug: string): Species {
  const species = bySlug.get(slug);
  if (!species) {
    throw new WoodMathError(`Unknown species "${slug}"; known: ${[...bySlug.keys()].join(', ')}`, 'speciesSlug');
  }
  return species;
}

/** The most water this species can hold, % MC, when every cell cavity is full (Wood Handbook ch. 4). */
export function speciesMaxMoistureContentPercent(species: Species): number {
  return maxMoistureContentPercent(species.basicSpecificGravity);
}

/** An MC input for a given species: 0 % up to the most water the species can hold. */
export function requireSpeciesMoistureContent(species: Species, value: number, field: string): number {
  requireMoistureContent(value, field);
  const max = speciesMaxMoistureContentPercent(species);
  if (value > max) {
    throw new WoodMathError(
      `${field} ${value} % is more water than ${species.name.toLowerCase()} can hold (at most about ${Math.floor(max)} % MC, ` +
      'with every cell cavity full: Wood Handbook ch. 4, maximum moisture content)', field);
  }
  return value;
}

/** The highest MC any listed species can hold: the cap for MC inputs that name no species. */
export const HIGHEST_MAX_MOISTURE_CONTENT_PERCENT = Math.max(...SPECIES.map(speciesMaxMoistureContentPercent));
