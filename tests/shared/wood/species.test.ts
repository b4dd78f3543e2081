import { describe, expect, it } from 'vitest';
import { getSpecies, SPECIES, WoodMathError } from '../../../shared/wood';

const REQUIRED = [
  'black-walnut', 'black-cherry', 'white-oak', 'northern-red-oak', 'sugar-maple',
  'red-maple', 'sweetgum', 'american-sycamore', 'douglas-fir', 'eastern-white-pine',
];

describe('species data', () => {
  it('has every species the catalog uses, each slug once', () => {
    const slugs = SPECIES.map((s) => s.slug);
    expect(new Set(slugs).size).toBe(slugs.length);
    for (const slug of REQUIRED) expect(getSpecies(slug).slug).toBe(slug);
  });

  it('keeps black walnut at its handbook values', () => {
    // WH2010 Table 13-5 and Table 4-3 (read), Table 5-3a (quoted); values must match exactly
    expect(getSpecies('black-walnut')).toMatchObject({
      radialCoefficient: 0.0019, tangentialCoefficient: 0.00274,
      shrinkage: { radial: 5.5, tangential: 7.8, volumetric: 12.8 }, specificGravity12: 0.55,
    });
  });

  it('has values in the shape wood always follows, which catches typing slips', () => {
    // tangential movement exceeds radial and volumetric exceeds tangential (WH2010 ch. 4, read);
    // wood is denser at 12 % MC than on green volume because it has shrunk (WH2021 Eq. 4-11)
    for (const s of SPECIES) {
      expect(s.tangentialCoefficient).toBeGreaterThan(s.radialCoefficient);
      expect(s.shrinkage.tangential).toBeGreaterThan(s.shrinkage.radial);
      expect(s.shrinkage.volumetric).toBeGreaterThan(s.shrinkage.tangential);
      expect(s.specificGravity12).toBeGreaterThanOrEqual(s.basicSpecificGravity);
      expect(s.basicSpecificGravity).toBeGreaterThan(0.2);
      expect(s.specificGravity12).toBeLessThan(1);
      expect(Number.isInteger(s.defaultRatePerBoardFootCents)).toBe(true);
      expect(s.botanicalName).toMatch(/^[A-Z][a-z]+ [a-z]+$/);
    }
  });

  it('names the unknown slug when a species is missing', () => {
    expect(() => getSpecies('unobtainium')).toThrow(WoodMathError);
    expect(() => getSpecies('unobtainium')).toThrow(/unobtainium/);
  });
});
