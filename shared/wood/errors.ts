/**
 * Invalid input to a wood-math function. The API layer turns this into a 400;
 * `field` names the offending input so a form can point at it.
 */
export class WoodMathError extends Error {
  readonly code = 'wood_math' as const;
  readonly field?: string;

  constructor(message: string, field?: string) {
    super(message);
    this.name = 'WoodMathError';
    if (field !== undefined) this.field = field;
  }
}

export function requireFinite(value: number, field: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new WoodMathError(`${field} must be a finite number (got ${String(value)})`, field);
  }
  return value;
}

export function requirePositive(value: number, field: string): number {
  requireFinite(value, field);
  if (value <= 0) throw new WoodMathError(`${field} must be greater than 0 (got ${value})`, field);
  return value;
}

export function requireNonNegative(value: number, field: string): number {
  requireFinite(value, field);
  if (value < 0) throw new WoodMathError(`${field} must not be negative (got ${value})`, field);
  return value;
}

export function requireInRange(value: number, field: string, min: number, max: number): number {
  requireFinite(value, field);
  if (value < min || value > max) {
    throw new WoodMathError(`${field} must be between ${min} and ${max} (got ${value})`, field);
  }
  return value;
}

export function requireWholeNonNegative(value: number, field: string): number {
  requireNonNegative(value, field);
  if (!Number.isInteger(value)) throw new WoodMathError(`${field} must be a whole number (got ${value})`, field);
  return value;
}

export function requireAtMost(value: number, field: string, max: number, what = ''): number {
  requireFinite(value, field);
  if (value > max) {
    throw new WoodMathError(`${field} must be at most ${max}${what ? ` ${what}` : ''} (got ${value})`, field);
  }
  return value;
}

/** A positive size no larger than a sane maximum for that input (see limits.ts). */
export function requireSize(value: number, field: string, max: number): number {
  requirePositive(value, field);
  return requireAtMost(value, field, max);
}

/** Whole cents from 0 up to a sane maximum (see limits.ts). */
export function requireCents(value: number, field: string, max: number): number {
  requireWholeNonNegative(value, field);
  return requireAtMost(value, field, max, 'cents');
}
