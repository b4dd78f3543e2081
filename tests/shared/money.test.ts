import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { allocateRefund, salesTaxCents, splitProRata } from '../../shared/money';

describe('splitProRata (largest remainder; common practice)', () => {
  it('splits $10.00 over three equal lines as 334 + 333 + 333', () => {
    expect(splitProRata(1000, [500, 500, 500])).toEqual([334, 333, 333]);
  });
  it('always adds up to the amount and never gives a part more than its weight', () => {
    fc.assert(fc.property(fc.array(fc.integer({ min: 0, max: 500_000 }), { minLength: 1, maxLength: 12 }), fc.double({ min: 0, max: 1, noNaN: true }), (weights, f) => {
      const total = weights.reduce((n, w) => n + w, 0);
      const amount = Math.floor(total * f);
      const parts = splitProRata(amount, weights);
      expect(parts.reduce((n, p) => n + p, 0)).toBe(amount);
      parts.forEach((p, i) => expect(p).toBeLessThanOrEqual(weights[i]));
    }));
  });
});

describe('allocateRefund', () => {
  const lines = [
    { lineId: 1, woodCents: 40_000, servicesCents: 6_000, taxCents: 3_220 },
    { lineId: 2, woodCents: 20_000, servicesCents: 0, taxCents: 1_400 },
  ];
  it('a line refunded in full gives back its wood, services and tax; the rest is spread pro rata', () => {
    const out = allocateRefund(lines, [2], 21_400 + 4_922);
    expect(out.find((l) => l.lineId === 2)).toEqual(lines[1]);
    const one = out.find((l) => l.lineId === 1)!;
    expect(one.woodCents + one.servicesCents + one.taxCents).toBe(4_922);
    expect(one.taxCents).toBe(322); // a tenth of the line, so a tenth of its tax
  });
  it('refuses more than the order still holds', () => {
    expect(() => allocateRefund(lines, [], 70_621)).toThrow(RangeError);
  });
});

describe('salesTaxCents (rounded once per order, half away from zero)', () => {
  it('7.25 % of $123.45 is $8.95 (8.950125 rounds to 8.95)', () => {
    expect(salesTaxCents(12_345, 7_250)).toBe(895);
  });
  it('6 % of $0.25 is 1.5 cents, rounded up to 2', () => {
    expect(salesTaxCents(25, 6_000)).toBe(2);
  });
  it('no rate, no tax', () => {
    expect(salesTaxCents(99_999, 0)).toBe(0);
  });
});
