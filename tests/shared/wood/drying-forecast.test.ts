import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { DEFAULT_YARD_EMC_PERCENT, dryingForecast, WoodMathError } from '../../../shared/wood';

const DAY = 86_400_000;
const addDays = (iso: string, days: number) => new Date(Date.parse(`${iso}T00:00:00Z`) + days * DAY).toISOString().slice(0, 10);
const daysBetween = (a: string, b: string) => (Date.parse(`${b}T00:00:00Z`) - Date.parse(`${a}T00:00:00Z`)) / DAY;
/** Readings on an exact exponential approach to the EMC: MC(t) = E + (M0 − E)·e^(−k t). */
const curve = (start: string, m0: number, emc: number, k: number, days: number[]) =>
  days.map((d) => ({ measuredOn: addDays(start, d), mcPercent: emc + (m0 - emc) * Math.exp(-k * d) }));

// Model: exponential approach to the EMC (first-order drying curve, common practice), fitted by least squares on ln(MC − EMC).
describe('dryingForecast on synthetic curves with known answers', () => {
  it('finds the day an exact curve reaches the target', () => {
    // E 12, M0 60, k 0.02/day: reaches 20 % at ln(48/8)/0.02 = 89.59 days → day 90
    const f = dryingForecast({ readings: curve('2025-04-01', 60, 12, 0.02, [0, 20, 45]), targetMcPercent: 20, emcPercent: 12 });
    expect(f.basis).toBe('fitted-curve');
    expect(f.expectedOn).toBe(addDays('2025-04-01', 90));
    expect(f.earliestOn! <= f.expectedOn!).toBe(true);
    expect(f.latestOn! >= f.expectedOn!).toBe(true);
    expect(daysBetween(f.earliestOn!, f.latestOn!)).toBeLessThanOrEqual(1); // no scatter, no spread
    expect(f.ratePerDay).toBeCloseTo(0.02, 9);
    expect(f.method).toMatch(/exponential approach/);
  });

  it('recovers any exact curve to within a day, whatever the order of the readings (property)', () => {
    fc.assert(fc.property(
      fc.double({ min: 35, max: 120, noNaN: true }), fc.double({ min: 6, max: 16, noNaN: true }), fc.double({ min: 0.002, max: 0.05, noNaN: true }),
      fc.uniqueArray(fc.integer({ min: 0, max: 120 }), { minLength: 3, maxLength: 8 }),
      (m0, emc, k, days) => {
        const target = emc + 4;
        const truth = Math.log((m0 - emc) / (target - emc)) / k;
        const start = '2024-05-10';
        const f = dryingForecast({ readings: curve(start, m0, emc, k, days).reverse(), targetMcPercent: target, emcPercent: emc });
        if (truth <= Math.max(...days)) return; // the target falls inside the readings; covered by the already-reached test
        expect(f.basis).toBe('fitted-curve');
        expect(Math.abs(daysBetween(start, f.expectedOn!) - Math.ceil(truth))).toBeLessThanOrEqual(1);
      }));
  });

  it('widens the range with scattered readings and keeps the true date inside it', () => {
    // the same curve with ±1.5 point meter scatter
    const noisy = curve('2025-04-01', 60, 12, 0.02, [0, 10, 20, 30, 40, 50]).map((r, i) => ({ ...r, mcPercent: r.mcPercent + [1.5, -1.5, 1, -1, 1.5, -1.5][i] }));
    const f = dryingForecast({ readings: noisy, targetMcPercent: 20, emcPercent: 12 });
    const truth = addDays('2025-04-01', 90);
    expect(f.earliestOn! <= truth && truth <= f.latestOn!).toBe(true);
    expect(daysBetween(f.earliestOn!, f.latestOn!)).toBeGreaterThan(5);
  });

  it('averages readings taken on the same day and ignores no reading silently', () => {
    const f = dryingForecast({ readings: [{ measuredOn: '2025-01-01', mcPercent: 40 }, { measuredOn: '2025-01-01', mcPercent: 44 }, { measuredOn: '2025-01-31', mcPercent: 30 }],
      targetMcPercent: 20, thicknessIn: 2, startedOn: '2024-12-15' });
    expect(f.usableReadings).toBe(2);
    expect(f.basis).toBe('rule-of-thumb');
  });
});

