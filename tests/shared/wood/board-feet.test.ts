import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  averageWidthIn, boardFeet, lumberTallyBoardFeet, roundBoardFeet, WoodMathError,
} from '../../../shared/wood';

const size = fc.double({ min: 0.01, max: 4.5, noNaN: true }); // ×10 stays within the 48 in thickness cap

describe('boardFeet (measured volume)', () => {
  it('counts 1 in × 12 in × 12 in as exactly one board foot', () => {
    // hardwood grading rules' board-foot definition (144 in³), tolerance 1e-12
    expect(boardFeet({ thicknessIn: 1, widthIn: 12, lengthIn: 12 })).toBeCloseTo(1, 12);
  });

  it('gives 8.33 bd ft for an 8/4 × 6 1/4 in × 8 ft board', () => {
    // hardwood grading rules' board foot (144 in³): 2 × 6.25 × 96 ÷ 144 = 8.333; tolerance ±0.005 bd ft
    expect(Math.abs(boardFeet({ thicknessIn: 2, widthIn: 6.25, lengthIn: 96 }) - 8.33)).toBeLessThanOrEqual(0.005);
  });

  it('gives 6 bd ft for a 1 × 6 in board 12 ft long and 50 bd ft for a 2 × 25 in slab 12 ft long', () => {
    // hardwood grading rules' board-foot definition, T × W × L(ft) ÷ 12, tolerance 1e-9
    expect(boardFeet({ thicknessIn: 1, widthIn: 6, lengthIn: 144 })).toBeCloseTo(6, 9);
    expect(boardFeet({ thicknessIn: 2, widthIn: 25, lengthIn: 144 })).toBeCloseTo(50, 9);
  });

  it('scales linearly in each dimension', () => {
    fc.assert(fc.property(size, size, size, fc.double({ min: 0.1, max: 10, noNaN: true }), fc.integer({ min: 0, max: 2 }),
      (t, w, l, k, which) => {
        const before = boardFeet({ thicknessIn: t, widthIn: w, lengthIn: l });
        const after = boardFeet({
          thicknessIn: which === 0 ? k * t : t,
          widthIn: which === 1 ? k * w : w,
          lengthIn: which === 2 ? k * l : l,
        });
        expect(Math.abs(after - k * before)).toBeLessThanOrEqual(1e-9 * Math.max(1, k * before));
      }));
  });

  it('refuses absurd sizes with a clear error instead of Infinity', () => {
    expect(() => boardFeet({ thicknessIn: 1e200, widthIn: 1e200, lengthIn: 1e200 })).toThrow(/thicknessIn must be at most 48/);
    expect(() => boardFeet({ thicknessIn: 2, widthIn: 24, lengthIn: 1e6 })).toThrow(/lengthIn/);
    expect(() => lumberTallyBoardFeet({ nominalQuarters: 8, widthIn: 6, lengthFt: 1e300 })).toThrow(/lengthFt/);
    expect(() => averageWidthIn([20, 1e9])).toThrow(/widthsIn\[1\]/);
  });

  it('rejects zero, negative and non-numeric sizes and names the field', () => {
    expect(() => boardFeet({ thicknessIn: 0, widthIn: 12, lengthIn: 12 })).toThrow(WoodMathError);
    expect(() => boardFeet({ thicknessIn: 1, widthIn: -3, lengthIn: 12 })).toThrow(/widthIn/);
    try {
      boardFeet({ thicknessIn: 1, widthIn: 12, lengthIn: Number.NaN });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(WoodMathError);
      expect((error as WoodMathError).field).toBe('lengthIn');
      expect((error as WoodMathError).code).toBe('wood_math');
    }
  });
});

describe('roundBoardFeet', () => {
  it('rounds to two decimals, halves away from zero', () => {
    expect(roundBoardFeet(8.333333)).toBe(8.33);
    expect(roundBoardFeet(1.005)).toBe(1.01);
    expect(roundBoardFeet(2.994)).toBe(2.99);
  });
});

describe('averageWidthIn', () => {
  it('averages widths measured at stations along the slab (common practice)', () => {
    expect(averageWidthIn([20, 24, 22])).toBe(22);
    expect(averageWidthIn([17.5])).toBe(17.5);
  });

  it('refuses an empty list or a zero width', () => {
    expect(() => averageWidthIn([])).toThrow(WoodMathError);
    expect(() => averageWidthIn([20, 0, 22])).toThrow(/widthsIn\[1\]/);
  });
});

describe('lumberTallyBoardFeet (grading-rules tally)', () => {
  it('tallies 8/4 × 6 1/4 in × 8 ft as 8 bd ft although its volume is 8.33', () => {
    // board-measure rule of the hardwood grading rules (NHLA Rules for the Measurement & Inspection of Hardwood & Cypress):
    // surface measure 6.25 × 8 ÷ 12 = 4 1/6 → 4 ft, × 8/4 → 8 bd ft; exact
    expect(lumberTallyBoardFeet({ nominalQuarters: 8, widthIn: 6.25, lengthFt: 8 })).toBe(8);
    expect(roundBoardFeet(boardFeet({ thicknessIn: 2, widthIn: 6.25, lengthIn: 96 }))).toBe(8.33);
  });

  it('rounds surface measure up from a half and down below it', () => {
    // board-measure rule: surface measure to the nearest whole foot; a half counting up is common practice as stated here; exact
    expect(lumberTallyBoardFeet({ nominalQuarters: 4, widthIn: 7, lengthFt: 10 })).toBe(6); // SM 5.83 → 6
    expect(lumberTallyBoardFeet({ nominalQuarters: 4, widthIn: 6, lengthFt: 9 })).toBe(5); // SM 4.5 → 5
    expect(lumberTallyBoardFeet({ nominalQuarters: 6, widthIn: 5, lengthFt: 8 })).toBe(4.5); // SM 3.33 → 3, × 6/4
  });

  it('counts stock thinner than 4/4 as 4/4', () => {
    // hardwood grading rules, stock under 1 in tallied as 1 in (from memory); exact
    expect(lumberTallyBoardFeet({ nominalQuarters: 3, widthIn: 6, lengthFt: 8 })).toBe(4);
  });

  it('refuses a fractional number of quarters', () => {
    expect(() => lumberTallyBoardFeet({ nominalQuarters: 4.5, widthIn: 6, lengthFt: 8 })).toThrow(WoodMathError);
  });
});
