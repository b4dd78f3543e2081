import { requirePositive } from './errors';

export type LiftingInput = { weightLb: number };
export type LiftingAdvice = { peopleNeeded: number; needsEquipment: boolean; message: string };

/**
 * Load constant of the revised NIOSH lifting equation (NIOSH Pub. 94-110):
 * 51 lb (23 kg), the most one person should lift even in ideal posture.
 */
export const NIOSH_LOAD_CONSTANT_LB = 51;
/** Above this Stickerline asks for a cart, forklift or hoist rather than more hands. */
export const EQUIPMENT_ABOVE_LB = 200;

/** One person per 51 lb of slab, shared evenly (common practice). */
export function lifting({ weightLb }: LiftingInput): LiftingAdvice {
  requirePositive(weightLb, 'weightLb');
  const peopleNeeded = Math.max(1, Math.ceil(weightLb / NIOSH_LOAD_CONSTANT_LB));
  const needsEquipment = weightLb > EQUIPMENT_ABOVE_LB;
  const lb = Math.round(weightLb);
  const message = needsEquipment
    ? `About ${lb} lb. Too heavy to carry safely by hand: move it with a slab cart, forklift or hoist, ` +
      `with at least ${peopleNeeded} people to guide it. Follow local rules.`
    : peopleNeeded === 1
      ? `About ${lb} lb. One person can lift it with a straight back and the load close to the body. Follow local rules.`
      : `About ${lb} lb. Lift with at least ${peopleNeeded} people, sharing the weight evenly. Follow local rules.`;
  return { peopleNeeded, needsEquipment, message };
}
