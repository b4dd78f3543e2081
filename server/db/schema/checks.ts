import { sql, type SQL } from 'drizzle-orm';
import type { AnyPgColumn } from 'drizzle-orm/pg-core';
import { maxMoistureContentPercent } from '../../../shared/wood/moisture';

/**
 * Helpers for the CHECK constraints of the schema: the database itself refuses a status nobody
 * defined or a measurement no slab can have, whatever code path writes the row. The lists come
 * from the same shared constants the server and the forms use; the numeric ceilings are looser
 * than the forms' limits (they catch impossible rows, the forms catch unlikely ones).
 */

const literal = (v: string) => `'${v.replace(/'/g, "''")}'`;

/** `column in ('a', 'b', …)`: only the listed values (a NULL is left to NOT NULL). */
export const oneOf = (col: AnyPgColumn, values: readonly string[]): SQL => sql`${col} in (${sql.raw(values.map(literal).join(', '))})`;

/** `min < column <= max` (or `min <= column` when `minInclusive`). */
export const within = (col: AnyPgColumn, min: number, max: number, { minInclusive = false } = {}): SQL =>
  sql`${col} ${sql.raw(minInclusive ? '>=' : '>')} ${sql.raw(String(min))} and ${col} <= ${sql.raw(String(max))}`;

/** Money in cents: never negative, never past a ceiling no slab sale reaches ($1,000,000). */
export const MAX_CENTS = 100_000_000;
export const cents = (col: AnyPgColumn): SQL => within(col, 0, MAX_CENTS, { minInclusive: true });

/** Dates the mill's records can hold: nothing before 1900 (a typing slip), checked against the past by the server. */
export const sane = (col: AnyPgColumn): SQL => sql`${col} >= '1900-01-01'`;

/**
 * Moisture content ceiling for any stored reading: the maximum moisture content of a wood of basic
 * specific gravity 0.25 — lighter than any species the mill saws — when every cell cavity is full of
 * water (USDA FPL Wood Handbook FPL-GTR-190 ch. 4, maximum moisture content equation), ≈ 335 %.
 * The server holds each reading to its own species' maximum; this only refuses the impossible.
 */
export const MAX_STORED_MC_PERCENT = Math.ceil(maxMoistureContentPercent(0.25));

/** Physical ceilings, looser than the forms (shared/slab-input SLAB_LIMITS, shared/logs LOG_LIMITS). */
export const DB_LIMITS = {
  maxThicknessIn: 48, maxWidthIn: 240, maxLengthIn: 1200, maxDiameterIn: 240,
  /** 48 in × 240 in × 1200 in ÷ 144 in³ per board foot (hardwood grading rules' board foot). */
  maxBoardFeet: (48 * 240 * 1200) / 144,
  maxWeightLb: 100_000,
} as const;
