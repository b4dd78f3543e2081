import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  DEFAULT_PRICING_RULES, roundCents, slabPriceBreakdown, slabPriceCents, WOOD_LIMITS, WoodMathError, type PricingRules,
} from '../../../shared/wood';

/** Exact half-up rounding of num/den for whole non-negative numbers, in BigInt so large amounts stay exact. */
const roundDiv = (num: bigint, den: bigint) => (2n * num + den) / (2n * den);
const hundredths = (text: string) => BigInt(Math.round(Number(text.replace(/,/g, '')) * 100));

/** Reads a line's label and multiplies it out exactly; null for lines whose label shows no product. */
function labelAmount(label: string): bigint | null {
  let m = /^([\d.]+) bd ft × \$([\d,.]+)\/bd ft$/.exec(label);
  if (m) return roundDiv(hundredths(m[1]) * hundredths(m[2]), 100n);
  m = /: ([\d.]+) sq ft × \$([\d,.]+)\/sq ft$/.exec(label);
  if (m) return roundDiv(hundredths(m[1]) * hundredths(m[2]), 100n);
  m = /: ([\d.]+) % of \$([\d,.]+)$/.exec(label);
  if (m) return roundDiv(hundredths(m[1]) * hundredths(m[2]), 10000n);
  return null;
}

// Prices use the demo mill's invented rules; board feet follow the hardwood grading rules' definition (144 in³).
const rules: PricingRules = {
  figurePremiums: { crotch: 1.5, burl: 1.75, curl: 1.25 },
  thickPremium: { minThicknessIn: 3, multiplier: 1.2 },
  minimumChargeCents: 2500,
  flatteningCentsPerSqFt: 800,
};
const slab = { thicknessIn: 2, widthIn: 24, lengthIn: 96, ratePerBoardFootCents: 1400, rules }; // 32 bd ft

const amount = (b: ReturnType<typeof slabPriceBreakdown>, code: string) =>
  b.lines.filter((l) => l.code === code).map((l) => l.amountCents);

