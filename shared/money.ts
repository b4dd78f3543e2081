import { roundCents } from './wood/rounding';

/**
 * Splits `amountCents` over parts in proportion to `weights` (whole cents each), by the largest
 * remainder method: every part gets the floor of its exact share, and the cents left over go one
 * each to the parts with the largest fractional remainders (ties: the earlier part). The parts
 * always add up to the amount exactly, and no part exceeds its weight when the amount does not
 * exceed the weights' sum. `common practice` (apportionment of a total over lines).
 */
export function splitProRata(amountCents: number, weights: number[]): number[] {
  if (!Number.isInteger(amountCents) || amountCents < 0) throw new RangeError(`amount must be whole cents ≥ 0 (got ${amountCents})`);
  const total = weights.reduce((n, w) => n + w, 0);
  if (amountCents === 0 || total === 0) {
    if (amountCents > 0) throw new RangeError('nothing to split the amount over');
    return weights.map(() => 0);
  }
  const exact = weights.map((w) => (amountCents * w) / total);
  const parts = exact.map(Math.floor);
  let left = amountCents - parts.reduce((n, p) => n + p, 0);
  const order = exact.map((e, i) => ({ i, r: e - Math.floor(e) })).sort((a, b) => b.r - a.r || a.i - b.i);
  for (const { i } of order) {
    if (left <= 0) break;
    parts[i] += 1;
    left -= 1;
  }
  return parts;
}

/** What a line still holds (its paid amounts less what was refunded on it), per kind of money. */
export type LineMoney = { lineId: number; woodCents: number; servicesCents: number; taxCents: number };

/**
 * Decides which part of a refund is wood, services and tax on which line, so the office numbers
 * stay exact: lines refunded in full give back everything they still hold; any rest is spread
 * over what the other lines still hold, pro rata (tax included, so tax is refunded pro rata).
 */
export function allocateRefund(remaining: LineMoney[], fullLineIds: number[], amountCents: number): LineMoney[] {
  const full = remaining.filter((l) => fullLineIds.includes(l.lineId));
  const fullCents = full.reduce((n, l) => n + l.woodCents + l.servicesCents + l.taxCents, 0);
  if (amountCents < fullCents) throw new RangeError('the refund is smaller than the lines refunded in full');
  const others = remaining.filter((l) => !fullLineIds.includes(l.lineId));
  const weights = others.flatMap((l) => [l.woodCents, l.servicesCents, l.taxCents]);
  if (amountCents - fullCents > weights.reduce((n, w) => n + w, 0)) throw new RangeError('the refund is more than the order still holds');
  const parts = splitProRata(amountCents - fullCents, weights);
  return [
    ...full.map((l) => ({ ...l })),
    ...others.map((l, i) => ({ lineId: l.lineId, woodCents: parts[3 * i], servicesCents: parts[3 * i + 1], taxCents: parts[3 * i + 2] })),
  ].filter((l) => l.woodCents + l.servicesCents + l.taxCents > 0);
}

/**
 * Sales tax on a taxable amount at a rate given in thousandths of a percent (7.25 % = 7250):
 * computed once per order on the sum of its taxable lines, rounded to whole cents half away from
 * zero (Stickerline's one rounding rule, shared/wood/rounding.ts), then spread over the lines with
 * splitProRata so the lines add up to the order's tax exactly. `common practice` (tax computed on
 * the invoice total; the state's own rounding rule decides where it differs — check locally).
 */
export function salesTaxCents(taxableCents: number, rateMilliPercent: number): number {
  if (!Number.isInteger(taxableCents) || taxableCents < 0) throw new RangeError('taxable amount must be whole cents ≥ 0');
  if (!Number.isInteger(rateMilliPercent) || rateMilliPercent < 0 || rateMilliPercent > 25_000) throw new RangeError('tax rate must be 0–25 %');
  return roundCents((taxableCents * rateMilliPercent) / 100_000);
}
