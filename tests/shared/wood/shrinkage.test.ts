import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  dimensionalChangeDetail, dimensionalChangeIn, getSpecies, MOVEMENT_METHOD_NOTE, SPECIES, speciesMaxMoistureContentPercent, WoodMathError,
} from '../../../shared/wood';

// One model throughout: size at MC x = green size × (1 − S_x/100), S_x = S₀(1 − x/30) below fiber saturation
// (USDA FPL Wood Handbook FPL-GTR-282 (2021) Eq. 4-9), S₀ = the species' own green → oven-dry shrinkage
// (Wood Handbook FPL-GTR-190 (2010) Table 4-3); fiber saturation about 30 % MC (FPL-GTR-190 p. 4-2).
const slugs = SPECIES.map((s) => s.slug);
const grains = ['flatsawn', 'quartersawn'] as const;
/** Moisture contents, with the old method seams (6 and 14 %) and fiber saturation drawn often. */
const mc = fc.oneof(fc.constantFrom(0, 6, 8, 12, 13.99, 14, 14.01, 15, 20, 29.99, 30, 45), fc.double({ min: 0, max: 60, noNaN: true }));
const move = (slug: string, grain: 'flatsawn' | 'quartersawn', width: number, from: number, to: number) =>
  dimensionalChangeIn({ dimensionIn: width, speciesSlug: slug, grain, fromMcPercent: from, toMcPercent: to });

