import { requireFinite, requireInRange, WoodMathError } from './errors';
import { WOOD_LIMITS } from './limits';
import { roundHalfAwayFromZero } from './rounding';
import { CUBIC_INCHES_PER_BOARD_FOOT } from './board-feet';

/**
 * The one place measurements become words, for every screen, e-mail and CSV. One rounding rule:
 * imperial lengths go to the nearest 1/16 in; metric lengths to the nearest millimetre
 * (centimetre from one metre up). Weights go to the whole pound or kilogram.
 */

export const UNIT_SYSTEMS = ['imperial', 'metric'] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];
export const UNIT_SYSTEM_LABELS: Record<UnitSystem, string> = { imperial: 'Inches and pounds', metric: 'Millimetres and kilograms' };
export const isUnitSystem = (v: unknown): v is UnitSystem => v === 'imperial' || v === 'metric';

/** Exact by definition: 1 in = 25.4 mm, 1 lb = 0.45359237 kg (international yard and pound agreement, 1959). */
export const MM_PER_INCH = 25.4;
export const KG_PER_POUND = 0.45359237;
const CUBIC_METRES_PER_CUBIC_INCH = (MM_PER_INCH / 1000) ** 3;
const SQUARE_METRES_PER_SQUARE_FOOT = (12 * MM_PER_INCH / 1000) ** 2;

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

/** Thousands separated with commas, the same in the browser and on the server. */
const groupThousands = (digits: string) => digits.replace(/\B(?=(\d{3})+(?!\d))/g, ',');

/** A plain number with at most `decimals` places and no trailing zeros: 12.50 → "12.5". */
export function plainNumber(value: number, decimals: number): string {
  requireFinite(value, 'value');
  const rounded = roundHalfAwayFromZero(value, decimals);
  const [whole, frac] = Math.abs(rounded).toFixed(decimals).split('.');
  const tail = frac?.replace(/0+$/, '');
  return `${rounded < 0 ? '-' : ''}${groupThousands(whole)}${tail ? `.${tail}` : ''}`;
}

/** A length: "26 5/16 in", or "668 mm" / "244 cm" in metric. */
export function formatLength(inches: number, units: UnitSystem = 'imperial'): string {
  requireInRange(inches, 'inches', -WOOD_LIMITS.anyInches, WOOD_LIMITS.anyInches);
  if (units === 'imperial') return `${toSixteenths(inches)} in`;
  const mm = inches * MM_PER_INCH;
  return Math.abs(mm) >= 1000 ? `${plainNumber(mm / 10, 0)} cm` : `${plainNumber(mm, 0)} mm`;
}

/** The shop's one imperial length, kept under its old name for the places that never switch. */
export function formatInches(inches: number): string {
  return formatLength(inches, 'imperial');
}

/** A long length with the feet beside it in imperial ("96 in (8 ft)"); metric as formatLength. */
export function formatLongLength(inches: number, units: UnitSystem = 'imperial'): string {
  if (units === 'metric') return formatLength(inches, units);
  return `${formatLength(inches, units)} (${plainNumber(inches / 12, 1)} ft)`;
}

/** Thickness × width × length, each with its unit in metric: "2 × 26 5/16 × 96 in", "51 mm × 668 mm × 244 cm". */
export function formatDimensions(d: { thicknessIn: number; widthIn: number; lengthIn: number }, units: UnitSystem = 'imperial'): string {
  if (units === 'imperial') return `${toSixteenths(d.thicknessIn)} × ${toSixteenths(d.widthIn)} × ${toSixteenths(d.lengthIn)} in`;
  return [d.thicknessIn, d.widthIn, d.lengthIn].map((x) => formatLength(x, units)).join(' × ');
}

/** A weight to the whole pound or kilogram (tenths below ten): "184 lb", "83 kg". */
export function formatWeight(pounds: number, units: UnitSystem = 'imperial'): string {
  requireFinite(pounds, 'pounds');
  const value = units === 'metric' ? pounds * KG_PER_POUND : pounds;
  return `${plainNumber(value, Math.abs(value) < 10 ? 1 : 0)} ${units === 'metric' ? 'kg' : 'lb'}`;
}

