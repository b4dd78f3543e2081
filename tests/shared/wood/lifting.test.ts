import { describe, expect, it } from 'vitest';
import { lifting, slabWeightLb, WoodMathError } from '../../../shared/wood';

// One person per 51 lb: NIOSH revised lifting equation load constant, NIOSH Pub. 94-110 (read);
// sharing the load evenly between people is common practice; the 200 lb equipment line is the demo mill's choice.
describe('lifting', () => {
  it('lets one person lift up to the 51 lb load constant', () => {
    expect(lifting({ weightLb: 51 })).toMatchObject({ peopleNeeded: 1, needsEquipment: false });
    expect(lifting({ weightLb: 10 }).peopleNeeded).toBe(1);
  });

  it('adds a person for every further 51 lb', () => {
    expect(lifting({ weightLb: 52 }).peopleNeeded).toBe(2);
    expect(lifting({ weightLb: 153 }).peopleNeeded).toBe(3);
  });

  it('asks for equipment above 200 lb and always defers to local rules', () => {
    const heavy = lifting({ weightLb: 250 });
    expect(heavy.needsEquipment).toBe(true);
    expect(heavy.message).toMatch(/cart|forklift|hoist/);
    expect(lifting({ weightLb: 200 }).needsEquipment).toBe(false);
    for (const w of [20, 120, 250]) expect(lifting({ weightLb: w }).message).toMatch(/local rules/i);
  });

  it('sends a 3 × 30 in × 10 ft white oak slab at 20 % MC to the forklift', () => {
    const weightLb = slabWeightLb({ speciesSlug: 'white-oak', thicknessIn: 3, widthIn: 30, lengthIn: 120, mcPercent: 20 });
    expect(lifting({ weightLb }).needsEquipment).toBe(true);
  });

  it('refuses a zero or missing weight', () => {
    expect(() => lifting({ weightLb: 0 })).toThrow(WoodMathError);
    expect(() => lifting({ weightLb: Number.NaN })).toThrow(/weightLb/);
  });
});