describe('dimensionalChangeIn: one continuous model from oven-dry to fiber saturation', () => {
  it('has no jump at 14 % MC for a 24 in flatsawn northern red oak board', () => {
    // Table 4-3 northern red oak, tangential 8.6 % (quoted); Eq. 4-9. Tolerance: 0.01 point of MC moves it < 0.001 in.
    const at14 = move('northern-red-oak', 'flatsawn', 24, 6, 14);
    const at1401 = move('northern-red-oak', 'flatsawn', 24, 6, 14.01);
    expect(Math.abs(at1401 - at14)).toBeLessThan(0.001);
    // By hand: 24 × [(1 − 8.6·(16/30)/100) / (1 − 8.6·(24/30)/100) − 1] = 0.591 in (±0.001 in)
    expect(Math.abs(at14 - 24 * ((1 - (8.6 * 16) / 3000) / (1 - (8.6 * 24) / 3000) - 1))).toBeLessThan(1e-9);
    expect(Math.abs(at14 - 0.591)).toBeLessThanOrEqual(0.001);
  });

  it('swells more from 6 → 15 % than from 6 → 14 %', () => {
    // monotonic below fiber saturation (Eq. 4-9 is linear in MC)
    expect(move('northern-red-oak', 'flatsawn', 24, 6, 15)).toBeGreaterThan(move('northern-red-oak', 'flatsawn', 24, 6, 14));
  });

  it('gives the same size drying 20 → 8 % directly as through 14 %', () => {
    // path independence: the change is a ratio of sizes at the two MCs (Eq. 4-9); tolerance 1e-12 in
    const direct = move('northern-red-oak', 'flatsawn', 24, 20, 8);
    const first = move('northern-red-oak', 'flatsawn', 24, 20, 14);
    const second = move('northern-red-oak', 'flatsawn', 24 + first, 14, 8);
    expect(Math.abs(first + second - direct)).toBeLessThan(1e-12);
  });

  it('is continuous in both moisture contents, for every species and grain (property)', () => {
    fc.assert(fc.property(fc.constantFrom(...slugs), fc.constantFrom(...grains),
      mc, mc, fc.double({ min: -1e-4, max: 1e-4, noNaN: true }),
      (slug, grain, a, b, eps) => {
        const to = Math.max(0, b + eps);
        // |d change / d MC| ≤ width × S₀/3000 ÷ (1 − S₀/100) < 0.1 in per point of MC for a 24 in board (S₀ ≤ 10.5 %)
        expect(Math.abs(move(slug, grain, 24, a, to) - move(slug, grain, 24, a, b))).toBeLessThanOrEqual(0.1 * Math.abs(to - b) + 1e-9);
      }), { numRuns: 400 });
  });

  it('never shrinks when the wood gets wetter, never swells when it gets drier (property)', () => {
    fc.assert(fc.property(fc.constantFrom(...slugs), fc.constantFrom(...grains),
      mc, mc, mc,
      (slug, grain, from, x, y) => {
        const [lo, hi] = x <= y ? [x, y] : [y, x];
        expect(move(slug, grain, 20, from, hi)).toBeGreaterThanOrEqual(move(slug, grain, 20, from, lo) - 1e-12);
        if (Math.min(hi, 30) - Math.min(lo, 30) > 0.01) {
          expect(move(slug, grain, 20, from, hi)).toBeGreaterThan(move(slug, grain, 20, from, lo));
        }
      }), { numRuns: 400 });
  });

  it('moves smoothly and one way on a 0.01-point sweep from oven-dry past fiber saturation, for every species and grain', () => {
    // Eq. 4-9 is linear in MC below 30 % and flat above, so each 0.01-point step changes a 24 in board by under 0.001 in,
    // always in the same direction, and not at all above 30 %.
    for (const slug of slugs) {
      for (const grain of grains) {
        for (const from of [0, 6, 10, 14, 20, 30]) {
          let previous = move(slug, grain, 24, from, 0);
          for (let i = 1; i <= 3500; i++) {
            const to = i / 100;
            const now = move(slug, grain, 24, from, to);
            const step = now - previous;
            if (step < -1e-12 || step > 0.001) throw new Error(`${slug} ${grain} ${from} → ${to}: step ${step}`);
            if (to > 30.005) expect(step).toBe(0);
            previous = now;
          }
        }
      }
    }
  });

  it('ends at the same size by A → C as by A → B → C (property)', () => {
    fc.assert(fc.property(fc.constantFrom(...slugs), fc.constantFrom(...grains),
      mc, mc, mc,
      fc.double({ min: 1, max: 60, noNaN: true }),
      (slug, grain, a, b, c, width) => {
        const ab = move(slug, grain, width, a, b);
        const bc = move(slug, grain, width + ab, b, c);
        expect(Math.abs(ab + bc - move(slug, grain, width, a, c))).toBeLessThanOrEqual(1e-9);
      }), { numRuns: 400 });
  });

  it('does not change size above fiber saturation and says which model and source it used', () => {
    // fiber saturation about 30 % MC, no shrinkage above it (WH2010 p. 4-2, read)
    const detail = dimensionalChangeDetail({ dimensionIn: 20, speciesSlug: 'white-oak', grain: 'flatsawn', fromMcPercent: 80, toMcPercent: 35 });
    expect(detail.changeIn).toBe(0);
    expect(detail.method).toBe('shrinkage-from-green');
    expect(detail.note).toContain(MOVEMENT_METHOD_NOTE);
    expect(detail.note).toMatch(/Table 4-3/);
    expect(detail.note).toMatch(/Eq\. 4-9/);
  });
});