/** Board feet always (the trade's unit for a slab's volume), with cubic metres beside in metric. */
export function formatBoardFeet(boardFeet: number, units: UnitSystem = 'imperial'): string {
  requireFinite(boardFeet, 'boardFeet');
  const bf = `${plainNumber(boardFeet, 2)} bd ft`;
  if (units === 'imperial') return bf;
  return `${bf} (${plainNumber(boardFeet * CUBIC_INCHES_PER_BOARD_FOOT * CUBIC_METRES_PER_CUBIC_INCH, 3)} m³)`;
}

/** An area: "7.4 sq ft" or "0.69 m²". */
export function formatArea(squareFeet: number, units: UnitSystem = 'imperial'): string {
  requireFinite(squareFeet, 'squareFeet');
  return units === 'metric' ? `${plainNumber(squareFeet * SQUARE_METRES_PER_SQUARE_FOOT, 2)} m²` : `${plainNumber(squareFeet, 1)} sq ft`;
}

/** A moisture content or any other percentage, to one decimal: "12.5 %". */
export function formatPercent(percent: number): string {
  return `${plainNumber(percent, 1)} %`;
}

/** A span of days in words, whole days only: "about 320 days", "about 3 years". */
export function formatDays(days: number): string {
  requireFinite(days, 'days');
  const d = Math.round(days);
  if (d < 2) return d === 1 ? '1 day' : 'under a day';
  if (d < 730) return `${d} days`;
  return `about ${plainNumber(d / 365, 1)} years`;
}

// --- reading what people type -------------------------------------------------------------

const VULGAR_FRACTIONS: Record<string, [number, number]> = {
  '½': [1, 2], '⅓': [1, 3], '⅔': [2, 3], '¼': [1, 4], '¾': [3, 4], '⅕': [1, 5], '⅖': [2, 5], '⅗': [3, 5], '⅘': [4, 5],
  '⅙': [1, 6], '⅚': [5, 6], '⅐': [1, 7], '⅛': [1, 8], '⅜': [3, 8], '⅝': [5, 8], '⅞': [7, 8], '⅑': [1, 9], '⅒': [1, 10],
};
const VULGAR = Object.keys(VULGAR_FRACTIONS).join('');

export type ParseInchesOptions = {
  /** The field is a thickness, so lumber's quarter notation is allowed: "8/4" is 2 in, "5/4" is 1 1/4 in. */
  thickness?: boolean;
};

const EXAMPLES = 'Write it like 2.25, 2 1/4, 2-1/4 or 2 ¼';
const unreadable = (text: string, extra = EXAMPLES) => new WoodMathError(`"${text.trim()}" is not a size we can read. ${extra}.`, 'inches');

/**
 * Reads a size typed in inches: decimals ("2.25", ".75"), whole and fraction ("2 1/4", "2-1/4",
 * "2 ¼", "2¼"), a bare fraction ("3/4", "¾") and an optional inch mark (", ″, ”, in, inch, inches).
 * In a thickness field lumber's quarter notation ("8/4") reads as quarters of an inch; elsewhere a
 * top-heavy fraction is refused as a likely slip. Returns inches; throws WoodMathError otherwise.
 */
export function parseInches(text: string, options: ParseInchesOptions = {}): number {
  const inches = readInches(text, options);
  if (!Number.isFinite(inches) || Math.abs(inches) > WOOD_LIMITS.anyInches) {
    throw new WoodMathError(`"${String(text).trim().slice(0, 40)}" is more than ${WOOD_LIMITS.anyInches} in.`, 'inches');
  }
  return inches;
}