describe('slabPriceBreakdown', () => {
  it('prices a plain slab at board feet × rate', () => {
    const b = slabPriceBreakdown(slab);
    expect(b.boardFeet).toBe(32);
    expect(b.lines).toHaveLength(1);
    expect(amount(b, 'base')).toEqual([44800]);
    expect(b.totalCents).toBe(44800);
  });

  it('uses the displayed two-decimal board feet and rounds the base half up once', () => {
    // 2 × 6.25 × 96 ÷ 144 = 8.333… → 8.33 bd ft; 8.33 × 1299 = 10820.67 → 10821 cents
    const b = slabPriceBreakdown({ ...slab, widthIn: 6.25, ratePerBoardFootCents: 1299 });
    expect(b.boardFeet).toBe(8.33);
    expect(amount(b, 'base')).toEqual([10821]);
  });

  it('applies only the largest figure premium when a slab has several figures', () => {
    const b = slabPriceBreakdown({ ...slab, figures: ['curl', 'crotch', 'unlisted-figure'] });
    expect(amount(b, 'figure')).toEqual([22400]); // 44800 × 0.5; curl's 0.25 is not added
    expect(b.lines.find((l) => l.code === 'figure')?.label).toBe('Figure premium, crotch: 50 % of $448.00');
    expect(b.totalCents).toBe(67200);
  });

  it('adds the thick-stock premium on the base from the threshold thickness up', () => {
    const thick = slabPriceBreakdown({ ...slab, thicknessIn: 3, figures: ['burl'] }); // 48 bd ft → 67200
    expect(amount(thick, 'thickness')).toEqual([13440]); // 67200 × 0.2
    expect(amount(thick, 'figure')).toEqual([50400]); // 67200 × 0.75, not compounded with thickness
    expect(amount(slabPriceBreakdown({ ...slab, thicknessIn: 2.99 }), 'thickness')).toEqual([]);
  });

  it('tops a small piece up to the minimum charge', () => {
    const b = slabPriceBreakdown({ ...slab, thicknessIn: 1, widthIn: 6, lengthIn: 24 }); // 1 bd ft → 1400
    expect(amount(b, 'minimum')).toEqual([1100]);
    expect(b.slabCents).toBe(2500);
  });

  it('lets a hand-set price replace the computed one and shows the reason', () => {
    const b = slabPriceBreakdown({ ...slab, overrideCents: 40000, overrideReason: 'Sold with its book-matched twin' });
    const line = b.lines.find((l) => l.code === 'override');
    expect(line?.amountCents).toBe(40000 - 44800);
    expect(line?.label).toMatch(/book-matched twin/);
    expect(b.slabCents).toBe(40000);
    expect(b.totalCents).toBe(40000);
  });

  it('refuses a hand-set price without a reason', () => {
    expect(() => slabPriceBreakdown({ ...slab, overrideCents: 40000, overrideReason: '  ' })).toThrow(/overrideReason/);
    expect(() => slabPriceBreakdown({ ...slab, overrideCents: 10.5, overrideReason: 'x' })).toThrow(WoodMathError);
  });

  it('prices flattening separately by the area of one face', () => {
    // 24 × 96 ÷ 144 = 16 sq ft × 800 = 12800 cents
    const b = slabPriceBreakdown({ ...slab, withFlattening: true });
    expect(b.slabCents).toBe(44800);
    expect(b.flatteningCents).toBe(12800);
    expect(b.totalCents).toBe(57600);
    expect(slabPriceCents({ ...slab, withFlattening: true })).toBe(57600);
  });

  it('falls back to the demo mill defaults when no rules are given', () => {
    const { rules: _ignored, ...noRules } = slab;
    const b = slabPriceBreakdown({ ...noRules, figures: ['spalted'] });
    expect(amount(b, 'figure')).toEqual([Math.round(44800 * ((DEFAULT_PRICING_RULES.figurePremiums.spalted ?? Number.NaN) - 1))]);
  });

  it('always gives whole-cent lines that sum exactly to the total', () => {
    const figureSlugs = Object.keys(DEFAULT_PRICING_RULES.figurePremiums);
    fc.assert(fc.property(
      fc.record({
        thicknessIn: fc.double({ min: 0.25, max: 6, noNaN: true }),
        widthIn: fc.double({ min: 1, max: 60, noNaN: true }),
        lengthIn: fc.double({ min: 6, max: 240, noNaN: true }),
        ratePerBoardFootCents: fc.integer({ min: 0, max: 10000 }),
        figures: fc.subarray([...figureSlugs, 'straight']),
        withFlattening: fc.boolean(),
        overrideCents: fc.option(fc.integer({ min: 0, max: 2_000_000 }), { nil: null }),
      }),
      (input) => {
        const b = slabPriceBreakdown({ ...input, overrideReason: 'Yard sale' });
        for (const line of b.lines) expect(Number.isInteger(line.amountCents)).toBe(true);
        expect(b.lines.reduce((s, l) => s + l.amountCents, 0)).toBe(b.totalCents);
        expect(b.slabCents + b.flatteningCents).toBe(b.totalCents);
        expect(b.lines.filter((l) => l.code === 'figure').length).toBeLessThanOrEqual(1);
        if (input.overrideCents === null) expect(b.slabCents).toBeGreaterThanOrEqual(DEFAULT_PRICING_RULES.minimumChargeCents);
        else expect(b.slabCents).toBe(input.overrideCents);
      }));
  });

  it('prices flattening on the face area printed on its line, and says both faces are done', () => {
    // 25 × 96 ÷ 144 = 16.666… sq ft: the line prints 16.67 and charges 16.67 × $8.00 = $133.36, not $133.33
    const b = slabPriceBreakdown({ ...slab, widthIn: 25, withFlattening: true });
    const line = b.lines.find((l) => l.code === 'flattening')!;
    expect(line.label).toBe('Flattening both faces, charged on one face: 16.67 sq ft × $8.00/sq ft');
    expect(line.amountCents).toBe(13336);
  });

  it('makes every line whose label shows a product multiply out to its amount to the cent (property)', () => {
    fc.assert(fc.property(
      fc.record({
        thicknessIn: fc.double({ min: 0.25, max: 48, noNaN: true }),
        widthIn: fc.double({ min: 1, max: 144, noNaN: true }),
        lengthIn: fc.double({ min: 6, max: 720, noNaN: true }),
        ratePerBoardFootCents: fc.integer({ min: 0, max: WOOD_LIMITS.rateCents }),
        flat: fc.integer({ min: 0, max: WOOD_LIMITS.rateCents }),
        figure: fc.double({ min: 1, max: 10, noNaN: true }),
        thick: fc.double({ min: 0.5, max: 10, noNaN: true }),
      }),
      ({ flat, figure, thick, ...input }) => {
        const r: PricingRules = { figurePremiums: { burl: figure }, thickPremium: { minThicknessIn: 2, multiplier: thick },
          minimumChargeCents: 2500, flatteningCentsPerSqFt: flat };
        const b = slabPriceBreakdown({ ...input, figures: ['burl'], withFlattening: true, rules: r });
        let checked = 0;
        for (const line of b.lines) {
          const expected = labelAmount(line.label);
          if (expected === null) continue;
          checked++;
          expect(BigInt(line.amountCents)).toBe(line.amountCents < 0 ? -expected : expected);
        }
        expect(checked).toBeGreaterThanOrEqual(2); // base and flattening at least
      }));
  });

  it('keeps every cent at large amounts', () => {
    // half-up rounding stays exact far above any price Stickerline accepts
    expect(roundCents(123_456_789_012.5)).toBe(123_456_789_013);
    expect(roundCents(123_456_789_012.49)).toBe(123_456_789_012);
    expect(roundCents(9_999_999_999.995)).toBe(10_000_000_000);
    const big = slabPriceBreakdown({ thicknessIn: 48, widthIn: 144, lengthIn: 720, ratePerBoardFootCents: WOOD_LIMITS.rateCents, rules });
    expect(big.boardFeet).toBe(34560);
    expect(amount(big, 'base')).toEqual([34560 * WOOD_LIMITS.rateCents]);
    expect(big.totalCents).toBe(34560 * WOOD_LIMITS.rateCents * 1.2); // thick-stock 20 % on top
    expect(Number.isSafeInteger(big.totalCents)).toBe(true);
  });

  it('refuses money inputs above the sane caps', () => {
    expect(() => slabPriceBreakdown({ ...slab, ratePerBoardFootCents: Number.MAX_SAFE_INTEGER })).toThrow(/ratePerBoardFootCents/);
    expect(() => slabPriceBreakdown({ ...slab, ratePerBoardFootCents: WOOD_LIMITS.rateCents + 1 })).toThrow(WoodMathError);
    expect(() => slabPriceBreakdown({ ...slab, overrideCents: 1e15, overrideReason: 'x' })).toThrow(/overrideCents/);
    expect(() => slabPriceBreakdown({ ...slab, rules: { ...rules, minimumChargeCents: 2 ** 53 } })).toThrow(/minimumChargeCents/);
    expect(() => slabPriceBreakdown({ ...slab, rules: { ...rules, figurePremiums: { burl: 1e9 } }, figures: ['burl'] })).toThrow(/burl/);
  });

  it('refuses a fractional rate and bad sizes', () => {
    expect(() => slabPriceBreakdown({ ...slab, ratePerBoardFootCents: 12.5 })).toThrow(/ratePerBoardFootCents/);
    expect(() => slabPriceBreakdown({ ...slab, lengthIn: -1 })).toThrow(WoodMathError);
  });
});
