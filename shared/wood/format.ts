import { requireFinite, requireInRange, WoodMathError } from './errors';
import { WOOD_LIMITS } from './limits';
import { roundHalfAwayFromZero } from './rounding';

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/** Inches to the nearest 1/16, reduced: 1.75 → "1 3/4", 0.1875 → "3/16", 2 → "2". */
export function toSixteenths(inches: number): string {
  requireInRange(inches, 'inches', -WOOD_LIMITS.anyInches, WOOD_LIMITS.anyInches);
  const sixteenths = roundHalfAwayFromZero(Math.abs(inches) * 16, 0);
  if (sixteenths === 0) return '0';
  const sign = inches < 0 ? '-' : '';
  const whole = Math.floor(sixteenths / 16);
  const rest = sixteenths % 16;
  if (rest === 0) return `${sign}${whole}`;
  const d = gcd(rest, 16);
  const fraction = `${rest / d}/${16 / d}`;
  return whole === 0 ? `${sign}${fraction}` : `${sign}${whole} ${fraction}`;
}

/** "1 3/4 in (1.75)": the shop's fraction with the exact decimal (up to 3 places) beside it. */
export function formatInches(inches: number): string {
  requireInRange(inches, 'inches', -WOOD_LIMITS.anyInches, WOOD_LIMITS.anyInches);
  return `${toSixteenths(inches)} in (${roundHalfAwayFromZero(inches, 3)})`;
}

/** Reads "1 3/4", "3/16", "-2 1/2", "2" or "1.75" back to inches. */
export function parseInches(text: string): number {
  const match = /^\s*(-)?\s*(?:(\d+(?:\.\d+)?)|(?:(\d+)\s+)?(\d+)\s*\/\s*(\d+))\s*(?:in|")?\s*$/.exec(text);
  if (!match) throw new WoodMathError(`Cannot read "${text}" as inches`, 'inches');
  const [, minus, decimal, whole, num, den] = match;
  let value: number;
  if (decimal !== undefined) {
    value = Number(decimal);
  } else {
    if (Number(den) === 0) throw new WoodMathError(`"${text}" divides by zero`, 'inches');
    value = Number(whole ?? 0) + Number(num) / Number(den);
  }
  if (!Number.isFinite(value) || Math.abs(value) > WOOD_LIMITS.anyInches) {
    throw new WoodMathError(`"${text}" is more than ${WOOD_LIMITS.anyInches} in`, 'inches');
  }
  return minus ? -value : value;
}

/** Integer cents to "$1,234.56" (no locale lookup, so browser and server print the same). */
export function formatCents(cents: number): string {
  requireFinite(cents, 'cents');
  if (!Number.isInteger(cents)) throw new WoodMathError(`cents must be a whole number (got ${cents})`, 'cents');
  if (!Number.isSafeInteger(cents)) throw new WoodMathError(`cents is too large to show exactly (got ${cents})`, 'cents');
  const abs = Math.abs(cents);
  const dollarsPart = Math.floor(abs / 100).toString().replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  const centsPart = String(abs % 100).padStart(2, '0');
  return `${cents < 0 ? '-' : ''}$${dollarsPart}.${centsPart}`;
}
