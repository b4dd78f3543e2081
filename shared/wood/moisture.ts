import { requireAtMost, requireFinite, requireInRange, requirePositive, WoodMathError } from './errors';

/** Average fiber saturation point, % MC (USDA FPL Wood Handbook FPL-GTR-190, p. 4-2). */
export const FIBER_SATURATION_MC = 30;

export type EmcInputF = { temperatureF: number; relativeHumidityPercent: number };
export type EmcInputC = { temperatureC: number; relativeHumidityPercent: number };
export type MoistureContentInput = { wetMass: number; ovenDryMass: number };

type EmcCoefficients = { W: number; K: number; K1: number; K2: number };

/**
 * Wood Handbook Eq. 4-5 (FPL-GTR-190 / FPL-GTR-282, ch. 4): a sorption fit,
 * so its two unit versions carry separately fitted coefficients and agree only
 * to a few hundredths of a point.
 */
function emcFromCoefficients({ W, K, K1, K2 }: EmcCoefficients, rhPercent: number): number {
  const h = rhPercent / 100;
  const Kh = K * h;
  const single = Kh / (1 - Kh);
  const multi = (K1 * Kh + 2 * K1 * K2 * Kh * Kh) / (1 + K1 * Kh + K1 * K2 * Kh * Kh);
  return (1800 / W) * (single + multi);
}

// Stickerline's bounds: the indoor-to-kiln span the fit is used for; outside it the answer is not trusted.
const MIN_C = -20;
const MAX_C = 100;
const MIN_F = -4;
const MAX_F = 212;

export function equilibriumMoistureContent({ temperatureF, relativeHumidityPercent }: EmcInputF): number {
  requireInRange(temperatureF, 'temperatureF', MIN_F, MAX_F);
  requireInRange(relativeHumidityPercent, 'relativeHumidityPercent', 0, 100);
  const T = temperatureF;
  return emcFromCoefficients(
    {
      W: 330 + 0.452 * T + 0.00415 * T * T,
      K: 0.791 + 0.000463 * T - 0.000000844 * T * T,
      K1: 6.34 + 0.000775 * T - 0.0000935 * T * T,
      K2: 1.09 + 0.0284 * T - 0.0000904 * T * T,
    },
    relativeHumidityPercent,
  );
}

export function equilibriumMoistureContentC({ temperatureC, relativeHumidityPercent }: EmcInputC): number {
  requireInRange(temperatureC, 'temperatureC', MIN_C, MAX_C);
  requireInRange(relativeHumidityPercent, 'relativeHumidityPercent', 0, 100);
  const T = temperatureC;
  return emcFromCoefficients(
    {
      W: 349 + 1.29 * T + 0.0135 * T * T,
      K: 0.805 + 0.000736 * T - 0.00000273 * T * T,
      K1: 6.27 - 0.00938 * T - 0.000303 * T * T,
      K2: 1.91 + 0.0407 * T - 0.000293 * T * T,
    },
    relativeHumidityPercent,
  );
}

/** Oven-dry basis (ASTM D4442): water as a share of dry wood, so green wood can exceed 100 %. */
export function moistureContentPercent({ wetMass, ovenDryMass }: MoistureContentInput): number {
  requireFinite(wetMass, 'wetMass');
  requirePositive(ovenDryMass, 'ovenDryMass');
  requireAtMost(wetMass, 'wetMass', MAX_SAMPLE_MASS);
  requireAtMost(ovenDryMass, 'ovenDryMass', MAX_SAMPLE_MASS);
  if (wetMass < ovenDryMass) {
    throw new WoodMathError(
      `wetMass (${wetMass}) is below ovenDryMass (${ovenDryMass}); moisture content cannot be below 0`,
      'wetMass',
    );
  }
  const mc = ((wetMass - ovenDryMass) / ovenDryMass) * 100;
  return requireMoistureContent(mc, 'wetMass');
}

/** Largest sample mass accepted, in whatever unit both masses share. */
export const MAX_SAMPLE_MASS = 1e9;

/**
 * Shared check for an MC input with no species named: 0 % up to the most water even a very light
 * wood can hold (ABSOLUTE_MAX_MOISTURE_CONTENT_PERCENT). Inputs that name a species are checked
 * against that species' own maximum (requireSpeciesMoistureContent in species.ts).
 */
export function requireMoistureContent(value: number, field: string): number {
  requireFinite(value, field);
  if (value < 0) throw new WoodMathError(`${field} must be 0 % or more (got ${value})`, field);
  if (value > ABSOLUTE_MAX_MOISTURE_CONTENT_PERCENT) {
    throw new WoodMathError(
      `${field} ${value} % is more water than any wood can hold (at most about ${Math.floor(ABSOLUTE_MAX_MOISTURE_CONTENT_PERCENT)} %)`, field);
  }
  return value;
}

/** Specific gravity of the wood cell wall substance (USDA FPL Wood Handbook FPL-GTR-190, ch. 4). */
export const CELL_WALL_SPECIFIC_GRAVITY = 1.54;

/**
 * Maximum moisture content (% oven-dry basis) a species can hold, when every cell cavity is full of
 * water: M_max = 100 (1.54 − G_b) / (1.54 G_b), G_b = basic specific gravity (Wood Handbook
 * FPL-GTR-190 ch. 4, maximum moisture content equation). No real reading can exceed it.
 */
export function maxMoistureContentPercent(basicSpecificGravity: number): number {
  requireInRange(basicSpecificGravity, 'basicSpecificGravity', 0.1, 1.4);
  return (100 * (CELL_WALL_SPECIFIC_GRAVITY - basicSpecificGravity)) / (CELL_WALL_SPECIFIC_GRAVITY * basicSpecificGravity);
}

/**
 * The most water any wood can hold: the maximum-moisture equation at a basic specific gravity of
 * 0.10, lighter than the lightest commercial timbers (about 935 % MC).
 */
export const ABSOLUTE_MAX_MOISTURE_CONTENT_PERCENT = (100 * (CELL_WALL_SPECIFIC_GRAVITY - 0.1)) / (CELL_WALL_SPECIFIC_GRAVITY * 0.1);
