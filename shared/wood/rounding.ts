/**
 * Stickerline's one rounding rule: round half away from zero, once, at the
 * point a displayed or charged figure is produced. Totals are sums of
 * already-rounded figures and are never rounded again.
 *
 * `toPrecision(15)` first removes binary noise such as 1.005 * 100 =
 * 100.49999999999999, so a value that reads as an exact half rounds up. Fifteen significant
 * digits keep every cent and its first decimal up to about 10^12 cents ($10 billion); money
 * inputs are capped far below that (limits.ts), so large amounts never lose cents.
 */
export function roundHalfAwayFromZero(value: number, decimals = 0): number {
  const factor = 10 ** decimals;
  const scaled = Number((Math.abs(value) * factor).toPrecision(15));
  const rounded = (Math.sign(value) * Math.round(scaled)) / factor;
  return rounded === 0 ? 0 : rounded; // never hand back -0
}

/** Whole cents, by the rule above. */
export function roundCents(amount: number): number {
  return roundHalfAwayFromZero(amount, 0);
}
