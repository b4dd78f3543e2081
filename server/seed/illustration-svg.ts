/**
 * Builds the SVG of a slab seen from above, lying on stickers in the yard:
 * outline from the measured widths, bark rim on live edges, sapwood band,
 * growth-ring lines, figure hints, end sealer, and an "ILLUSTRATION" label.
 */
import { captionPath, captionWidth } from './caption-glyphs';
import { figureMarks } from './figure-marks';
import { createRng, type Rng } from './prng';
import { bandPath, polyline, slabGeometry, type EdgeKind, type Point, type SlabGeometry } from './slab-geometry';

export type IllustrationInput = {
  seed: number; widthsIn: number[]; lengthIn: number; liveEdge: EdgeKind;
  speciesSlug: string; figures: string[]; thicknessIn: number;
};

type Palette = { heart: string; sap: string; grain: string; bark: string; fleck: string; sapwoodIn: number; ringOpacity: number };

const PALETTES: Record<string, Palette> = {
  'black-walnut': { heart: '#5e3d29', sap: '#d9c39c', grain: '#2e1b10', bark: '#3a2c22', fleck: '#7a5540', sapwoodIn: 1.1, ringOpacity: 0.45 },
  'black-cherry': { heart: '#a55a3a', sap: '#dfc39e', grain: '#6a321c', bark: '#3e302a', fleck: '#c47a56', sapwoodIn: 0.8, ringOpacity: 0.4 },
  'white-oak': { heart: '#c49a63', sap: '#e2cda4', grain: '#8a6236', bark: '#5b5048', fleck: '#ecd8ad', sapwoodIn: 0.9, ringOpacity: 0.55 },
  'northern-red-oak': { heart: '#c58e66', sap: '#e0c7a2', grain: '#8c5638', bark: '#4c423c', fleck: '#e7c09c', sapwoodIn: 0.9, ringOpacity: 0.6 },
  'sugar-maple': { heart: '#e6d3ab', sap: '#efe2c4', grain: '#b49a6c', bark: '#6a6058', fleck: '#f5ead2', sapwoodIn: 2.2, ringOpacity: 0.35 },
  'red-maple': { heart: '#d9bf97', sap: '#eadbbd', grain: '#a98a62', bark: '#5e5650', fleck: '#efe0c4', sapwoodIn: 2, ringOpacity: 0.35 },
  sweetgum: { heart: '#94705a', sap: '#e1cfad', grain: '#5c4030', bark: '#4a3f37', fleck: '#b08a70', sapwoodIn: 2, ringOpacity: 0.35 },
  'american-sycamore': { heart: '#d2b08f', sap: '#e8d6bc', grain: '#9d7a5c', bark: '#8d8676', fleck: '#8a5e42', sapwoodIn: 1.5, ringOpacity: 0.3 },
  'douglas-fir': { heart: '#cf9462', sap: '#e7c99a', grain: '#8e4f26', bark: '#4e3426', fleck: '#e0a878', sapwoodIn: 1.2, ringOpacity: 0.75 },
  'eastern-white-pine': { heart: '#e0c58e', sap: '#eedcae', grain: '#b48c52', bark: '#4f4136', fleck: '#f0dcaf', sapwoodIn: 1.5, ringOpacity: 0.5 },
};
const DEFAULT_PALETTE = PALETTES['white-oak'];

export const DISPLAY_WIDTH = 1200;
export const DISPLAY_HEIGHT = 600;

/** Growth rings on a flatsawn face: nested arches ("cathedrals") plus long lines near the edges. */
function ringLines(g: SlabGeometry, rng: Rng, straight: boolean): Point[][] {
  const lines: Point[][] = [];
  const count = 9 + rng.int(0, 6);
  const tip = rng.between(0.1, 0.45);
  const pointsRight = rng.chance(0.5);
  const span = rng.between(0.45, 0.8);
  for (let k = 0; k < count; k++) {
    const f0 = (k + 0.5) / count;
    const offset = Math.abs(f0 - 0.5);
    const wig = rng.between(0, 6.3);
    const pts: Point[] = [];
    for (let i = 0; i <= 60; i++) {
      const p = pointsRight ? 1 - i / 60 : i / 60;
      let f = f0;
      if (!straight) {
        const myTip = tip + offset * 0.5;
        const d = (pointsRight ? 1 - p : p) - myTip;
        if (d < 0 && offset < 0.32) continue;
        f = 0.5 + (f0 - 0.5) * Math.min(1, Math.sqrt(Math.max(d, 0) / span) + (offset >= 0.32 ? 1 : 0));
      }
      pts.push(g.at(p, f + 0.012 * Math.sin(p * 23 + wig)));
    }
    if (pts.length > 1) lines.push(pts);
  }
  return lines;
}

