import { describe, expect, it } from 'vitest';
import { flatteningEstimate, WoodMathError } from '../../../shared/wood';

// Model (common practice): each face loses the measured deviation, at least one 1/8 in pass per face.
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
    expect(e.finishedThicknessIn).toBeCloseTo(0.9, 9);
    expect(e.reason).toMatch(/0\.9 in.*1 in minimum/);
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
});
