import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  getSpecies, SPECIES, slabWeightLb, specificGravityAtMc, speciesMaxMoistureContentPercent, weighingMoistureContent, WoodMathError,
  woodDensityLbPerCuFt,
} from '../../../shared/wood';

describe('woodDensityLbPerCuFt (WH2021 Eqs. 4-11 to 4-14)', () => {
  it('puts black walnut at 12 % MC near 38.5 lb/ft³, about 3.2 lb per board foot', () => {
    // WH2021 Eq. 4-14 with G12 0.55 from FPL-GTR-190 Table 5-3a (quoted): 62.43 × 0.55 × 1.12 = 38.5 lb/ft³;
    // tolerance ±0.3 lb/ft³ and ±0.05 lb/bd ft
    // (the equation path gives G12 0.552 from G_b 0.51 and 12.8 % volumetric shrinkage, hence 38.6)
    const density = woodDensityLbPerCuFt({ speciesSlug: 'black-walnut', mcPercent: 12 });
    expect(Math.abs(density - 38.5)).toBeLessThanOrEqual(0.3);
    expect(Math.abs(density / 12 - 3.2)).toBeLessThanOrEqual(0.05);
  });

  it.each([
    // G_b quoted; G12 from USDA FPL Wood Handbook FPL-GTR-190 Table 5-3a (quoted); tolerance ±0.02
    ['black-walnut', 0.55],
    ['white-oak', 0.68],
    ['sugar-maple', 0.63],
  ] as const)('derives the specific gravity of %s at 12 percent MC close to Table 5-3a (%s)', (slug, published) => {
    expect(Math.abs(specificGravityAtMc({ speciesSlug: slug, mcPercent: 12 }) - published)).toBeLessThanOrEqual(0.02);
  });

  it('agrees with the handbook shortcut G_x = G_b / [1 − 0.265·G_b·(1 − x/30)] within 0.01 where G_b was quoted', () => {
    // WH2021 shortcut form of Eq. 4-12 (quoted); tolerance ±0.01 in specific gravity. The shortcut assumes volumetric
    // shrinkage ≈ 26.5 × G_b, so species far from that (sweetgum) differ by more and are left out.
    for (const species of ['black-walnut', 'white-oak', 'sugar-maple'].map(getSpecies)) {
      for (const x of [0, 6, 12, 20]) {
        const gb = species.basicSpecificGravity;
        const shortcut = gb / (1 - 0.265 * gb * (1 - x / 30));
        expect(Math.abs(specificGravityAtMc({ speciesSlug: species.slug, mcPercent: x }) - shortcut)).toBeLessThanOrEqual(0.01);
      }
    }
  });

  it('uses basic specific gravity on green volume at and above fiber saturation', () => {
    // WH2021 ch. 4 (quoted): above 30 % MC, ρ = 62.43 · G_b · (1 + x/100); tolerance 1e-9 lb/ft³
    const gb = getSpecies('white-oak').basicSpecificGravity;
    expect(woodDensityLbPerCuFt({ speciesSlug: 'white-oak', mcPercent: 60 })).toBeCloseTo(62.43 * gb * 1.6, 9);
    expect(woodDensityLbPerCuFt({ speciesSlug: 'white-oak', mcPercent: 30 })).toBeCloseTo(62.43 * gb * 1.3, 9);
  });
});

