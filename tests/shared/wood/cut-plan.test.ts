import { describe, expect, it } from 'vitest';
import { cutPlan, WoodMathError } from '../../../shared/wood/index';

describe('cutPlan', () => {
  it('fits floor((D + kerf) / (t + kerf)) slabs across a 24 in log at 2 in with a 3/8 in kerf', () => {
    const plan = cutPlan({ diameterIn: 24, greenThicknessIn: 2, kerfIn: 0.375, speciesSlug: 'black-walnut' });
    // Geometry (common practice): n slabs need n·t + (n − 1)·kerf ≤ D → floor(24.375 / 2.375) = 10.
    expect(plan.count).toBe(Math.floor((24 + 0.375) / (2 + 0.375)));
    expect(plan.count).toBe(10);
    expect(plan.kerfCuts).toBe(9);
    expect(plan.kerfTotalIn).toBeCloseTo(3.375, 10);
    // 10 × 2 + 9 × 0.375 = 23.375 in used, 0.625 in left over → 0.3125 in each side.
    expect(plan.offcutEachSideIn).toBeCloseTo(0.3125, 10);
  });

  it('gives each slab the chord width of the circle at its centre line, widest in the middle', () => {
    const plan = cutPlan({ diameterIn: 24, greenThicknessIn: 2, kerfIn: 0.375, speciesSlug: 'black-walnut' });
    const outer = plan.slabs[0];
    // Chord = 2·√(r² − d²); the first slab's centre is 23.375 / 2 − 1 = 10.6875 in from the pith.
    expect(outer.offsetIn).toBeCloseTo(-10.6875, 10);
    expect(outer.widthIn).toBeCloseTo(2 * Math.sqrt(144 - 10.6875 ** 2), 10);
    expect(outer.narrowFaceWidthIn).toBeCloseTo(2 * Math.sqrt(144 - 11.6875 ** 2), 10);
    const widths = plan.slabs.map((s) => s.widthIn);
    expect(widths).toEqual([...widths].reverse()); // symmetric about the pith
    expect(Math.max(...widths)).toBeLessThan(24);
    // An even count puts a kerf on the pith, so no slab contains it; an odd count centres one slab on it.
    expect(plan.slabs.some((s) => s.containsPith)).toBe(false);
    const odd = cutPlan({ diameterIn: 24, greenThicknessIn: 3, kerfIn: 0.375, speciesSlug: 'black-walnut' });
    expect(odd.count).toBe(7);
    expect(odd.slabs.filter((s) => s.containsPith).map((s) => s.index)).toEqual([4]);
    expect(odd.slabs[3].widthIn).toBeCloseTo(24, 10);
  });

  it('shrinks a flatsawn slab’s thickness by the radial shrinkage from the Wood Handbook', () => {
    // Wood Handbook (FPL-GTR-190) Table 4-3: black walnut, radial shrinkage green → oven-dry 5.5 %.
    const ovenDry = cutPlan({ diameterIn: 24, greenThicknessIn: 2, speciesSlug: 'black-walnut', dryToMcPercent: 0 });
    expect(ovenDry.thicknessShrinkDirection).toBe('radial');
    expect(ovenDry.slabs[0].driedThicknessIn).toBeCloseTo(2 * (1 - 0.055), 10);
    // Same table, tangential 7.8 %: a quartersawn slab's thickness runs along the rings.
    const quartered = cutPlan({ diameterIn: 24, greenThicknessIn: 2, speciesSlug: 'black-walnut', sawingMethod: 'quartersawn', dryToMcPercent: 0 });
    expect(quartered.slabs[0].driedThicknessIn).toBeCloseTo(2 * (1 - 0.078), 10);
    // At 8 % MC the shrinkage scales linearly below fiber saturation (30 %): 5.5 × (1 − 8/30) % (Wood Handbook Eq. 4-9 style scaling).
    const at8 = cutPlan({ diameterIn: 24, greenThicknessIn: 2, speciesSlug: 'black-walnut' });
    expect(at8.slabs[0].driedThicknessIn).toBeCloseTo(2 * (1 - 0.055 * (22 / 30)), 10);
  });

  it('takes the flattening allowance off the dried thickness and flags slabs left under 1 in', () => {
    const plan = cutPlan({ diameterIn: 20, greenThicknessIn: 1.25, speciesSlug: 'black-walnut', flattenAllowanceIn: 0.25 });
    const s = plan.slabs[0];
    expect(s.flattenedThicknessIn).toBeCloseTo(s.driedThicknessIn - 0.25, 10);
    expect(s.flattenable).toBe(false); // 1.25 in green → about 1.2 dry → under 1 in flattened
    expect(cutPlan({ diameterIn: 20, greenThicknessIn: 2, speciesSlug: 'black-walnut' }).slabs[0].flattenable).toBe(true);
  });

  it('counts the kerf’s share of the end-grain area', () => {
    const plan = cutPlan({ diameterIn: 24, greenThicknessIn: 2, kerfIn: 0.375, speciesSlug: 'black-walnut' });
    // Nine strips, each at most 0.375 × 24 in², inside a 452 in² circle: a little under 9 × 9 / 452 ≈ 17.9 %.
    expect(plan.kerfAreaPercent).toBeGreaterThan(10);
    expect(plan.kerfAreaPercent).toBeLessThan(17.9);
    expect(cutPlan({ diameterIn: 24, greenThicknessIn: 2, kerfIn: 0, speciesSlug: 'black-walnut' }).kerfAreaPercent).toBe(0);
  });

  it('plans no slabs when the thickness exceeds the diameter and refuses bad input', () => {
    expect(cutPlan({ diameterIn: 10, greenThicknessIn: 12, speciesSlug: 'black-walnut' }).count).toBe(0);
    expect(() => cutPlan({ diameterIn: -1, greenThicknessIn: 2, speciesSlug: 'black-walnut' })).toThrow(WoodMathError);
    expect(() => cutPlan({ diameterIn: 24, greenThicknessIn: 2, kerfIn: -0.1, speciesSlug: 'black-walnut' })).toThrow(WoodMathError);
  });
});

describe('cutPlan limits', () => {
  it('refuses absurd logs and kerfs instead of planning millions of slabs', () => {
    expect(() => cutPlan({ diameterIn: 1e9, greenThicknessIn: 2, speciesSlug: 'black-walnut' })).toThrow(/diameterIn/);
    expect(() => cutPlan({ diameterIn: 24, greenThicknessIn: 1e6, speciesSlug: 'black-walnut' })).toThrow(/greenThicknessIn/);
    expect(() => cutPlan({ diameterIn: 24, greenThicknessIn: 2, kerfIn: 50, speciesSlug: 'black-walnut' })).toThrow(/kerfIn/);
  });
});
