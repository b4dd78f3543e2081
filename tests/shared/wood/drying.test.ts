import { describe, expect, it } from 'vitest';
import { airDryReadyDate, DRYING_STATES, dryingStateFor, WoodMathError } from '../../../shared/wood';

describe('airDryReadyDate (one year per inch of thickness, common practice)', () => {
  it('gives a 2 in slab milled in March two years in the yard', () => {
    expect(airDryReadyDate({ milledOn: '2024-03-15', thicknessIn: 2 }).toISOString().slice(0, 10)).toBe('2026-03-15');
  });

  it('counts part of an inch as the matching share of a year, in whole months', () => {
    expect(airDryReadyDate({ milledOn: new Date(Date.UTC(2024, 2, 15)), thicknessIn: 1.5 }).toISOString().slice(0, 10)).toBe('2025-09-15');
    expect(airDryReadyDate({ milledOn: '2024-03-15', thicknessIn: 1.3 }).toISOString().slice(0, 10)).toBe('2025-07-15'); // 15.6 → 16 months
  });

  it('keeps a month-end milling date at the end of a shorter month', () => {
    expect(airDryReadyDate({ milledOn: '2023-01-31', thicknessIn: 1 / 12 }).toISOString().slice(0, 10)).toBe('2023-02-28');
  });

  it('does not change the date it was given', () => {
    const milledOn = new Date(Date.UTC(2024, 0, 1));
    airDryReadyDate({ milledOn, thicknessIn: 2 });
    expect(milledOn.toISOString()).toBe('2024-01-01T00:00:00.000Z');
  });

  it('refuses a bad date or a zero thickness', () => {
    expect(() => airDryReadyDate({ milledOn: 'last spring', thicknessIn: 2 })).toThrow(/milledOn/);
    expect(() => airDryReadyDate({ milledOn: '2024-01-01', thicknessIn: 0 })).toThrow(WoodMathError);
  });
});

describe('dryingStateFor', () => {
  const target = { targetMcPercent: 8 };

  it('calls wood above fiber saturation green', () => {
    // fiber saturation about 30 % MC (USDA FPL Wood Handbook FPL-GTR-190, p. 4-2, read)
    expect(dryingStateFor({ mcPercent: 65, ...target })).toBe('green');
    expect(dryingStateFor({ mcPercent: 30.5, ...target })).toBe('green');
    expect(dryingStateFor({ mcPercent: 30, ...target })).toBe('air-drying');
  });

  it('calls wood air-dry at 20 % or below', () => {
    // air drying reaches about 20–25 % MC (WH2010 ch. 13; FPL Technical Note F-13, read)
    expect(dryingStateFor({ mcPercent: 24, ...target })).toBe('air-drying');
    expect(dryingStateFor({ mcPercent: 20, ...target })).toBe('air-dry');
    expect(dryingStateFor({ mcPercent: 12, ...target })).toBe('air-dry');
  });

  it('calls wood shop-dry at or below the mill target and respects a custom air-dry line', () => {
    // furniture stock is dried to 6–8 % (WH2010 ch. 13, read); the 8 % target is the demo mill's choice
    expect(dryingStateFor({ mcPercent: 8, ...target })).toBe('shop-dry');
    expect(dryingStateFor({ mcPercent: 22, ...target, airDryMcPercent: 25 })).toBe('air-dry');
  });

  it('refuses a target above the air-dry line and a negative MC', () => {
    expect(() => dryingStateFor({ mcPercent: 10, targetMcPercent: 22 })).toThrow(/targetMcPercent/);
    expect(() => dryingStateFor({ mcPercent: -1, targetMcPercent: 8 })).toThrow(WoodMathError);
  });

  it('lists every state once, wettest first, each with a plain-words description', () => {
    expect(DRYING_STATES.map((s) => s.state)).toEqual(['green', 'air-drying', 'air-dry', 'shop-dry']);
    for (const s of DRYING_STATES) expect(s.description.length).toBeGreaterThan(30);
  });
});

describe('airDryReadyDate limits', () => {
  it('refuses an absurd thickness or date instead of returning an invalid date', () => {
    expect(() => airDryReadyDate({ milledOn: '2024-01-01', thicknessIn: 1e6 })).toThrow(/thicknessIn/);
    expect(() => airDryReadyDate({ milledOn: '275760-01-01', thicknessIn: 2 })).toThrow(/milledOn/);
    expect(() => airDryReadyDate({ milledOn: '2024-02-30', thicknessIn: 2 })).toThrow(/milledOn/);
  });
});
