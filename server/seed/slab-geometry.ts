/**
 * The outline of a slab seen from above, in pixels: measured widths
 * interpolated along the length, wavy live edges with a bark rim, and a
 * mapping from (along, across) to a point on the face for drawing grain.
 */
import type { Rng } from './prng';

export type EdgeKind = 'none' | 'one' | 'both';
export type Point = [number, number];

export type SlabGeometry = {
  /** Sample positions along the length, 0 = left end, 1 = right end. */
  ps: number[];
  outer: { top: Point[]; bottom: Point[] };
  wood: { top: Point[]; bottom: Point[] };
  heart: { top: Point[]; bottom: Point[] };
  /** A point on the heartwood face: p along the length, f across (0 = top edge, 1 = bottom edge). */
  at(p: number, f: number): Point;
  lengthPx: number;
  scale: number;
};

const SAMPLES = 96;

/** Cosine interpolation between measuring stations, so the outline has no kinks. */
function widthAt(widths: number[], p: number): number {
  if (widths.length === 1) return widths[0];
  const pos = p * (widths.length - 1);
  const i = Math.min(Math.floor(pos), widths.length - 2);
  const t = (1 - Math.cos((pos - i) * Math.PI)) / 2;
  return widths[i] * (1 - t) + widths[i + 1] * t;
}

function wave(rng: Rng, amplitudeIn: number): (p: number) => number {
  const parts = [
    { a: amplitudeIn, f: rng.between(1.2, 2.6), ph: rng.between(0, 6.3) },
    { a: amplitudeIn * 0.45, f: rng.between(4, 7), ph: rng.between(0, 6.3) },
    { a: amplitudeIn * 0.18, f: rng.between(11, 17), ph: rng.between(0, 6.3) },
  ];
  return (p) => parts.reduce((sum, w) => sum + w.a * Math.sin(2 * Math.PI * w.f * p + w.ph), 0);
}

export type GeometryInput = {
  rng: Rng; widthsIn: number[]; lengthIn: number; liveEdge: EdgeKind;
  x0: number; cy: number; scale: number; barkIn: number; sapwoodIn: number;
};

export function slabGeometry({ rng, widthsIn, lengthIn, liveEdge, x0, cy, scale, barkIn, sapwoodIn }: GeometryInput): SlabGeometry {
  const liveTop = liveEdge !== 'none';
  const liveBottom = liveEdge === 'both';
  const waveTop = wave(rng, liveTop ? 0.35 : 0);
  const waveBottom = wave(rng, liveBottom ? 0.35 : 0);
  const barkTop = wave(rng, barkIn * 0.35);
  const barkBottom = wave(rng, barkIn * 0.35);
  const drift = wave(rng, liveEdge === 'none' ? 0 : 0.25);
  const skewL = rng.between(-0.6, 0.6) * scale;
  const skewR = rng.between(-0.6, 0.6) * scale;
  const lengthPx = lengthIn * scale;
  const ps = Array.from({ length: SAMPLES + 1 }, (_, i) => i / SAMPLES);
  const xAt = (p: number, side: 1 | -1) => x0 + p * lengthPx + side * ((1 - p) * skewL + p * skewR);
  const edge = (p: number, side: 1 | -1, insetIn: (p: number) => number): Point => {
    const w = widthAt(widthsIn, p);
    const live = side === -1 ? liveTop : liveBottom;
    const waveIn = live ? (side === -1 ? waveTop(p) : waveBottom(p)) : 0;
    const yIn = drift(p) + side * (w / 2 + waveIn - insetIn(p));
    return [xAt(p, side), cy + yIn * scale];
  };
  const bark = (side: 1 | -1) => (p: number) => {
    const live = side === -1 ? liveTop : liveBottom;
    return live ? Math.max(0.08, barkIn + (side === -1 ? barkTop(p) : barkBottom(p))) : 0;
  };
  const sap = (side: 1 | -1) => (p: number) => {
    const live = side === -1 ? liveTop : liveBottom;
    return bark(side)(p) + (live ? sapwoodIn * (0.8 + 0.2 * Math.sin(p * 9 + side)) : 0);
  };
  const ring = (inset: (side: 1 | -1) => (p: number) => number) => ({
    top: ps.map((p) => edge(p, -1, inset(-1))),
    bottom: ps.map((p) => edge(p, 1, inset(1))),
  });
  const outer = ring(() => () => 0);
  const wood = ring(bark);
  const heart = ring(sap);
  const at = (p: number, f: number): Point => {
    const pos = Math.min(Math.max(p, 0), 1) * SAMPLES;
    const i = Math.min(Math.floor(pos), SAMPLES - 1);
    const t = pos - i;
    const lerp = (a: Point, b: Point): Point => [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t];
    const [xt, yt] = lerp(heart.top[i], heart.top[i + 1]);
    const [xb, yb] = lerp(heart.bottom[i], heart.bottom[i + 1]);
    return [xt + (xb - xt) * f, yt + (yb - yt) * f];
  };
  return { ps, outer, wood, heart, at, lengthPx, scale };
}

const fmt = ([x, y]: Point) => `${x.toFixed(1)} ${y.toFixed(1)}`;

/** Closed path through the top edge left→right and the bottom edge right→left. */
export function bandPath({ top, bottom }: { top: Point[]; bottom: Point[] }): string {
  return `M${top.map(fmt).join('L')}L${[...bottom].reverse().map(fmt).join('L')}Z`;
}

export function polyline(points: Point[]): string {
  return `M${points.map(fmt).join('L')}`;
}
