import { requireAtMost, requireInRange, requirePositive } from './errors';
import { WOOD_LIMITS } from './limits';

/**
 * Revised NIOSH lifting equation (NIOSH Pub. 94-110, Applications Manual for the Revised NIOSH
 * Lifting Equation, 1994), U.S. units:
 *   RWL = LC · HM · VM · DM · AM · FM · CM
 *   LC = 51 lb; HM = 10/H; VM = 1 − 0.0075·|V − 30|; DM = 0.82 + 1.8/D; AM = 1 − 0.0032·A;
 *   FM and CM from the manual's tables. Lifting index LI = load / RWL; above 1 the lift carries
 *   elevated risk for some workers. The equation covers one person's two-handed lift only.
 */
export const NIOSH_LOAD_CONSTANT_LB = 51;

export type LiftGeometry = {
  /** Hands' horizontal distance in front of the ankles' midpoint, in (10–25; beyond 25 the load is out of reach). */
  horizontalIn: number;
  /** Hands' height above the floor at the start of the lift, in (0–70). */
  verticalIn: number;
  /** Vertical travel of the hands, in (10–70). */
  travelIn: number;
  /** Twist of the torso, degrees (0–135). */
  asymmetryDeg: number;
  /** Frequency multiplier from the manual's table. */
  frequencyMultiplier: number;
  coupling: 'good' | 'fair' | 'poor';
};

/**
 * The geometry Stickerline assumes for lifting a slab by hand (stated on the page): it starts
 * on the floor or low stickers (V = 0 in), a wide slab keeps the hands well out from the body
 * (H = 20 in), it is raised onto a cart or tailgate about 30 in up (D = 30 in), with no twist,
 * an occasional lift (at most one every five minutes for under an hour: FM 1.00) and a poor
 * grip, because a slab has no handles and its live edges are rough (CM 0.90 below 30 in).
 */
export const TYPICAL_SLAB_LIFT: LiftGeometry = {
  horizontalIn: 20, verticalIn: 0, travelIn: 30, asymmetryDeg: 0, frequencyMultiplier: 1, coupling: 'poor',
};

export const TYPICAL_SLAB_LIFT_WORDS =
  'lifted from the floor, held about 20 in out from the body because the slab is wide, raised about 30 in ' +
  'onto a cart or tailgate, no twisting, an occasional lift, and a poor grip (no handles, rough edges)';

export type RecommendedWeightLimit = {
  rwlLb: number;
  multipliers: { HM: number; VM: number; DM: number; AM: number; FM: number; CM: number };
};

/** RWL for a lift geometry, with each multiplier (NIOSH Pub. 94-110, section 1.3). */
export function recommendedWeightLimit(g: LiftGeometry = TYPICAL_SLAB_LIFT): RecommendedWeightLimit {
  requireInRange(g.horizontalIn, 'horizontalIn', 0, 100);
  requireInRange(g.verticalIn, 'verticalIn', 0, 100);
  requireInRange(g.travelIn, 'travelIn', 0, 100);
  requireInRange(g.asymmetryDeg, 'asymmetryDeg', 0, 180);
  requireInRange(g.frequencyMultiplier, 'frequencyMultiplier', 0, 1);
  // Below the minimum distances the multiplier is 1; beyond the maximum it is 0 (the lift is out of range).
  const HM = g.horizontalIn <= 10 ? 1 : g.horizontalIn > 25 ? 0 : 10 / g.horizontalIn;
  const VM = g.verticalIn > 70 ? 0 : 1 - 0.0075 * Math.abs(g.verticalIn - 30);
  const DM = g.travelIn <= 10 ? 1 : g.travelIn > 70 ? 0 : 0.82 + 1.8 / g.travelIn;
  const AM = g.asymmetryDeg > 135 ? 0 : 1 - 0.0032 * g.asymmetryDeg;
  const FM = g.frequencyMultiplier;
  // Coupling table: good 1.00; fair 0.95 below 30 in, 1.00 at or above; poor 0.90.
  const CM = g.coupling === 'good' ? 1 : g.coupling === 'fair' ? (g.verticalIn < 30 ? 0.95 : 1) : 0.9;
  return { rwlLb: NIOSH_LOAD_CONSTANT_LB * HM * VM * DM * AM * FM * CM, multipliers: { HM, VM, DM, AM, FM, CM } };
}

