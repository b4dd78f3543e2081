import { lifting, WOOD_LIMITS } from './wood/index';

/**
 * What to bring to the yard, from the order's slabs. Bed lengths and payloads are typical
 * figures for common vehicles (common practice); the buyer's own vehicle papers and local
 * road rules always win.
 */
export const BED_LENGTHS_IN = { short: 66, standard: 78, long: 96 } as const;
/** A dropped tailgate supports roughly this much more length (from memory). */
export const TAILGATE_EXTRA_IN = 20;
/** Many road codes want a flag on a load sticking out more than about 4 ft behind (check local rules). */
export const FLAG_OVERHANG_IN = 48;
/** A typical half-ton pickup carries about this much (common practice); the door-jamb label is the real limit. */
export const TYPICAL_PICKUP_PAYLOAD_LB = 1500;

export type LoadingSlab = { weightLb: number; lengthIn: number };
export type LoadingAdvice = {
  slabCount: number;
  totalWeightLb: number;
  longestSlabIn: number;
  heaviestSlabLb: number;
  vehicle: string;
  bring: string[];
  peopleNeeded: number;
  needsEquipment: boolean;
  millHelpRecommended: boolean;
  liftingMessage: string;
  caution: string;
};

const ft = (inches: number) => `${Math.round((inches / 12) * 10) / 10} ft`;

function vehicleAdvice(longestIn: number, totalLb: number): string {
  const fit =
    longestIn <= BED_LENGTHS_IN.short ? `The longest slab (${ft(longestIn)}) fits a short pickup bed or a van with the seats folded.`
    : longestIn <= BED_LENGTHS_IN.standard ? `The longest slab (${ft(longestIn)}) needs at least a standard 6.5 ft pickup bed.`
    : longestIn <= BED_LENGTHS_IN.long ? `The longest slab (${ft(longestIn)}) needs a long 8 ft bed, or a standard bed with the tailgate down.`
    : longestIn <= BED_LENGTHS_IN.long + TAILGATE_EXTRA_IN ? `The longest slab (${ft(longestIn)}) needs a long bed with the tailgate down, or a trailer.`
    : `The longest slab (${ft(longestIn)}) is longer than a pickup bed: bring a trailer.`;
  const overhang = longestIn - BED_LENGTHS_IN.long;
  const flag = overhang > FLAG_OVERHANG_IN ? ' It will stick out far behind most vehicles: mark the end with a flag or light as your local rules require.' : '';
  const payload = totalLb > TYPICAL_PICKUP_PAYLOAD_LB
    ? ` About ${Math.round(totalLb)} lb in all is more than a typical half-ton pickup carries: check your vehicle's payload label, bring a heavier truck or trailer, or plan two trips.`
    : '';
  return fit + flag + payload;
}

export function loadingAdvice(slabs: LoadingSlab[], { loadingHelp = false } = {}): LoadingAdvice | null {
  if (slabs.length === 0) return null;
  const totalWeightLb = slabs.reduce((t, s) => t + s.weightLb, 0);
  const longestSlabIn = Math.max(...slabs.map((s) => s.lengthIn));
  const heaviestSlabLb = Math.max(...slabs.map((s) => s.weightLb));
  const lift = lifting({ weightLb: Math.min(Math.max(heaviestSlabLb, 1), WOOD_LIMITS.weightLb) });
  const straps = Math.max(2, Math.ceil(longestSlabIn / 48));
  const bring = [
    `${straps} ratchet straps (or more) rated well above the load`,
    `${slabs.length + 1} moving blankets or sheets of cardboard to pad the faces and live edges`,
    'Gloves with a good grip, and closed-toe boots',
  ];
  if (longestSlabIn > BED_LENGTHS_IN.standard) bring.push('A red flag or light for anything sticking out behind the vehicle');
  const millHelpRecommended = lift.needsEquipment;
  if (!loadingHelp) {
    bring.push(lift.needsEquipment
      ? `Ask for the mill's loading help: the heaviest slab (about ${lift.weightLb} lb) is too heavy to carry by hand and goes on with the yard's cart or forklift`
      : `${lift.peopleNeeded} ${lift.peopleNeeded === 1 ? 'person' : 'people'} to lift the heaviest slab (about ${lift.weightLb} lb)`);
  }
  return {
    slabCount: slabs.length,
    totalWeightLb: Math.round(totalWeightLb),
    longestSlabIn,
    heaviestSlabLb: Math.round(heaviestSlabLb),
    vehicle: vehicleAdvice(longestSlabIn, totalWeightLb),
    bring,
    peopleNeeded: lift.peopleNeeded,
    needsEquipment: lift.needsEquipment,
    millHelpRecommended,
    liftingMessage: lift.message,
    caution:
      'Slabs are heavy, awkward and can shift. Plan the lift before you start, keep your back straight and the load close, ' +
      `and never carry by hand more than the advice above allows. ${lift.basis} Forklifts and hoists are run by trained operators only; ` +
      'stand clear of a raised load. Tie the load down before you drive. Follow your local rules on lifting and on securing loads.',
  };
}
