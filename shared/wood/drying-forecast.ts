import { requireInRange, requireSize, WoodMathError } from './errors';
import { airDryReadyDate, parseWoodDate } from './drying';
import { WOOD_LIMITS } from './limits';
import { ABSOLUTE_MAX_MOISTURE_CONTENT_PERCENT, FIBER_SATURATION_MC } from './moisture';

export type DatedReading = { measuredOn: string; mcPercent: number };

export type DryingForecastInput = {
  readings: DatedReading[];
  /** The moisture content the forecast is for, % (for instance the 20 % air-dry line). */
  targetMcPercent: number;
  /** The yard's average outdoor EMC, %. Defaults to DEFAULT_YARD_EMC_PERCENT. */
  emcPercent?: number;
  /** For the rule-of-thumb fallback: the slab's thickness, in. */
  thicknessIn?: number;
  /** For the rule-of-thumb fallback: the day the slab was sawn and stickered, 'YYYY-MM-DD'. */
  startedOn?: string;
};

export type DryingForecastBasis = 'fitted-curve' | 'rule-of-thumb' | 'already-reached' | 'not-reachable' | 'not-enough-data';

export type DryingForecast = {
  /** Expected date to reach the target, 'YYYY-MM-DD'; null when it cannot be forecast. */
  expectedOn: string | null;
  earliestOn: string | null;
  latestOn: string | null;
  /** Plain words: which method was used, its source, and what it assumed. */
  method: string;
  basis: DryingForecastBasis;
  usableReadings: number;
  emcPercent: number;
  targetMcPercent: number;
  /** Fitted drying rate k, per day (fitted curves only). */
  ratePerDay?: number;
};

/**
 * Outdoors under cover, air-dried wood ends near the local average EMC, about 12 % in the
 * northern United States (USDA Wood Handbook FPL-GTR-190 ch. 13; FPL Technical Note F-13).
 */
export const DEFAULT_YARD_EMC_PERCENT = 12;
/** Readings needed before a curve is fitted. */
export const MIN_READINGS_FOR_FIT = 3;
/** Forecasts further out than this are cut off and say so. */
export const FORECAST_HORIZON_YEARS = 10;

const DAY_MS = 86_400_000;
const iso = (ms: number) => new Date(ms).toISOString().slice(0, 10);

/** Two-sided 95 % Student t quantiles for 1–30 degrees of freedom; 1.96 beyond. */
const T95 = [12.706, 4.303, 3.182, 2.776, 2.571, 2.447, 2.365, 2.306, 2.262, 2.228, 2.201, 2.179, 2.16, 2.145, 2.131,
  2.12, 2.11, 2.101, 2.093, 2.086, 2.08, 2.074, 2.069, 2.064, 2.06, 2.056, 2.052, 2.048, 2.045, 2.042];
const t95 = (dof: number) => (dof <= T95.length ? T95[dof - 1] : 1.96);

export const DRYING_MODEL_WORDS =
  'An exponential approach to the yard’s equilibrium moisture content, MC(t) = EMC + (MC₀ − EMC)·e^(−k·t), fitted to this ' +
  'slab’s own dated readings by least squares on ln(MC − EMC) (a first-order drying curve, common practice; published ' +
  'air-drying curves such as FPL Report 2086 have this falling shape). The range is the 95 % band of the fitted rate and level.';

export const RULE_OF_THUMB_WORDS =
  'Rule of thumb: about one year of air drying per inch of thickness, counted from sawing (common practice). It ignores ' +
  'species, season and climate, and thin stock often dries much faster; the range shown (half to one and a half times) is only a rough guide.';

/**
 * When a slab will reach a target moisture content, from its own readings.
 *
 * With three or more usable readings (distinct days, above the EMC) the exponential model above
 * is fitted; otherwise the one-year-per-inch rule of thumb is used, which needs `thicknessIn` and
 * `startedOn` (without them the forecast says it cannot be made). A target at or below the EMC is
 * never reached outdoors and is reported as such. Dates are whole UTC days.
 */