export function slabIllustrationSvg(input: IllustrationInput): string {
  const rng = createRng(input.seed);
  const pal = PALETTES[input.speciesSlug] ?? DEFAULT_PALETTE;
  const W = DISPLAY_WIDTH;
  const H = DISPLAY_HEIGHT;
  const maxWidthIn = Math.max(...input.widthsIn) + 1.5;
  const scale = Math.min((W - 120) / input.lengthIn, (H - 150) / maxWidthIn);
  const x0 = (W - input.lengthIn * scale) / 2;
  const cy = H / 2 - 10;
  const g = slabGeometry({
    rng, widthsIn: input.widthsIn, lengthIn: input.lengthIn, liveEdge: input.liveEdge,
    x0, cy, scale, barkIn: 0.3, sapwoodIn: pal.sapwoodIn,
  });
  const shadow = Math.min(14, 3 + input.thicknessIn * 2.5);
  const stickerHalf = (maxWidthIn * scale) / 2 + 30;
  const stickers = [0.08, 0.36, 0.64, 0.92].map((p) => {
    const x = x0 + p * g.lengthPx - 9;
    return `<rect x="${x.toFixed(1)}" y="${(cy - stickerHalf).toFixed(1)}" width="18" height="${(2 * stickerHalf).toFixed(1)}" rx="2" fill="#b59669" stroke="#8d7048" stroke-width="1.5"/>`;
  }).join('');
  const outer = bandPath(g.outer);
  const straight = input.figures.includes('ray-fleck');
  const rings = ringLines(g, rng, straight).map((pts) => `<path d="${polyline(pts)}"/>`).join('');
  const sealer = [0, 1].map((end) => {
    const p0 = end === 0 ? 0 : 1 - 1.5 / input.lengthIn;
    const p1 = end === 0 ? 1.5 / input.lengthIn : 1;
    const band = { top: [g.outer.top[0], g.outer.top[0]], bottom: [g.outer.bottom[0], g.outer.bottom[0]] };
    const i0 = Math.round(p0 * (g.ps.length - 1));
    const i1 = Math.max(i0 + 1, Math.round(p1 * (g.ps.length - 1)));
    band.top = g.outer.top.slice(i0, i1 + 1);
    band.bottom = g.outer.bottom.slice(i0, i1 + 1);
    return `<path d="${bandPath(band)}" fill="#7f9a86" fill-opacity="0.55"/>`;
  }).join('');
  const capUnit = 2.6;
  const capW = captionWidth() * capUnit;
  const marks = figureMarks(input.figures, g, rng, { grain: pal.grain, fleck: pal.fleck });
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}" viewBox="0 0 ${W} ${H}">
<defs>
<linearGradient id="ground" x1="0" y1="0" x2="0" y2="1"><stop offset="0" stop-color="#e7e2d6"/><stop offset="1" stop-color="#d3cbbb"/></linearGradient>
<linearGradient id="light" x1="0" y1="0" x2="0.3" y2="1"><stop offset="0" stop-color="#ffffff" stop-opacity="0.18"/><stop offset="1" stop-color="#000000" stop-opacity="0.12"/></linearGradient>
<clipPath id="face"><path d="${bandPath(g.wood)}"/></clipPath>
</defs>
<rect width="${W}" height="${H}" fill="url(#ground)"/>
${stickers}
<path d="${outer}" transform="translate(${(shadow * 0.6).toFixed(1)} ${shadow.toFixed(1)})" fill="#000" fill-opacity="0.22"/>
<path d="${outer}" fill="${pal.bark}"/>
<path d="${bandPath(g.wood)}" fill="${pal.sap}"/>
<g clip-path="url(#face)">
<path d="${bandPath(g.heart)}" fill="${pal.heart}" stroke="${pal.heart}" stroke-width="4" stroke-opacity="0.5"/>
<g fill="none" stroke="${pal.grain}" stroke-opacity="${pal.ringOpacity}" stroke-width="1.6">${rings}</g>
${marks}
<rect x="0" y="0" width="${W}" height="${H}" fill="url(#light)"/>
</g>
${sealer}
<rect x="${(W - capW - 34).toFixed(1)}" y="${H - 44}" width="${(capW + 22).toFixed(1)}" height="30" rx="6" fill="#ffffff" fill-opacity="0.85"/>
<path d="${captionPath(W - capW - 23, H - 37, capUnit)}" fill="none" stroke="#2b2620" stroke-width="2.2" stroke-linecap="round" stroke-linejoin="round"/>
</svg>`;
}
