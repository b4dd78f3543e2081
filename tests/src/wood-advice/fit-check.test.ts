import { describe, expect, it } from 'vitest';
import { describeChange } from '../../../src/features/wood-advice/components/fit-check';
import { dimensionalChangeIn, equilibriumMoistureContent } from '../../../shared/wood/index';

describe('fit check wording', () => {
  it('states a shrink to the nearest 1/16 in, in plain words', () => {
    // 12 in flatsawn black walnut from 12 % to 6 % MC: Wood Handbook FPL-GTR-190 Table 4-3 (T 7.8 %) with FPL-GTR-282 Eq. 4-9
    // gives −0.196 in; Table 13-5 (C_T 0.00274) gives 12 × 0.00274 × (−6) = −0.197 in. Either way ≈ 3/16 in narrower.
    const change = dimensionalChangeIn({ dimensionIn: 12, speciesSlug: 'black-walnut', grain: 'flatsawn', fromMcPercent: 12, toMcPercent: 6 });
    expect(describeChange(change)).toBe('about 3/16 in narrower');
  });

  it('says wider when the slab takes up water and "hardly any" below 1/32 in', () => {
    expect(describeChange(0.26)).toBe('about 1/4 in wider');
    expect(describeChange(0.01)).toMatch(/hardly any change/);
  });

  it('a heated winter house (68 °F, 30 % RH) dries wood to about 6 % MC', () => {
    // Wood Handbook FPL-GTR-190 Table 4-2 gives about 6 % around 70 °F / 30 % RH (from memory for this cell; ±0.6 here).
    expect(equilibriumMoistureContent({ temperatureF: 68, relativeHumidityPercent: 30 })).toBeGreaterThan(5.4);
    expect(equilibriumMoistureContent({ temperatureF: 68, relativeHumidityPercent: 30 })).toBeLessThan(6.7);
  });
});