/** RWL for the typical slab lift: 51 × 0.5 × 0.775 × 0.88 × 1 × 1 × 0.9 ≈ 15.7 lb. */
export const SLAB_LIFT_RWL_LB = recommendedWeightLimit(TYPICAL_SLAB_LIFT).rwlLb;

/**
 * Team lifts (common practice): the NIOSH equation does not cover them and they are not simply
 * additive, because people cannot share a load evenly. A common rule of thumb credits a team of
 * two with about two-thirds of the sum of their own limits. Stickerline never advises more than
 * two people carrying a slab by hand; anything heavier goes on a cart, forklift or hoist.
 */
export const TEAM_OF_TWO_SHARE = 2 / 3;
export const MAX_HAND_CREW = 2;

export type LiftingInput = { weightLb: number };
export type LiftingTier = 'one-person' | 'two-person' | 'equipment';
export type LiftingAdvice = {
  tier: LiftingTier;
  /** People for a hand lift: 1 or 2. 0 when the slab must be moved with equipment. */
  peopleNeeded: number;
  needsEquipment: boolean;
  /** The weight the advice was decided on: whole pounds, the figure printed in the message. */
  weightLb: number;
  /** Recommended weight limit for one person in the typical slab lift, whole pounds. */
  recommendedLimitLb: number;
  /** Most a team of two should carry, whole pounds (common practice). */
  teamLimitLb: number;
  /** Load ÷ RWL (NIOSH Pub. 94-110), 1 decimal. */
  liftingIndex: number;
  message: string;
  /** The assumed geometry and the sources, in plain words. */
  basis: string;
};

/** Whole pounds, the way the limits are printed. */
const ONE_PERSON_LIMIT_LB = Math.floor(SLAB_LIFT_RWL_LB);
const TEAM_LIMIT_LB = Math.floor(SLAB_LIFT_RWL_LB * MAX_HAND_CREW * TEAM_OF_TWO_SHARE);

export const LIFTING_BASIS =
  `Recommended weight limit from the revised NIOSH lifting equation (NIOSH Pub. 94-110) for a typical slab lift — ` +
  `${TYPICAL_SLAB_LIFT_WORDS}: about ${ONE_PERSON_LIMIT_LB} lb for one person. The 51 lb load constant holds only in ideal ` +
  `conditions. A team of two is credited with about two-thirds of their combined limits, about ${TEAM_LIMIT_LB} lb ` +
  '(common practice; the equation itself covers one person).';

/**
 * Advice for moving one slab by hand. The decision is made on the weight rounded to whole pounds,
 * the same figure the message prints, so two weights that read the same always get the same advice,
 * and the tiers only ever get stricter as the weight rises.
 */
export function lifting({ weightLb }: LiftingInput): LiftingAdvice {
  requirePositive(weightLb, 'weightLb');
  requireAtMost(weightLb, 'weightLb', WOOD_LIMITS.weightLb, 'lb');
  const lb = Math.max(1, Math.round(weightLb));
  const liftingIndex = Math.round((lb / SLAB_LIFT_RWL_LB) * 10) / 10;
  const tier: LiftingTier = lb <= ONE_PERSON_LIMIT_LB ? 'one-person' : lb <= TEAM_LIMIT_LB ? 'two-person' : 'equipment';
  const equipmentWords =
    'Do not carry it by hand: move it on a slab cart or dolly, or have it lifted with a forklift or hoist. ' +
    'Forklifts and hoists are for trained operators only (certified where your local rules require it); keep clear of a raised load.';
  const message =
    tier === 'one-person'
      ? `About ${lb} lb, within the recommended limit of about ${ONE_PERSON_LIMIT_LB} lb for one person lifting a slab from the floor. ` +
        'Keep it close, lift with your legs and a straight back, and do not twist. Follow local rules.'
      : tier === 'two-person'
        ? `About ${lb} lb, over the one-person limit of about ${ONE_PERSON_LIMIT_LB} lb (lifting index ${liftingIndex}). ` +
          'Lift it with two people, agree who calls the lift, and lift together. Follow local rules.'
        : `About ${lb} lb, more than two people should carry (lifting index ${liftingIndex} for one person). ${equipmentWords} Follow local rules.`;
  return {
    tier, peopleNeeded: tier === 'one-person' ? 1 : tier === 'two-person' ? 2 : 0, needsEquipment: tier === 'equipment',
    weightLb: lb, recommendedLimitLb: ONE_PERSON_LIMIT_LB, teamLimitLb: TEAM_LIMIT_LB, liftingIndex, message, basis: LIFTING_BASIS,
  };
}
