import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { dimensionalChangeDetail, dimensionalChangeIn, getSpecies, WoodMathError } from '../../../shared/wood';

describe('dimensionalChangeIn, coefficient method (6–14 % MC)', () => {
  it('shrinks a 12 in flatsawn black walnut board 0.197 in from 12 % to 6 %', () => {
    // WH2010 Table 13-5 C_T 0.00274 (read), REFERENCES worked example; tolerance ±0.001 in
    const change = dimensionalChangeIn({ dimensionIn: 12, speciesSlug: 'black-walnut', grain: 'flatsawn', fromMcPercent: 12, toMcPercent: 6 });
    expect(Math.abs(change - -0.197)).toBeLessThanOrEqual(0.001);
  });

  it.each([
    // [species, grain, width, from, to, expected] — WH2010 Table 13-5 (read), ΔD = D·C·ΔMC; tolerance ±1e-6 in
    ['white-oak', 'quartersawn', 10, 6, 14, 0.144], // C_R 0.00180
    ['black-cherry', 'flatsawn', 8, 12, 6, -0.11904], // C_T 0.00248
    ['sugar-maple', 'quartersawn', 10, 8, 12, 0.066], // C_R 0.00165
  ] as const)('moves %s %s %s in from %s to %s percent MC by %s in', (slug, grain, width, from, to, expected) => {
    const detail = dimensionalChangeDetail({ dimensionIn: width, speciesSlug: slug, grain, fromMcPercent: from, toMcPercent: to });
    expect(detail.method).toBe('coefficient');
    expect(Math.abs(detail.changeIn - expected)).toBeLessThanOrEqual(1e-6);
  });
});

describe('dimensionalChangeIn, shrinkage-from-green method', () => {
  it.each([
    // WH2010 Table 4-3 green → oven-dry shrinkage (read); tolerance ±1e-6 in
    ['black-walnut', 'flatsawn', 10, 40, 0, -0.78], // T 7.8 %
    ['white-oak', 'quartersawn', 10, 30, 0, -0.56], // R 5.6 %
    ['sweetgum', 'flatsawn', 100, 60, 0, -10.2], // T 10.2 %
  ] as const)('shrinks %s %s %s in from %s to %s percent MC by %s in, its full Table 4-3 shrinkage', (slug, grain, width, from, to, expected) => {
    const detail = dimensionalChangeDetail({ dimensionIn: width, speciesSlug: slug, grain, fromMcPercent: from, toMcPercent: to });
    expect(detail.method).toBe('shrinkage-from-green');
    expect(Math.abs(detail.changeIn - expected)).toBeLessThanOrEqual(1e-6);
  });

  it('scales shrinkage linearly below fiber saturation: green walnut to 15 % loses half its tangential shrinkage', () => {
    // WH2021 Eq. 4-9 (quoted), S_15 = 7.8 × (1 − 15/30) = 3.9 %; tolerance ±1e-6 in
    const change = dimensionalChangeIn({ dimensionIn: 10, speciesSlug: 'black-walnut', grain: 'flatsawn', fromMcPercent: 30, toMcPercent: 15 });
    expect(Math.abs(change - -0.39)).toBeLessThanOrEqual(1e-6);
  });

  it('does not change size above fiber saturation and says so', () => {
    // fiber saturation about 30 % MC, no shrinkage above it (WH2010 p. 4-2, read)
    const detail = dimensionalChangeDetail({ dimensionIn: 20, speciesSlug: 'white-oak', grain: 'flatsawn', fromMcPercent: 80, toMcPercent: 35 });
    expect(detail.changeIn).toBe(0);
    expect(detail.note).toMatch(/fiber saturation/);
  });

  it('agrees with the Table 13-5 coefficients within 3 % where both tables were read', () => {
    // WH2010 Table 13-5 vs Table 4-3 + WH2021 Eq. 4-9, 12 % → 6 %; tolerance 3 % of the coefficient result
    for (const slug of ['black-walnut', 'black-cherry', 'sweetgum', 'american-sycamore']) {
      for (const grain of ['flatsawn', 'quartersawn'] as const) {
        const s = getSpecies(slug);
        const c = grain === 'flatsawn' ? s.tangentialCoefficient : s.radialCoefficient;
        const fromCoefficient = 10 * c * -6;
        const shrink = grain === 'flatsawn' ? s.shrinkage.tangential : s.shrinkage.radial;
        const fromGreen = 10 * ((1 - (shrink * 0.8) / 100) / (1 - (shrink * 0.6) / 100) - 1);
        expect(Math.abs(fromGreen - fromCoefficient)).toBeLessThanOrEqual(0.03 * Math.abs(fromCoefficient));
      }
    }
  });

  it('shrinks when drying, swells when wetting, and returns to size after a round trip', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 60, noNaN: true }), fc.double({ min: 0, max: 60, noNaN: true }), (a, b) => {
      const base = { speciesSlug: 'red-maple', grain: 'flatsawn' as const };
      const there = dimensionalChangeIn({ ...base, dimensionIn: 10, fromMcPercent: a, toMcPercent: b });
      const detail = dimensionalChangeDetail({ ...base, dimensionIn: 10 + there, fromMcPercent: b, toMcPercent: a });
      if (detail.method === 'shrinkage-from-green') expect(Math.abs(there + detail.changeIn)).toBeLessThanOrEqual(1e-9);
      const wetter = Math.min(b, 30) - Math.min(a, 30);
      if (Math.abs(wetter) > 0.01) expect(there * wetter).toBeGreaterThan(0); // swells when wetter, shrinks when drier
    }));
  });
});

describe('dimensionalChangeIn input checks', () => {
  it('refuses an unknown species, a negative MC and an unknown grain', () => {
    const ok = { dimensionIn: 10, speciesSlug: 'black-walnut', grain: 'flatsawn' as const, fromMcPercent: 12, toMcPercent: 8 };
    expect(() => dimensionalChangeIn({ ...ok, speciesSlug: 'unobtainium' })).toThrow(/speciesSlug|Unknown species/);
    expect(() => dimensionalChangeIn({ ...ok, toMcPercent: -1 })).toThrow(WoodMathError);
    expect(() => dimensionalChangeIn({ ...ok, grain: 'riftsawn' as never })).toThrow(/grain/);
    expect(() => dimensionalChangeIn({ ...ok, dimensionIn: 0 })).toThrow(/dimensionIn/);
  });
});