describe('slabWeightLb', () => {
  it('weighs a 2 × 24 in × 8 ft walnut slab at 12 % as density × board feet ÷ 12 (about 103 lb)', () => {
    // 32 bd ft = 2.667 ft³ × 38.6 lb/ft³ (WH2021 Eq. 4-14); tolerance ±1 lb around 103
    const lb = slabWeightLb({ speciesSlug: 'black-walnut', thicknessIn: 2, widthIn: 24, lengthIn: 96, mcPercent: 12 });
    expect(Math.abs(lb - 103)).toBeLessThanOrEqual(1);
  });

  it('gets heavier as moisture content rises, for every species', () => {
    const slugs = SPECIES.map((s) => s.slug);
    fc.assert(fc.property(fc.constantFrom(...slugs), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0.001, max: 1, noNaN: true }),
      (slug, a, b) => {
        const slab = { speciesSlug: slug, thicknessIn: 2, widthIn: 20, lengthIn: 96 };
        const max = speciesMaxMoistureContentPercent(getSpecies(slug));
        const mc = a * max * 0.99;
        const wetter = Math.min(max, mc + b * 50 + 0.1);
        expect(slabWeightLb({ ...slab, mcPercent: wetter })).toBeGreaterThan(slabWeightLb({ ...slab, mcPercent: mc }));
      }));
  });

  it('is continuous across fiber saturation', () => {
    // G_x reaches G_b at 30 % (S_30 = 0, WH2021 Eq. 4-9), so there is no jump; tolerance 0.01 % of the weight
    const slab = { speciesSlug: 'northern-red-oak', thicknessIn: 3, widthIn: 30, lengthIn: 120 };
    const below = slabWeightLb({ ...slab, mcPercent: 29.999 });
    const above = slabWeightLb({ ...slab, mcPercent: 30.001 });
    expect(Math.abs(above - below)).toBeLessThanOrEqual(1e-4 * below);
  });

  it('refuses more water than the species can hold: walnut at 500 % MC is not 509 lb, it is an error', () => {
    // maximum MC = 100(1.54 − G_b)/(1.54 G_b), USDA FPL Wood Handbook FPL-GTR-190 ch. 4; walnut G_b 0.51 → 131.1 %
    const slab = { speciesSlug: 'black-walnut', thicknessIn: 2, widthIn: 24, lengthIn: 96 };
    expect(() => slabWeightLb({ ...slab, mcPercent: 500 })).toThrow(/mcPercent.*can hold/);
    expect(() => slabWeightLb({ ...slab, mcPercent: 131.2 })).toThrow(WoodMathError);
    expect(slabWeightLb({ ...slab, mcPercent: 131 })).toBeGreaterThan(0);
    for (const s of SPECIES) {
      const max = speciesMaxMoistureContentPercent(s);
      expect(() => specificGravityAtMc({ speciesSlug: s.slug, mcPercent: max + 0.01 })).toThrow(WoodMathError);
    }
    expect(() => slabWeightLb({ ...slab, thicknessIn: 1e6, mcPercent: 12 })).toThrow(/thicknessIn/);
  });

  it('weighs a slab with no reading at its species’ typical green moisture content and says so', () => {
    // green MC: USDA FPL Wood Handbook FPL-GTR-190 Table 4-1 (heartwood/sapwood; the larger figure), from memory
    const w = weighingMoistureContent('black-walnut', null);
    expect(w).toMatchObject({ mcPercent: 90, basis: 'typical-green' });
    expect(w.note).toMatch(/No moisture reading yet/);
    expect(w.note).toMatch(/from memory/);
    expect(weighingMoistureContent('black-walnut', 14)).toMatchObject({ mcPercent: 14, basis: 'reading' });
    for (const s of SPECIES) {
      // every typical green MC is wetter than fiber saturation and below the most the species can hold
      expect(s.greenMcPercent).toBeGreaterThan(30);
      expect(s.greenMcPercent).toBeLessThan(speciesMaxMoistureContentPercent(s));
    }
    // A green walnut slab weighs far more than one at the 20 % air-dry line (WH2021 Eq. 4-14).
    const slab = { speciesSlug: 'black-walnut', thicknessIn: 2, widthIn: 20, lengthIn: 96 };
    expect(slabWeightLb({ ...slab, mcPercent: w.mcPercent })).toBeGreaterThan(1.4 * slabWeightLb({ ...slab, mcPercent: 20 }));
  });

  it('refuses an unknown species, a negative MC and a zero size', () => {
    const slab = { speciesSlug: 'black-walnut', thicknessIn: 2, widthIn: 24, lengthIn: 96, mcPercent: 12 };
    expect(() => slabWeightLb({ ...slab, speciesSlug: 'nope' })).toThrow(WoodMathError);
    expect(() => slabWeightLb({ ...slab, mcPercent: -5 })).toThrow(/mcPercent/);
    expect(() => slabWeightLb({ ...slab, widthIn: 0 })).toThrow(/widthIn/);
  });
});