export function dryingForecast(input: DryingForecastInput): DryingForecast {
  const { readings, targetMcPercent } = input;
  const emcPercent = input.emcPercent ?? DEFAULT_YARD_EMC_PERCENT;
  requireInRange(targetMcPercent, 'targetMcPercent', 0, FIBER_SATURATION_MC);
  requireInRange(emcPercent, 'emcPercent', 0, FIBER_SATURATION_MC);
  if (!Array.isArray(readings)) throw new WoodMathError('readings must be a list', 'readings');
  if (readings.length > 10_000) throw new WoodMathError('readings may hold at most 10000 readings', 'readings');
  if (input.thicknessIn !== undefined) requireSize(input.thicknessIn, 'thicknessIn', WOOD_LIMITS.thicknessIn);
  const startedAt = input.startedOn !== undefined ? parseWoodDate(input.startedOn, 'startedOn').getTime() : undefined;

  // One point per day (several readings on a day are averaged), oldest first.
  const byDay = new Map<number, number[]>();
  readings.forEach((r, i) => {
    const day = parseWoodDate(r?.measuredOn, `readings[${i}].measuredOn`).getTime();
    requireInRange(r.mcPercent, `readings[${i}].mcPercent`, 0, ABSOLUTE_MAX_MOISTURE_CONTENT_PERCENT);
    byDay.set(day, [...(byDay.get(day) ?? []), r.mcPercent]);
  });
  const points = [...byDay.entries()].sort((a, b) => a[0] - b[0])
    .map(([day, mcs]) => ({ day, mc: mcs.reduce((s, v) => s + v, 0) / mcs.length }));
  const base = { emcPercent, targetMcPercent };

  // Already there: the first day after which every reading stays at or below the target.
  const last = points.at(-1);
  if (last && last.mc <= targetMcPercent) {
    let k = points.length - 1;
    while (k > 0 && points[k - 1].mc <= targetMcPercent) k--;
    const on = iso(points[k].day);
    return { ...base, expectedOn: on, earliestOn: on, latestOn: on, basis: 'already-reached', usableReadings: points.length,
      method: `Already at or below ${targetMcPercent} % by the reading of ${on}.` };
  }
  if (targetMcPercent <= emcPercent) {
    return { ...base, expectedOn: null, earliestOn: null, latestOn: null, basis: 'not-reachable', usableReadings: points.length,
      method: `Outdoors wood only dries to about the yard’s equilibrium moisture content (${emcPercent} %), so air drying alone ` +
        `will not reach ${targetMcPercent} %; it needs a heated shop or a kiln (USDA Wood Handbook ch. 13).` };
  }

  const usable = points.filter((p) => p.mc - emcPercent >= 0.1);
  if (usable.length >= MIN_READINGS_FOR_FIT) {
    const fitted = fitExponential(usable, emcPercent, targetMcPercent);
    if (fitted) return { ...base, ...fitted, basis: 'fitted-curve', usableReadings: usable.length };
  }
  const why = usable.length >= MIN_READINGS_FOR_FIT
    ? `The ${usable.length} readings do not show the slab drying yet, so no curve could be fitted.`
    : `Only ${usable.length} usable reading${usable.length === 1 ? '' : 's'} (a curve needs ${MIN_READINGS_FOR_FIT} on different days, above the yard’s ${emcPercent} % EMC).`;
  if (input.thicknessIn === undefined || startedAt === undefined) {
    return { ...base, expectedOn: null, earliestOn: null, latestOn: null, basis: 'not-enough-data', usableReadings: usable.length,
      method: `${why} The rule of thumb needs the slab’s thickness and the day it was sawn.` };
  }
  const months = (factor: number) => airDryReadyDate({ milledOn: new Date(startedAt), thicknessIn: input.thicknessIn! * factor }).getTime();
  return {
    ...base, basis: 'rule-of-thumb', usableReadings: usable.length,
    expectedOn: iso(months(1)), earliestOn: iso(months(0.5)), latestOn: iso(months(1.5)),
    method: `${why} ${RULE_OF_THUMB_WORDS}`,
  };
}

type Point = { day: number; mc: number };

/** Least squares on y = ln(MC − EMC) = a − k·t; null when the readings are not falling. */
function fitExponential(points: Point[], emc: number, target: number) {
  const t0 = points[0].day;
  const xs = points.map((p) => (p.day - t0) / DAY_MS);
  const ys = points.map((p) => Math.log(p.mc - emc));
  const n = points.length;
  const xBar = xs.reduce((s, v) => s + v, 0) / n;
  const yBar = ys.reduce((s, v) => s + v, 0) / n;
  let sxx = 0;
  let sxy = 0;
  for (let i = 0; i < n; i++) { sxx += (xs[i] - xBar) ** 2; sxy += (xs[i] - xBar) * (ys[i] - yBar); }
  const slope = sxy / sxx;
  if (!(slope < 0)) return null;
  let sse = 0;
  for (let i = 0; i < n; i++) sse += (ys[i] - (yBar + slope * (xs[i] - xBar))) ** 2;
  const s = Math.sqrt(sse / (n - 2));
  const q = t95(n - 2);
  const slopeBand = q * (s / Math.sqrt(sxx));
  const levelBand = q * (s / Math.sqrt(n));
  const yTarget = Math.log(target - emc);

  // Days from the first reading until the line reaches yTarget; Infinity if it never does.
  const daysFor = (k: number, level: number) => (k < 0 ? xBar + (yTarget - level) / k : Number.POSITIVE_INFINITY);
  const expected = daysFor(slope, yBar);
  const corners = [-1, 1].flatMap((a) => [-1, 1].map((b) => daysFor(slope + a * slopeBand, yBar + b * levelBand)));
  const earliest = Math.min(expected, ...corners);
  const latest = Math.max(expected, ...corners);

  const horizon = points.at(-1)!.day + FORECAST_HORIZON_YEARS * 365.25 * DAY_MS;
  const lastDay = points.at(-1)!.day;
  let capped = false;
  const toDate = (days: number) => {
    const ms = t0 + Math.ceil(days - 1e-9) * DAY_MS;
    if (!Number.isFinite(ms) || ms > horizon) { capped = true; return iso(horizon); }
    return iso(Math.max(ms, lastDay));
  };
  const expectedOn = toDate(expected);
  const earliestOn = toDate(earliest);
  const latestOn = toDate(latest);
  const k = -slope;
  return {
    expectedOn, earliestOn, latestOn, ratePerDay: k,
    method: `${DRYING_MODEL_WORDS} Fitted from ${n} readings: k = ${k.toFixed(4)} per day, yard EMC ${emc} %.` +
      (capped ? ` Part of the range lies more than ${FORECAST_HORIZON_YEARS} years out and is shown as that limit.` : ''),
  };
}
