/**
 * Hints of figure drawn over the slab face: crotch feathers, burl eyes,
 * spalting zone lines, curl stripes, quilt blotches and ray fleck. They
 * suggest the figure; they do not claim to show this slab's real face.
 */
import type { Rng } from './prng';
import { polyline, type Point, type SlabGeometry } from './slab-geometry';

export type MarkColours = { grain: string; fleck: string };

function crotch(g: SlabGeometry, rng: Rng, c: MarkColours): string {
  const start = rng.between(0.55, 0.68);
  const parts: string[] = [];
  for (let j = 0; j < 26; j++) {
    const p0 = start + j * ((0.97 - start) / 26);
    for (const side of [-1, 1]) {
      const pts: Point[] = [];
      for (let t = 0; t <= 1.0001; t += 0.125) {
        pts.push(g.at(p0 - t * 0.13, 0.5 + side * 0.46 * Math.pow(t, 0.7) + rng.wobble(0.01)));
      }
      parts.push(`<path d="${polyline(pts)}" stroke="${c.grain}" stroke-opacity="0.42" stroke-width="1.6" fill="none"/>`);
    }
  }
  const seam = Array.from({ length: 16 }, (_, i) => g.at(start + (i / 15) * (0.99 - start), 0.5 + rng.wobble(0.02)));
  parts.push(`<path d="${polyline(seam)}" stroke="${c.grain}" stroke-opacity="0.7" stroke-width="2.4" fill="none"/>`);
  return parts.join('');
}

function burl(g: SlabGeometry, rng: Rng, c: MarkColours): string {
  const parts: string[] = [];
  for (let k = 0; k < 3; k++) {
    const cp = rng.between(0.12, 0.88);
    const cf = rng.between(0.2, 0.8);
    for (let e = 0; e < 22; e++) {
      const [x, y] = g.at(cp + rng.wobble(0.08), Math.min(0.97, Math.max(0.03, cf + rng.wobble(0.25))));
      const r = rng.between(1.5, 3.8);
      parts.push(`<circle cx="${x.toFixed(1)}" cy="${y.toFixed(1)}" r="${(r * 2.2).toFixed(1)}" fill="none" stroke="${c.grain}" stroke-opacity="0.25" stroke-width="1.2"/>`);
      parts.push(`<circle cx="${x.toFixed(1)}" cy="${y.toFixed(1)}" r="${r.toFixed(1)}" fill="${c.grain}" fill-opacity="0.75"/>`);
    }
  }
  return parts.join('');
}

function spalted(g: SlabGeometry, rng: Rng): string {
  const parts: string[] = [];
  for (let b = 0; b < 7; b++) {
    const [x, y] = g.at(rng.between(0.05, 0.95), rng.between(0.15, 0.85));
    parts.push(`<ellipse cx="${x.toFixed(1)}" cy="${y.toFixed(1)}" rx="${rng.between(30, 90).toFixed(1)}" ry="${rng.between(12, 35).toFixed(1)}" fill="#f4ecdc" fill-opacity="0.32"/>`);
  }
  for (let z = 0; z < 6; z++) {
    let p = rng.between(0.05, 0.95);
    let f = rng.between(0.05, 0.95);
    let heading = rng.between(0, 2 * Math.PI);
    const pts: Point[] = [];
    for (let s = 0; s < 40; s++) {
      pts.push(g.at(p, f));
      heading += rng.wobble(0.5);
      p += Math.cos(heading) * 0.008;
      f += Math.sin(heading) * 0.04;
      // Zone lines turn back at the edges of the face instead of running along them.
      if (p < 0.02 || p > 0.98) heading = Math.PI - heading;
      if (f < 0.06 || f > 0.94) heading = -heading;
      p = Math.min(0.98, Math.max(0.02, p));
      f = Math.min(0.94, Math.max(0.06, f));
    }
    parts.push(`<path d="${polyline(pts)}" stroke="#1d1712" stroke-opacity="0.8" stroke-width="1.7" fill="none"/>`);
  }
  return parts.join('');
}

function curl(g: SlabGeometry, rng: Rng): string {
  const parts: string[] = [];
  let p = 0.01;
  let light = true;
  while (p < 1) {
    const pts = [0, 0.25, 0.5, 0.75, 1].map((f) => g.at(p + rng.wobble(0.003), f));
    const width = g.lengthPx * rng.between(0.004, 0.007);
    parts.push(`<path d="${polyline(pts)}" stroke="${light ? '#fffaf0' : '#2a1a10'}" stroke-opacity="${light ? 0.16 : 0.07}" stroke-width="${width.toFixed(1)}" fill="none"/>`);
    p += rng.between(0.009, 0.016);
    light = !light;
  }
  return parts.join('');
}

function quilted(g: SlabGeometry, rng: Rng): string {
  const parts: string[] = [];
  for (let p = 0.04; p < 0.98; p += 0.035) {
    for (let f = 0.12; f < 0.95; f += 0.18) {
      const [x, y] = g.at(p + rng.wobble(0.008), f + rng.wobble(0.04));
      parts.push(`<ellipse cx="${x.toFixed(1)}" cy="${y.toFixed(1)}" rx="${rng.between(8, 14).toFixed(1)}" ry="${rng.between(4, 8).toFixed(1)}" fill="#fffaf0" fill-opacity="0.16"/>`);
    }
  }
  return parts.join('');
}

function rayFleck(g: SlabGeometry, rng: Rng, c: MarkColours): string {
  const parts: string[] = [];
  for (let i = 0; i < 140; i++) {
    const [x, y] = g.at(rng.next(), rng.between(0.05, 0.95));
    parts.push(`<ellipse cx="${x.toFixed(1)}" cy="${y.toFixed(1)}" rx="${rng.between(4, 13).toFixed(1)}" ry="${rng.between(1, 2.4).toFixed(1)}" fill="${c.fleck}" fill-opacity="0.5"/>`);
  }
  return parts.join('');
}

export function figureMarks(figures: string[], g: SlabGeometry, rng: Rng, c: MarkColours): string {
  const draw: Record<string, () => string> = {
    crotch: () => crotch(g, rng, c),
    burl: () => burl(g, rng, c),
    spalted: () => spalted(g, rng),
    curl: () => curl(g, rng),
    quilted: () => quilted(g, rng),
    'ray-fleck': () => rayFleck(g, rng, c),
  };
  // Figure kinds the mill adds later have no drawing; the slab is shown plain.
  return figures.map((f) => draw[f]?.() ?? '').join('');
}
