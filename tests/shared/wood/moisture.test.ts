import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  equilibriumMoistureContent, equilibriumMoistureContentC, FIBER_SATURATION_MC, moistureContentPercent, WoodMathError,
} from '../../../shared/wood';

const fToC = (f: number) => ((f - 32) * 5) / 9;

describe('equilibriumMoistureContent (Wood Handbook Eq. 4-5)', () => {
  // USDA FPL Wood Handbook FPL-GTR-190 (2010), Table 4-2 (quoted), tolerance ±0.1 point MC
  const table42: Array<[number, number, number]> = [
    [70, 50, 9.2],
    [70, 65, 12.0],
    [40, 80, 16.5],
    [100, 30, 5.8],
  ];

  it.each(table42)('at %s °F and %s percent RH matches Table 4-2 (%s percent MC) within 0.1 point', (t, rh, expected) => {
    expect(Math.abs(equilibriumMoistureContent({ temperatureF: t, relativeHumidityPercent: rh }) - expected)).toBeLessThanOrEqual(0.1);
  });

  it.each(table42)('the °C coefficients give the Table 4-2 value at %s °F and %s percent RH within 0.1 point', (t, rh, expected) => {
    expect(Math.abs(equilibriumMoistureContentC({ temperatureC: fToC(t), relativeHumidityPercent: rh }) - expected)).toBeLessThanOrEqual(0.1);
  });

  it('°C and °F versions agree within 0.05 point for the same condition from -20 to 100 °C', () => {
    // both are WH2021 Eq. 4-5 fits; they differ by at most about 0.02 point here, so 0.05 is the stated tolerance
    for (let c = -20; c <= 100; c += 10) {
      for (let rh = 0; rh <= 100; rh += 10) {
        const f = equilibriumMoistureContent({ temperatureF: c * 1.8 + 32, relativeHumidityPercent: rh });
        expect(Math.abs(f - equilibriumMoistureContentC({ temperatureC: c, relativeHumidityPercent: rh }))).toBeLessThanOrEqual(0.05);
      }
    }
    fc.assert(fc.property(fc.double({ min: -20, max: 100, noNaN: true }), fc.double({ min: 0, max: 100, noNaN: true }), (c, rh) => {
      const f = equilibriumMoistureContent({ temperatureF: c * 1.8 + 32, relativeHumidityPercent: rh });
      const inC = equilibriumMoistureContentC({ temperatureC: c, relativeHumidityPercent: rh });
      expect(Math.abs(f - inC)).toBeLessThanOrEqual(0.05);
    }));
  });

  it('rises with relative humidity at a fixed temperature', () => {
    fc.assert(fc.property(
      fc.double({ min: -4, max: 212, noNaN: true }),
      fc.double({ min: 0, max: 99, noNaN: true }),
      fc.double({ min: 0.5, max: 50, noNaN: true }),
      (t, rh, step) => {
        const higher = Math.min(100, rh + step);
        expect(equilibriumMoistureContent({ temperatureF: t, relativeHumidityPercent: higher }))
          .toBeGreaterThan(equilibriumMoistureContent({ temperatureF: t, relativeHumidityPercent: rh }));
      }));
  });

  it('is zero in perfectly dry air', () => {
    expect(equilibriumMoistureContent({ temperatureF: 70, relativeHumidityPercent: 0 })).toBe(0);
  });

  it('refuses humidity outside 0–100 % and temperatures that are not numbers', () => {
    expect(() => equilibriumMoistureContent({ temperatureF: 70, relativeHumidityPercent: 101 })).toThrow(WoodMathError);
    expect(() => equilibriumMoistureContentC({ temperatureC: 20, relativeHumidityPercent: -1 })).toThrow(/relativeHumidityPercent/);
    expect(() => equilibriumMoistureContent({ temperatureF: Number.NaN, relativeHumidityPercent: 50 })).toThrow(/temperatureF/);
    expect(() => equilibriumMoistureContentC({ temperatureC: 150, relativeHumidityPercent: 50 })).toThrow(WoodMathError);
  });
});

