import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  centsAsPlainDollars, formatBoardFeet, formatCents, formatDimensions, formatInches, formatLength, formatWeight,
  inchesForInput, parseDollarsToCents, parseInches, toSixteenths, WoodMathError,
} from '../../../shared/wood';

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

describe('parseInches: what people type into an inch box', () => {
  it.each([
    ['2.25', 2.25], ['.75', 0.75], ['2.', 2], ['2 1/4', 2.25], ['2-1/4', 2.25], ['2 - 1/4', 2.25], ['2 ¼', 2.25], ['2¼', 2.25],
    ['2-¾', 2.75], ['⅝', 0.625], ['3/4', 0.75], ['3 / 4', 0.75], ['1⁄2', 0.5], ['2 1/4"', 2.25], ['2 1/4″', 2.25], ['2 1/4”', 2.25],
    ['2 1/4 in', 2.25], ['2.5in', 2.5], ['3/16 in.', 0.1875], ['12 inches', 12], ['1 inch', 1], ['  26  5/16  ', 26.3125], ['-1 1/2', -1.5],
  ])('reads "%s" as %s in', (text, inches) => {
    expect(parseInches(text)).toBeCloseTo(inches, 12);
  });

  it('never glues a whole number and a fraction into one number ("2 1/4" is not 214, "1/2" is not 12)', () => {
    expect(parseInches('2 1/4')).toBe(2.25);
    expect(parseInches('1/2')).toBe(0.5);
  });

  it('reads quarter notation only in a thickness field', () => {
    expect(parseInches('8/4', { thickness: true })).toBe(2);
    expect(parseInches('5/4', { thickness: true })).toBe(1.25);
    expect(parseInches('12/4"', { thickness: true })).toBe(3);
    expect(() => parseInches('8/4')).toThrow(/for thickness only/);
    expect(() => parseInches('8/3', { thickness: true })).toThrow(WoodMathError);
  });

  it.each(['', '   ', 'about two', '2 1/4/8', '1/0', '2,5', '1e3', 'Infinity', '2 ft', "6'", '57 mm', '2 5/4', '--2', '2 1/2 3/4', '½½', 'in'])(
    'refuses "%s" with a plain message', (text) => {
      let thrown: unknown;
      try { parseInches(text); } catch (e) { thrown = e; }
      expect(thrown).toBeInstanceOf(WoodMathError);
      // Plain words for a person: no field names or programming terms.
      expect((thrown as Error).message).not.toMatch(/NaN|undefined|inches must|regex|parse/i);
    },
  );

  it('reads every whole-and-sixteenths size the way it is written, in each spelling', () => {
    fc.assert(fc.property(fc.integer({ min: 0, max: 600 }), fc.integer({ min: 1, max: 15 }), fc.constantFrom(' ', '-'), fc.constantFrom('', '"', ' in', '″'),
      (whole, sixteenths, joiner, mark) => {
        const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));
        const d = gcd(sixteenths, 16);
        const text = `${whole}${joiner}${sixteenths / d}/${16 / d}${mark}`;
        expect(parseInches(text)).toBeCloseTo(whole + sixteenths / 16, 12);
      }));
  });

  it('reads any decimal it is given, with or without an inch mark', () => {
    fc.assert(fc.property(fc.integer({ min: 0, max: 100_000 }), fc.constantFrom('', '"', ' in'), (hundredths, mark) => {
      const text = `${Math.floor(hundredths / 100)}.${String(hundredths % 100).padStart(2, '0')}${mark}`;
      expect(parseInches(text)).toBeCloseTo(hundredths / 100, 9);
    }));
  });

  it('gives back a box value that reads as exactly the stored size', () => {
    fc.assert(fc.property(fc.double({ min: 0.01, max: 600, noNaN: true }), (inches) => {
      expect(parseInches(inchesForInput(inches))).toBeCloseTo(inches, 9);
    }));
    expect(inchesForInput(2.25)).toBe('2 1/4');
    expect(inchesForInput(2.3)).toBe('2.3');
    expect(inchesForInput(null)).toBe('');
  });
});

