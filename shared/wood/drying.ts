import { requireInRange, requireSize, WoodMathError } from './errors';
import { WOOD_LIMITS } from './limits';
import { FIBER_SATURATION_MC, requireMoistureContent } from './moisture';

export type DryingState = 'green' | 'air-drying' | 'air-dry' | 'shop-dry';
export type AirDryInput = { milledOn: Date | string; thicknessIn: number };
export type DryingStateInput = { mcPercent: number; targetMcPercent: number; airDryMcPercent?: number };

/**
 * Air drying ends near 20–25 % MC (USDA FPL Wood Handbook FPL-GTR-190 ch. 13;
 * FPL Technical Note F-13); Stickerline calls a slab air-dry at 20 % or below.
 */
export const DEFAULT_AIR_DRY_MC = 20;

/** Stickerline's drying states, wettest first, in the words shown to buyers. */
export const DRYING_STATES: ReadonlyArray<{ state: DryingState; label: string; description: string }> = [
  { state: 'green', label: 'Green',
    description: 'Freshly sawn. The cell walls are still full of water, above about 30 % moisture, and the slab has not started to shrink.' },
  { state: 'air-drying', label: 'Air-drying',
    description: 'Stickered and drying in the yard. It is shrinking and may still move, check or cup.' },
  { state: 'air-dry', label: 'Air-dry',
    description: 'Has dried outdoors as far as the weather allows, about 20 % moisture or less. Good for outdoor work; needs more drying before indoor furniture.' },
  { state: 'shop-dry', label: 'Shop-dry',
    description: 'Dried down to the mill\'s target for indoor furniture, so it will move little once it is inside.' },
];

/** A date for the drying math: a Date or 'YYYY-MM-DD' (UTC), within the years Stickerline handles. */
export function parseWoodDate(value: Date | string, field: string): Date {
  let date: Date;
  if (value instanceof Date) date = new Date(value.getTime());
  else if (typeof value === 'string' && /^\d{4}-\d{2}-\d{2}$/.test(value)) {
    date = new Date(`${value}T00:00:00Z`);
    if (!Number.isNaN(date.getTime()) && date.toISOString().slice(0, 10) !== value) date = new Date(Number.NaN); // 2024-02-31
  } else date = typeof value === 'string' ? new Date(value) : new Date(Number.NaN);
  if (Number.isNaN(date.getTime())) throw new WoodMathError(`${field} is not a valid date (got ${String(value)})`, field);
  const year = date.getUTCFullYear();
  if (year < WOOD_LIMITS.minYear || year > WOOD_LIMITS.maxYear) {
    throw new WoodMathError(`${field} must fall between ${WOOD_LIMITS.minYear} and ${WOOD_LIMITS.maxYear} (got ${String(value)})`, field);
  }
  return date;
}

/** One year of air drying per inch of thickness (common practice), counted in calendar months. */
export function airDryReadyDate({ milledOn, thicknessIn }: AirDryInput): Date {
  requireSize(thicknessIn, 'thicknessIn', WOOD_LIMITS.thicknessIn);
  const start = parseWoodDate(milledOn, 'milledOn');
  const months = Math.ceil(thicknessIn * 12 - 1e-9);
  const day = start.getUTCDate();
  const ready = new Date(start.getTime());
  ready.setUTCDate(1); // avoid Jan 31 + 1 month spilling into March
  ready.setUTCMonth(ready.getUTCMonth() + months);
  const lastDay = new Date(Date.UTC(ready.getUTCFullYear(), ready.getUTCMonth() + 1, 0)).getUTCDate();
  ready.setUTCDate(Math.min(day, lastDay));
  return ready;
}

/**
 * Green above fiber saturation; shop-dry at or below the mill's target;
 * air-dry at or below the air-dry line; air-drying in between.
 */
export function dryingStateFor({ mcPercent, targetMcPercent, airDryMcPercent = DEFAULT_AIR_DRY_MC }: DryingStateInput): DryingState {
  requireMoistureContent(mcPercent, 'mcPercent');
  requireInRange(airDryMcPercent, 'airDryMcPercent', 0, FIBER_SATURATION_MC);
  requireInRange(targetMcPercent, 'targetMcPercent', 0, airDryMcPercent);
  if (mcPercent > FIBER_SATURATION_MC) return 'green';
  if (mcPercent <= targetMcPercent) return 'shop-dry';
  if (mcPercent <= airDryMcPercent) return 'air-dry';
  return 'air-drying';
}
