import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  lifting, recommendedWeightLimit, slabWeightLb, SLAB_LIFT_RWL_LB, TYPICAL_SLAB_LIFT, WoodMathError,
} from '../../../shared/wood';

// Revised NIOSH lifting equation, NIOSH Pub. 94-110 (Applications Manual, 1994), U.S. units (read):
// RWL = 51 · (10/H) · (1 − 0.0075|V − 30|) · (0.82 + 1.8/D) · (1 − 0.0032A) · FM · CM; coupling: poor 0.90.
// Team lifts are not covered by the equation; "two people, about two-thirds of their combined limits" is common practice.
describe('recommendedWeightLimit (NIOSH Pub. 94-110)', () => {
  it('is the 51 lb load constant only for an ideal lift', () => {
    const ideal = recommendedWeightLimit({ horizontalIn: 10, verticalIn: 30, travelIn: 10, asymmetryDeg: 0, frequencyMultiplier: 1, coupling: 'good' });
    expect(ideal.rwlLb).toBeCloseTo(51, 9);
  });

  it('is about 15.7 lb for a slab lifted from the floor, held 20 in out, raised 30 in, with a poor grip', () => {
    // HM 10/20 = 0.5; VM 1 − 0.0075·30 = 0.775; DM 0.82 + 1.8/30 = 0.88; AM 1; FM 1.00 (occasional); CM 0.90 (poor).
    // 51 × 0.5 × 0.775 × 0.88 × 0.9 = 15.65 lb; tolerance ±0.01 lb
    const r = recommendedWeightLimit(TYPICAL_SLAB_LIFT);
    expect(r.multipliers).toEqual({ HM: 0.5, VM: 0.775, DM: expect.closeTo(0.88, 12), AM: 1, FM: 1, CM: 0.9 });
    expect(Math.abs(r.rwlLb - 15.65)).toBeLessThanOrEqual(0.01);
    expect(SLAB_LIFT_RWL_LB).toBe(r.rwlLb);
  });

  it('drops to zero when the load is out of reach (H over 25 in) and follows each multiplier formula', () => {
    const g = { ...TYPICAL_SLAB_LIFT };
    expect(recommendedWeightLimit({ ...g, horizontalIn: 26 }).rwlLb).toBe(0);
    expect(recommendedWeightLimit({ ...g, horizontalIn: 25 }).multipliers.HM).toBeCloseTo(0.4, 12);
    expect(recommendedWeightLimit({ ...g, verticalIn: 75 }).multipliers.VM).toBe(0);
    expect(recommendedWeightLimit({ ...g, asymmetryDeg: 90 }).multipliers.AM).toBeCloseTo(1 - 0.288, 12);
    expect(recommendedWeightLimit({ ...g, coupling: 'fair' }).multipliers.CM).toBe(0.95);
  });
});

describe('lifting advice for one slab', () => {
  it('lets one person lift only up to the recommended limit, not up to 51 lb', () => {
    expect(lifting({ weightLb: 12 })).toMatchObject({ tier: 'one-person', peopleNeeded: 1, needsEquipment: false });
    const fifty = lifting({ weightLb: 50 });
    expect(fifty.tier).not.toBe('one-person');
    expect(fifty.liftingIndex).toBeCloseTo(50 / 15.65, 1); // lifting index = load / RWL
  });

  it('advises two people only within the common-practice team limit, and never more than two', () => {
    expect(lifting({ weightLb: 18 })).toMatchObject({ tier: 'two-person', peopleNeeded: 2 });
    const team = lifting({ weightLb: 18 }).teamLimitLb;
    expect(team).toBe(Math.floor(15.652 * 2 * (2 / 3)));
    expect(lifting({ weightLb: team + 1 }).tier).toBe('equipment');
  });

  it('sends a 1,200 lb slab to a cart, forklift or hoist run by trained people, with no crew count', () => {
    const heavy = lifting({ weightLb: 1200 });
    expect(heavy).toMatchObject({ tier: 'equipment', needsEquipment: true, peopleNeeded: 0 });
    expect(heavy.message).toMatch(/cart/);
    expect(heavy.message).toMatch(/forklift or hoist/);
    expect(heavy.message).toMatch(/trained operators only/);
    expect(heavy.message).not.toMatch(/\d+ people/);
  });

  it('gives 200 lb and 200.4 lb the same advice', () => {
    expect(lifting({ weightLb: 200.4 })).toEqual(lifting({ weightLb: 200 }));
  });

  it('never gets less strict as the weight rises, and two weights that read the same get the same advice (property)', () => {
    const rank = { 'one-person': 0, 'two-person': 1, equipment: 2 } as const;
    fc.assert(fc.property(fc.double({ min: 0.01, max: 20_000, noNaN: true }), fc.double({ min: 0, max: 5000, noNaN: true }), (w, step) => {
      const lighter = lifting({ weightLb: w });
      const heavier = lifting({ weightLb: Math.min(20_000, w + step) });
      expect(rank[heavier.tier]).toBeGreaterThanOrEqual(rank[lighter.tier]);
      const sameReading = Math.round(w) + 0.3;
      if (sameReading <= 20_000 && Math.round(w) >= 1) expect(lifting({ weightLb: sameReading })).toEqual(lifting({ weightLb: Math.round(w) }));
      expect(lighter.message).toContain(`About ${lighter.weightLb} lb`);
      expect(lighter.message).toMatch(/local rules/i);
      expect(lighter.peopleNeeded).toBeLessThanOrEqual(2);
    }));
  });

  it('states the assumed lift and the sources', () => {
    const a = lifting({ weightLb: 30 });
    expect(a.basis).toMatch(/NIOSH Pub\. 94-110/);
    expect(a.basis).toMatch(/from the floor/);
    expect(a.basis).toMatch(/poor grip/);
    expect(a.basis).toMatch(/common practice/);
  });

  it('sends a 3 × 30 in × 10 ft white oak slab at 20 % MC to the forklift', () => {
    const weightLb = slabWeightLb({ speciesSlug: 'white-oak', thicknessIn: 3, widthIn: 30, lengthIn: 120, mcPercent: 20 });
    expect(lifting({ weightLb }).needsEquipment).toBe(true);
  });

  it('refuses a zero, missing or absurd weight', () => {
    expect(() => lifting({ weightLb: 0 })).toThrow(WoodMathError);
    expect(() => lifting({ weightLb: Number.NaN })).toThrow(/weightLb/);
    expect(() => lifting({ weightLb: 1e9 })).toThrow(/weightLb/);
  });
});