describe('moistureContentPercent (ASTM D4442, oven-dry basis)', () => {
  it('reads 1,100 g wet over 1,000 g oven-dry as 10.0 %', () => {
    // ASTM D4442 oven-dry formula: (1100 − 1000) / 1000 × 100 = 10 %, tolerance 1e-9
    expect(moistureContentPercent({ wetMass: 1100, ovenDryMass: 1000 })).toBeCloseTo(10, 9);
  });

  it('goes above 100 % for very wet wood', () => {
    // ASTM D4442: MC is a share of oven-dry mass, so it can exceed 100 % (read); tolerance 1e-9
    expect(moistureContentPercent({ wetMass: 2500, ovenDryMass: 1000 })).toBeCloseTo(150, 9);
  });

  it('is 0 % for oven-dry wood and 30 % at the average fiber saturation point', () => {
    // ASTM D4442; fiber saturation about 30 % MC (WH2010 p. 4-2, read); tolerance 1e-9
    expect(moistureContentPercent({ wetMass: 500, ovenDryMass: 500 })).toBe(0);
    expect(moistureContentPercent({ wetMass: 1300, ovenDryMass: 1000 })).toBeCloseTo(FIBER_SATURATION_MC, 9);
  });

  it('refuses a wet mass below the dry mass or a zero dry mass', () => {
    expect(() => moistureContentPercent({ wetMass: 900, ovenDryMass: 1000 })).toThrow(/wetMass/);
    expect(() => moistureContentPercent({ wetMass: 900, ovenDryMass: 0 })).toThrow(WoodMathError);
  });
});

describe('maxMoistureContentPercent', () => {
  it('black walnut (basic SG 0.51) can hold at most about 131 % MC', async () => {
    const { maxMoistureContentPercent } = await import('../../../shared/wood');
    // Wood Handbook FPL-GTR-190 ch. 4, maximum moisture content M_max = 100(1.54 − Gb)/(1.54 Gb),
    // with Gb = 0.51 (ch. 5 tables): 100 × 1.03 / 0.7854 = 131.1 %. Tolerance ±0.1.
    expect(maxMoistureContentPercent(0.51)).toBeCloseTo(131.1, 1);
  });
  it('denser wood holds less water: white oak (Gb 0.60) about 102 %', async () => {
    const { maxMoistureContentPercent } = await import('../../../shared/wood');
    // Same equation, Gb = 0.60 (Wood Handbook ch. 5): 100 × 0.94 / 0.924 = 101.7 %.
    expect(maxMoistureContentPercent(0.6)).toBeCloseTo(101.7, 1);
  });
});

describe('moisture content upper limits', () => {
  it('refuses a moisture content more water than any wood can hold', async () => {
    const { ABSOLUTE_MAX_MOISTURE_CONTENT_PERCENT, dryingStateFor, maxMoistureContentPercent } = await import('../../../shared/wood');
    // maximum MC equation (Wood Handbook FPL-GTR-190 ch. 4) at G_b 0.10, lighter than any commercial timber: about 935 %
    expect(ABSOLUTE_MAX_MOISTURE_CONTENT_PERCENT).toBeCloseTo(maxMoistureContentPercent(0.1), 9);
    expect(ABSOLUTE_MAX_MOISTURE_CONTENT_PERCENT).toBeCloseTo(935.1, 1);
    expect(() => moistureContentPercent({ wetMass: 1e9, ovenDryMass: 1 })).toThrow(/wetMass/);
    expect(() => moistureContentPercent({ wetMass: 1e300, ovenDryMass: 1e-300 })).toThrow(WoodMathError);
    expect(() => dryingStateFor({ mcPercent: 5000, targetMcPercent: 8 })).toThrow(/mcPercent/);
  });
});
