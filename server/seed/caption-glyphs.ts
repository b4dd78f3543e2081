/**
 * The "ILLUSTRATION" caption drawn as stroked lines rather than text, so the
 * label renders the same on a server with no fonts installed.
 */
type Stroke = [number, number][];

function ellipse(cx: number, cy: number, rx: number, ry: number): Stroke {
  return Array.from({ length: 21 }, (_, i) => {
    const a = (i / 20) * 2 * Math.PI;
    return [cx + rx * Math.cos(a), cy + ry * Math.sin(a)];
  });
}

/** Glyphs on a 6-unit-tall grid: strokes and the advance to the next letter. */
const GLYPHS: Record<string, { strokes: Stroke[]; advance: number }> = {
  I: { strokes: [[[0, 0], [0, 6]]], advance: 1.8 },
  L: { strokes: [[[0, 0], [0, 6], [3.4, 6]]], advance: 4.4 },
  U: { strokes: [[[0, 0], [0, 4.5], [0.5, 5.6], [1.75, 6], [3, 5.6], [3.5, 4.5], [3.5, 0]]], advance: 4.8 },
  S: { strokes: [[[3.5, 0.9], [2.8, 0.1], [1.7, 0], [0.6, 0.3], [0.1, 1.2], [0.4, 2.3], [1.7, 2.8], [3, 3.3],
    [3.6, 4.4], [3.3, 5.5], [2.1, 6], [0.9, 5.9], [0, 5.1]]], advance: 4.8 },
  T: { strokes: [[[0, 0], [4, 0]], [[2, 0], [2, 6]]], advance: 5 },
  R: { strokes: [[[0, 6], [0, 0], [2.4, 0], [3.4, 0.5], [3.7, 1.6], [3.4, 2.6], [2.4, 3.1], [0, 3.1]], [[2.2, 3.1], [3.8, 6]]], advance: 5 },
  A: { strokes: [[[0, 6], [2, 0], [4, 6]], [[0.7, 4], [3.3, 4]]], advance: 5.2 },
  O: { strokes: [ellipse(2, 3, 2, 3)], advance: 5.3 },
  N: { strokes: [[[0, 6], [0, 0], [3.6, 6], [3.6, 0]]], advance: 4.9 },
};

export const CAPTION = 'ILLUSTRATION';

/** Width of the caption in grid units. */
export function captionWidth(text = CAPTION): number {
  return [...text].reduce((w, ch) => w + (GLYPHS[ch]?.advance ?? 3), 0);
}

/** SVG path data for the caption, top-left at (x, y), letters `unit` px per grid unit. */
export function captionPath(x: number, y: number, unit: number, text = CAPTION): string {
  let cursor = x;
  const parts: string[] = [];
  for (const ch of text) {
    const glyph = GLYPHS[ch];
    if (!glyph) {
      cursor += 3 * unit;
      continue;
    }
    for (const stroke of glyph.strokes) {
      parts.push(stroke.map(([gx, gy], i) => `${i ? 'L' : 'M'}${(cursor + gx * unit).toFixed(1)} ${(y + gy * unit).toFixed(1)}`).join(''));
    }
    cursor += glyph.advance * unit;
  }
  return parts.join('');
}