function readInches(text: string, options: ParseInchesOptions): number {
  if (typeof text !== 'string' || text.trim() === '') throw new WoodMathError('Enter a size in inches.', 'inches');
  let s = text.trim().replace(/\s+/g, ' ').replace(/\u2044|\u2215/g, '/');
  s = s.replace(/\s*(?:"|″|”|''|in\.?|inch|inches)$/i, '').trim();
  if (/(?:mm|cm|m)$/i.test(s)) throw unreadable(text, 'Sizes here are in inches (25.4 mm is 1 in)');
  if (/(?:'|′|ft|feet|foot)/i.test(s)) throw unreadable(text, 'Sizes here are in inches (1 ft is 12 in)');
  if (/^\d+,\d+$/.test(s)) throw unreadable(text, 'Use a point for decimals, like 2.5');
  const minus = s.startsWith('-') ? -1 : 1;
  if (minus < 0) s = s.slice(1).trim();

  const decimal = /^(\d+(?:\.\d*)?|\.\d+)$/.exec(s);
  if (decimal) return minus * Number(decimal[1]);

  const unicode = new RegExp(`^(?:(\\d+)(?: |-)?)?([${VULGAR}])$`).exec(s);
  if (unicode) {
    const [n, d] = VULGAR_FRACTIONS[unicode[2]];
    return minus * (Number(unicode[1] ?? 0) + n / d);
  }

  const mixed = /^(?:(\d+)(?: | ?- ?))?(\d+) ?\/ ?(\d+)$/.exec(s);
  if (!mixed) throw unreadable(text);
  const [, whole, numText, denText] = mixed;
  const num = Number(numText);
  const den = Number(denText);
  if (den === 0) throw new WoodMathError(`"${text.trim()}" divides by zero. ${EXAMPLES}.`, 'inches');
  if (whole === undefined && options.thickness && den === 4) return minus * (num / 4);
  if (num >= den) {
    const hint = options.thickness ? 'Quarter sizes like 8/4 are written over 4' : 'Quarter sizes like 8/4 are for thickness only';
    throw unreadable(text, whole === undefined ? `${hint}; write ${toSixteenths(num / den)} instead` : EXAMPLES);
  }
  return minus * (Number(whole ?? 0) + num / den);
}

/**
 * The value to put back into an inch box: the shop's fraction when it says exactly the stored
 * number, the plain decimal otherwise (so saving an untouched form never changes a size).
 */
export function inchesForInput(inches: number | null | undefined): string {
  if (inches === null || inches === undefined || !Number.isFinite(inches)) return '';
  const fraction = toSixteenths(inches);
  return Math.abs(parseInches(fraction) - inches) < 1e-9 ? fraction : String(inches);
}

// --- money --------------------------------------------------------------------------------

/** Integer cents to "$1,234.56" (no locale lookup, so browser and server print the same). */
export function formatCents(cents: number): string {
  requireFinite(cents, 'cents');
  if (!Number.isInteger(cents)) throw new WoodMathError(`cents must be a whole number (got ${cents})`, 'cents');
  if (!Number.isSafeInteger(cents)) throw new WoodMathError(`cents is too large to show exactly (got ${cents})`, 'cents');
  const abs = Math.abs(cents);
  const dollarsPart = groupThousands(Math.floor(abs / 100).toString());
  const centsPart = String(abs % 100).padStart(2, '0');
  return `${cents < 0 ? '-' : ''}$${dollarsPart}.${centsPart}`;
}

/** Integer cents as a plain number of dollars for spreadsheets: 123456 → "1234.56". */
export function centsAsPlainDollars(cents: number): string {
  requireFinite(cents, 'cents');
  if (!Number.isInteger(cents)) throw new WoodMathError(`cents must be a whole number (got ${cents})`, 'cents');
  const abs = Math.abs(cents);
  return `${cents < 0 ? '-' : ''}${Math.floor(abs / 100)}.${String(abs % 100).padStart(2, '0')}`;
}

/**
 * Reads dollars as people type them: "1000", "1000.50", "$1,000", "$ 1,000.5", "1,000.00".
 * Returns whole cents; throws WoodMathError for anything else (including fractions of a cent).
 */
export function parseDollarsToCents(text: string): number {
  if (typeof text !== 'string' || text.trim() === '') throw new WoodMathError('Enter an amount in dollars.', 'dollars');
  const s = text.trim().replace(/^\$\s*/, '').replace(/\s*(?:USD|dollars?)$/i, '');
  const match = /^(\d{1,3}(?:,\d{3})+|\d+)?(?:\.(\d{0,2}))?$/.exec(s);
  if (!match || (match[1] === undefined && !match[2])) {
    const extra = /\.\d{3,}$/.test(s) ? 'Use at most two decimals (cents)' : 'Write it like 1000, 1,000.50 or $1,000';
    throw new WoodMathError(`"${text.trim()}" is not an amount we can read. ${extra}.`, 'dollars');
  }
  const dollars = Number((match[1] ?? '0').replace(/,/g, ''));
  const cents = Number((match[2] ?? '').padEnd(2, '0'));
  const total = dollars * 100 + cents;
  if (!Number.isSafeInteger(total) || total > WOOD_LIMITS.priceCents) {
    throw new WoodMathError(`"${text.trim()}" is too large (at most ${formatCents(WOOD_LIMITS.priceCents)}).`, 'dollars');
  }
  return total;
}
