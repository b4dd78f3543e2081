import { describe, expect, it } from 'vitest';
import {
  EQUIPMENT_CAUTION, FINISHING_CAUTION, MOVE_TO_STACK_CAUTION, SAFETY_CAUTIONS, SAWING_CAUTION, STAFF_DUST_NOISE_CAUTION,
} from '../../shared/safety';

describe('safety cautions', () => {
  it('each defers to local rules and licensed practice', () => {
    for (const c of SAFETY_CAUTIONS) {
      expect(c.text).toMatch(/local rules/);
      expect(c.text).toMatch(/licensed practice/);
    }
    expect(new Set(SAFETY_CAUTIONS.map((c) => c.id)).size).toBe(SAFETY_CAUTIONS.length);
  });

  it('covers what each job actually risks (common practice; IARC Monograph vol. 62; NIOSH Pub. 94-110)', () => {
    expect(FINISHING_CAUTION.text).toMatch(/fresh air/);
    expect(FINISHING_CAUTION.text).toMatch(/label/);
    expect(FINISHING_CAUTION.text).toMatch(/rags.*catch fire/is);
    expect(FINISHING_CAUTION.text).toMatch(/local fire rules/);
    expect(EQUIPMENT_CAUTION.text).toMatch(/trained operators only/);
    expect(EQUIPMENT_CAUTION.text).toMatch(/certified/);
    expect(STAFF_DUST_NOISE_CAUTION.text).toMatch(/dust collection/);
    expect(STAFF_DUST_NOISE_CAUTION.text).toMatch(/hearing/);
    expect(STAFF_DUST_NOISE_CAUTION.text).toMatch(/IARC Monograph vol\. 62/);
    expect(MOVE_TO_STACK_CAUTION.text).toMatch(/NIOSH Pub\. 94-110/);
    expect(MOVE_TO_STACK_CAUTION.text).toMatch(/slab cart/);
    expect(SAWING_CAUTION.text).toMatch(/trained/);
    expect(SAWING_CAUTION.text).toMatch(/kick back/);
    expect(SAWING_CAUTION.text).toMatch(/bystanders/);
    expect(SAWING_CAUTION.text).toMatch(/saw maker’s instructions/);
  });
});