describe('dryingForecast against published air-drying data', () => {
  // FPL Report 2086 (USDA Forest Products Laboratory, 1957; read): 4/4 sugar maple air-dried in Upper Michigan reached 20 % MC
  // in 40–205 days, about 90 on average. Outdoor EMC in the northern US about 12 % (Wood Handbook FPL-GTR-190 ch. 13; FPL
  // Technical Note F-13, read). Green sugar maple about 72 % (Wood Handbook Table 4-1, from memory).
  it('forecasts a 4/4 sugar maple board on the published average curve inside the published 40–205 day range', () => {
    const k = Math.log((72 - 12) / (20 - 12)) / 90; // the exponential curve through green and 20 % at day 90
    const f = dryingForecast({ readings: curve('2025-05-01', 72, 12, k, [0, 14, 28]), targetMcPercent: 20, emcPercent: 12 });
    const days = daysBetween('2025-05-01', f.expectedOn!);
    expect(days).toBeGreaterThanOrEqual(40);
    expect(days).toBeLessThanOrEqual(205);
    expect(Math.abs(days - 90)).toBeLessThanOrEqual(1);
  });

  it('falls back to the year-per-inch rule of thumb with fewer than three readings, and says it is slower than the published data', () => {
    const f = dryingForecast({ readings: [{ measuredOn: '2025-05-01', mcPercent: 72 }], targetMcPercent: 20, thicknessIn: 1, startedOn: '2025-05-01' });
    expect(f.basis).toBe('rule-of-thumb');
    expect(f.method).toMatch(/one year of air drying per inch/);
    expect(f.method).toMatch(/common practice/);
    expect(f.expectedOn).toBe('2026-05-01');
    expect(f.earliestOn).toBe('2025-11-01');
    expect(f.latestOn).toBe('2026-11-01');
    // 365 days for 4/4 stock is past the 205-day end of the FPL Report 2086 range: the rule is only a fallback.
    expect(daysBetween('2025-05-01', f.expectedOn!)).toBeGreaterThan(205);
  });
});

describe('dryingForecast edge cases', () => {
  it('says when the target is already reached', () => {
    const f = dryingForecast({ readings: [{ measuredOn: '2025-01-01', mcPercent: 30 }, { measuredOn: '2025-03-01', mcPercent: 19 }, { measuredOn: '2025-04-01', mcPercent: 17 }], targetMcPercent: 20 });
    expect(f).toMatchObject({ basis: 'already-reached', expectedOn: '2025-03-01', earliestOn: '2025-03-01', latestOn: '2025-03-01' });
  });

  it('says air drying cannot reach a target at or below the yard EMC', () => {
    const f = dryingForecast({ readings: curve('2025-04-01', 60, 12, 0.02, [0, 20, 45]), targetMcPercent: 8 });
    expect(f).toMatchObject({ basis: 'not-reachable', expectedOn: null, earliestOn: null, latestOn: null, emcPercent: DEFAULT_YARD_EMC_PERCENT });
    expect(f.method).toMatch(/kiln/);
  });

  it('says what it needs when there are too few readings and no thickness or start date', () => {
    const f = dryingForecast({ readings: [], targetMcPercent: 20 });
    expect(f).toMatchObject({ basis: 'not-enough-data', expectedOn: null });
    expect(f.method).toMatch(/thickness/);
  });

  it('does not fit a curve to readings that are not falling', () => {
    const flat = [0, 30, 60].map((d) => ({ measuredOn: addDays('2025-01-01', d), mcPercent: 40 + d / 30 }));
    const f = dryingForecast({ readings: flat, targetMcPercent: 20, thicknessIn: 2, startedOn: '2024-12-01' });
    expect(f.basis).toBe('rule-of-thumb');
    expect(f.method).toMatch(/do not show the slab drying/);
  });

  it('caps a very slow forecast at the horizon and says so, never an invalid date', () => {
    const slow = curve('2025-01-01', 40, 12, 0.00001, [0, 30, 60]);
    const f = dryingForecast({ readings: slow, targetMcPercent: 20 });
    for (const d of [f.expectedOn, f.earliestOn, f.latestOn]) expect(d).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    expect(f.method).toMatch(/10 years/);
  });

  it('refuses bad dates and impossible moisture contents', () => {
    expect(() => dryingForecast({ readings: [{ measuredOn: '2025-02-31', mcPercent: 30 }], targetMcPercent: 20 })).toThrow(/measuredOn/);
    expect(() => dryingForecast({ readings: [{ measuredOn: '99999-01-01', mcPercent: 30 }], targetMcPercent: 20 })).toThrow(WoodMathError);
    expect(() => dryingForecast({ readings: [{ measuredOn: '2025-01-01', mcPercent: 5000 }], targetMcPercent: 20 })).toThrow(/mcPercent/);
    expect(() => dryingForecast({ readings: [], targetMcPercent: 40 })).toThrow(/targetMcPercent/);
    expect(() => dryingForecast({ readings: [], targetMcPercent: 20, thicknessIn: 1e6, startedOn: '2025-01-01' })).toThrow(/thicknessIn/);
  });
});
