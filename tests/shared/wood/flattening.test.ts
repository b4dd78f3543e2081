import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { flatteningEstimate, WoodMathError } from '../../../shared/wood';

// Model (common practice): each face is cut in whole 1/8 in router-sled passes until the measured deviation is gone,
// at least one pass per face; what the passes remove is what comes off the thickness.
const slab = { thicknessIn: 2, widthIn: 24, lengthIn: 96 };

describe('flatteningEstimate', () => {
  it('takes the deviation off both faces of a cupped slab', () => {
    const e = flatteningEstimate({ ...slab, deviationIn: 0.25 });
    expect(e.removedPerFaceIn).toEqual({ first: 0.25, second: 0.25 });
    expect(e.finishedThicknessIn).toBe(1.5);
    expect(e.passes).toBe(4); // 2 passes of 1/8 in per face
    expect(e.faceAreaSqFt).toBe(16); // 24 × 96 ÷ 144
    expect(e.feasible).toBe(true);
    expect(e.reason).toBeUndefined();
  });

  it('still gives a flat slab one cleanup pass per face', () => {
    const e = flatteningEstimate({ ...slab, deviationIn: 0 });
    expect(e.passes).toBe(2);
    expect(e.finishedThicknessIn).toBe(1.75);
  });

  it('counts passes without floating-point extras', () => {
    expect(flatteningEstimate({ ...slab, deviationIn: 0.3, passDepthIn: 0.1 }).passes).toBe(6);
    expect(flatteningEstimate({ ...slab, deviationIn: 0.3 }).passes).toBe(6); // 0.3 / 0.125 = 2.4 → 3 per face
  });

  it('marks a slab that would end up too thin as not feasible and says why', () => {
    const e = flatteningEstimate({ ...slab, thicknessIn: 1.5, deviationIn: 0.3 });
    expect(e.feasible).toBe(false);
    // 0.3 in needs 3 passes of 1/8 in per face = 0.375 in each face → 1.5 − 0.75 = 0.75 in
    expect(e.finishedThicknessIn).toBeCloseTo(0.75, 9);
    expect(e.reason).toMatch(/0\.75 in.*1 in minimum/);
  });

  it('removes exactly passes × pass depth, and the finished thickness is what the passes leave', () => {
    const e = flatteningEstimate({ ...slab, deviationIn: 0.3 });
    expect(e.passesPerFace).toEqual({ first: 3, second: 3 });
    expect(e.removedPerFaceIn.first).toBeCloseTo(3 * 0.125, 12);
    expect(e.finishedThicknessIn).toBeCloseTo(2 - 6 * 0.125, 12);
    fc.assert(fc.property(
      fc.double({ min: 1, max: 12, noNaN: true }), fc.double({ min: 0, max: 2, noNaN: true }), fc.double({ min: 1 / 64, max: 1, noNaN: true }),
      (thicknessIn, deviationIn, passDepthIn) => {
        const x = flatteningEstimate({ ...slab, thicknessIn, deviationIn, passDepthIn, minFinishedThicknessIn: 0.25 });
        const removed = x.removedPerFaceIn.first + x.removedPerFaceIn.second;
        expect(Math.abs(removed - x.passes * passDepthIn)).toBeLessThanOrEqual(1e-9);
        expect(x.removedPerFaceIn.first).toBeGreaterThanOrEqual(Math.max(deviationIn, passDepthIn) - 1e-9);
        expect(Math.abs(x.finishedThicknessIn - Math.max(0, thicknessIn - removed))).toBeLessThanOrEqual(1e-9);
      }));
  });

  it('never reports a negative finished thickness', () => {
    const e = flatteningEstimate({ ...slab, thicknessIn: 1, deviationIn: 2 });
    expect(e.finishedThicknessIn).toBe(0);
    expect(e.feasible).toBe(false);
  });

  it('follows a custom minimum finished thickness', () => {
    expect(flatteningEstimate({ ...slab, thicknessIn: 1.5, deviationIn: 0.3, minFinishedThicknessIn: 0.75 }).feasible).toBe(true);
  });

  it('refuses a negative deviation or a zero pass depth', () => {
    expect(() => flatteningEstimate({ ...slab, deviationIn: -0.1 })).toThrow(/deviationIn/);
    expect(() => flatteningEstimate({ ...slab, deviationIn: 0.1, passDepthIn: 0 })).toThrow(WoodMathError);
  });

  it('refuses absurd sizes instead of counting a billion passes', () => {
    expect(() => flatteningEstimate({ ...slab, deviationIn: 0.25, passDepthIn: 1e-12 })).toThrow(/passDepthIn/);
    expect(() => flatteningEstimate({ ...slab, thicknessIn: 1e6, deviationIn: 0.25 })).toThrow(/thicknessIn/);
    expect(() => flatteningEstimate({ ...slab, deviationIn: 1e6 })).toThrow(/deviationIn/);
    expect(() => flatteningEstimate({ ...slab, widthIn: 1e200, deviationIn: 0.25 })).toThrow(/widthIn/);
  });
});