describe('the one measurement formatter', () => {
  it('writes imperial lengths in sixteenths with the unit', () => {
    expect(formatInches(1.75)).toBe('1 3/4 in');
    expect(formatLength(26.3, 'imperial')).toBe('26 5/16 in');
  });

  // 1 in = 25.4 mm and 1 lb = 0.45359237 kg exactly (international yard and pound agreement, 1959).
  it('writes metric lengths in millimetres, and centimetres from a metre', () => {
    expect(formatLength(2, 'metric')).toBe('51 mm');
    expect(formatLength(26.3, 'metric')).toBe('668 mm');
    expect(formatLength(96, 'metric')).toBe('244 cm');
    expect(formatDimensions({ thicknessIn: 2, widthIn: 26.3, lengthIn: 96 }, 'metric')).toBe('51 mm × 668 mm × 244 cm');
    expect(formatDimensions({ thicknessIn: 2, widthIn: 26.3, lengthIn: 96 }, 'imperial')).toBe('2 × 26 5/16 × 96 in');
  });

  it('writes weights in whole pounds or kilograms', () => {
    expect(formatWeight(184.4, 'imperial')).toBe('184 lb');
    expect(formatWeight(184.4, 'metric')).toBe('84 kg');
    expect(formatWeight(1200, 'imperial')).toBe('1,200 lb');
  });

  // One board foot is 144 in³ (hardwood grading rules' definition) = 0.00236 m³.
  it('keeps board feet and adds cubic metres in metric', () => {
    expect(formatBoardFeet(18, 'imperial')).toBe('18 bd ft');
    expect(formatBoardFeet(18, 'metric')).toBe('18 bd ft (0.042 m³)');
    expect(formatBoardFeet(12.345, 'imperial')).toBe('12.35 bd ft');
  });
});

describe('money', () => {
  it('writes dollars with thousands separators', () => {
    expect(formatCents(123456)).toBe('$1,234.56');
    expect(formatCents(5)).toBe('$0.05');
    expect(formatCents(100000000)).toBe('$1,000,000.00');
    expect(formatCents(-2550)).toBe('-$25.50');
  });

  it('refuses fractions of a cent', () => {
    expect(() => formatCents(10.5)).toThrow(WoodMathError);
  });

  it('writes plain dollars for spreadsheets', () => {
    expect(centsAsPlainDollars(123456)).toBe('1234.56');
    expect(centsAsPlainDollars(5)).toBe('0.05');
  });

  it.each([
    ['1000', 100000], ['1000.50', 100050], ['$1,000', 100000], ['$ 1,000.5', 100050], ['1,234,567.89', 123456789], ['.5', 50], ['0.05', 5], ['12.', 1200],
  ])('reads "%s" as %s cents', (text, cents) => {
    expect(parseDollarsToCents(text)).toBe(cents);
  });

  it.each(['', 'ten', '1,00', '10.005', '$-5', '1.2.3', '$', '1 000'])('refuses "%s"', (text) => {
    expect(() => parseDollarsToCents(text)).toThrow(WoodMathError);
  });

  it('reads back whatever formatCents wrote', () => {
    fc.assert(fc.property(fc.integer({ min: 0, max: 10_000_000_000 }), (cents) => {
      expect(parseDollarsToCents(formatCents(cents))).toBe(cents);
      expect(parseDollarsToCents(centsAsPlainDollars(cents))).toBe(cents);
    }));
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

describe('typed dollar amounts', () => {
  it('refuses an amount above the $100 million cap', () => {
    expect(parseDollarsToCents('100,000,000.00')).toBe(10_000_000_000);
    expect(() => parseDollarsToCents('100,000,000.01')).toThrow(/too large/);
    expect(() => parseDollarsToCents('90071992547409.93')).toThrow(WoodMathError);
  });
});
