import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { formatCents, formatInches, parseInches, toSixteenths, WoodMathError } from '../../../shared/wood';

describe('toSixteenths', () => {
  it.each([
    [1.75, '1 3/4'], [0.1875, '3/16'], [2, '2'], [-1.5, '-1 1/2'], [0, '0'], [0.02, '0'], [-0.02, '0'], [2.97, '3'], [12.4375, '12 7/16'],
  ])('writes %s in as "%s"', (inches, text) => {
    expect(toSixteenths(inches)).toBe(text);
  });

  it('round-trips through parseInches within 1/32 in', () => {
    fc.assert(fc.property(fc.double({ min: -500, max: 500, noNaN: true }), (inches) => {
      expect(Math.abs(parseInches(toSixteenths(inches)) - inches)).toBeLessThanOrEqual(1 / 32 + 1e-12);
    }));
  });

  it('refuses NaN', () => {
    expect(() => toSixteenths(Number.NaN)).toThrow(WoodMathError);
  });
});

describe('formatInches and parseInches', () => {
  it('shows the fraction with the decimal beside it', () => {
    expect(formatInches(1.75)).toBe('1 3/4 in (1.75)');
    expect(formatInches(0.1875)).toBe('3/16 in (0.188)');
  });

  it('reads fractions, decimals and inch marks', () => {
    expect(parseInches('1 3/4')).toBe(1.75);
    expect(parseInches('3/16 in')).toBe(0.1875);
    expect(parseInches('2.5"')).toBe(2.5);
    expect(() => parseInches('about two')).toThrow(WoodMathError);
    expect(() => parseInches('1/0')).toThrow(WoodMathError);
  });
});

describe('formatCents', () => {
  it('writes dollars with thousands separators', () => {
    expect(formatCents(123456)).toBe('$1,234.56');
    expect(formatCents(5)).toBe('$0.05');
    expect(formatCents(100000000)).toBe('$1,000,000.00');
    expect(formatCents(-2550)).toBe('-$25.50');
  });

  it('refuses fractions of a cent', () => {
    expect(() => formatCents(10.5)).toThrow(WoodMathError);
  });
});

describe('format limits', () => {
  it('refuses figures too large to show honestly', () => {
    expect(() => toSixteenths(1e300)).toThrow(WoodMathError);
    expect(() => formatInches(1e7)).toThrow(/inches/);
    expect(() => parseInches('9'.repeat(400))).toThrow(WoodMathError);
    expect(() => formatCents(2 ** 60)).toThrow(/cents/);
  });
});
