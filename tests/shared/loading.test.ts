import { describe, expect, it } from 'vitest';
import { loadingAdvice } from '../../shared/loading';

// Lifting limits from the revised NIOSH lifting equation (NIOSH Pub. 94-110) for a slab lifted from the floor;
// the two-person team limit is common practice. Vehicle figures are common practice (see shared/loading.ts).
describe('loadingAdvice', () => {
  it('never asks the buyer to bring a crew for a heavy slab: the mill loads it with equipment', () => {
    const advice = loadingAdvice([{ weightLb: 1200, lengthIn: 120 }])!;
    expect(advice.needsEquipment).toBe(true);
    expect(advice.millHelpRecommended).toBe(true);
    expect(advice.peopleNeeded).toBe(0);
    expect(advice.bring.join(' ')).not.toMatch(/\d+ people/);
    expect(advice.bring.join(' ')).toMatch(/loading help/);
    expect(advice.caution).toMatch(/trained operators only/);
    expect(advice.caution).toMatch(/NIOSH Pub\. 94-110/);
  });

  it('asks for at most two people, and only for a light slab', () => {
    const light = loadingAdvice([{ weightLb: 18, lengthIn: 30 }])!;
    expect(light.peopleNeeded).toBe(2);
    expect(light.bring).toContain('2 people to lift the heaviest slab (about 18 lb)');
    expect(light.millHelpRecommended).toBe(false);
  });

  it('gives the same advice for 200 lb and 200.4 lb', () => {
    const a = loadingAdvice([{ weightLb: 200, lengthIn: 96 }])!;
    const b = loadingAdvice([{ weightLb: 200.4, lengthIn: 96 }])!;
    expect(b.bring).toEqual(a.bring);
    expect(b.liftingMessage).toBe(a.liftingMessage);
    expect(b.millHelpRecommended).toBe(a.millHelpRecommended);
  });
});