describe('dimensionalChangeIn against the published tables', () => {
  it.each([
    // Wood Handbook FPL-GTR-190 Table 4-3 green → oven-dry shrinkage (read); tolerance ±1e-6 in
    ['black-walnut', 'flatsawn', 10, 40, 0, -0.78], // T 7.8 %
    ['white-oak', 'quartersawn', 10, 30, 0, -0.56], // R 5.6 %
    ['sweetgum', 'flatsawn', 100, 60, 0, -10.2], // T 10.2 %
  ] as const)('shrinks %s %s %s in from %s to %s percent MC by %s in, its full Table 4-3 shrinkage', (slug, grain, width, from, to, expected) => {
    expect(Math.abs(move(slug, grain, width, from, to) - expected)).toBeLessThanOrEqual(1e-6);
  });

  it('scales shrinkage linearly below fiber saturation: green walnut to 15 % loses half its tangential shrinkage', () => {
    // WH2021 Eq. 4-9 (quoted), S_15 = 7.8 × (1 − 15/30) = 3.9 %; tolerance ±1e-6 in
    expect(Math.abs(move('black-walnut', 'flatsawn', 10, 30, 15) - -0.39)).toBeLessThanOrEqual(1e-6);
  });

  it('agrees within 3 % with Table 13-5 (ΔD = D·C·ΔMC, 6–14 % MC) where the coefficients are the species’ own row', () => {
    // Wood Handbook FPL-GTR-190 Table 13-5 (read for these species) vs Table 4-3 + Eq. 4-9; tolerance 3 % of the Table 13-5 figure.
    // e.g. 12 in flatsawn black walnut 12 → 6 %: 12 × 0.00274 × (−6) = −0.197 in by Table 13-5.
    expect(Math.abs(move('black-walnut', 'flatsawn', 12, 12, 6) - -0.197)).toBeLessThanOrEqual(0.03 * 0.197);
    for (const slug of ['black-walnut', 'black-cherry', 'sweetgum', 'american-sycamore', 'sugar-maple']) {
      const s = getSpecies(slug);
      expect(s.coefficientRow.kind).toBe('species');
      for (const grain of grains) {
        const c = grain === 'flatsawn' ? s.tangentialCoefficient : s.radialCoefficient;
        for (const [from, to] of [[12, 6], [8, 12], [6, 14]]) {
          const table135 = 10 * c * (to - from);
          expect(Math.abs(move(slug, grain, 10, from, to) - table135)).toBeLessThanOrEqual(0.03 * Math.abs(table135));
        }
      }
    }
  });

  it('labels the oak coefficients as Table 13-5 group rows and calibrates oak to its own Table 4-3 row instead', () => {
    // FPL-GTR-190 Table 13-5 gives red and white oak as "commercial" group rows; Table 4-3 has species rows
    // (northern red oak T 8.6 %, quoted; white oak T 10.5 %, read). The group row's C_T 0.00369 would give 24 × 0.00369 × 8 = 0.709 in
    // for 6 → 14 %, the species’ own row 0.591 in.
    for (const slug of ['northern-red-oak', 'white-oak']) {
      const row = getSpecies(slug).coefficientRow;
      expect(row.kind).toBe('group');
      if (row.kind === 'group') expect(row.name).toMatch(/group row/);
    }
    expect(move('northern-red-oak', 'flatsawn', 24, 6, 14)).toBeLessThan(24 * 0.00369 * 8 - 0.1);
  });
});

describe('dimensionalChangeIn input checks', () => {
  const ok = { dimensionIn: 10, speciesSlug: 'black-walnut', grain: 'flatsawn' as const, fromMcPercent: 12, toMcPercent: 8 };

  it('refuses an unknown species, a negative MC and an unknown grain', () => {
    expect(() => dimensionalChangeIn({ ...ok, speciesSlug: 'unobtainium' })).toThrow(/speciesSlug|Unknown species/);
    expect(() => dimensionalChangeIn({ ...ok, toMcPercent: -1 })).toThrow(WoodMathError);
    expect(() => dimensionalChangeIn({ ...ok, grain: 'riftsawn' as never })).toThrow(/grain/);
    expect(() => dimensionalChangeIn({ ...ok, dimensionIn: 0 })).toThrow(/dimensionIn/);
  });

  it('refuses more water than the species can hold and absurd widths', () => {
    // maximum MC = 100(1.54 − G_b)/(1.54 G_b), Wood Handbook FPL-GTR-190 ch. 4; walnut G_b 0.51 → about 131 %
    expect(speciesMaxMoistureContentPercent(getSpecies('black-walnut'))).toBeCloseTo(131.1, 1);
    expect(() => dimensionalChangeIn({ ...ok, fromMcPercent: 500 })).toThrow(/fromMcPercent.*can hold/);
    expect(() => dimensionalChangeIn({ ...ok, toMcPercent: 132 })).toThrow(WoodMathError);
    expect(() => dimensionalChangeIn({ ...ok, dimensionIn: 1e6 })).toThrow(/dimensionIn/);
  });
});
