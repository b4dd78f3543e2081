/** One- or two-sentence descriptions for the demo slabs, written the way the yard would describe them. */
import type { CutSlab } from './demo-slabs';

const LOOKS: Record<string, string> = {
  'black-walnut': 'Chocolate-brown heartwood with a band of cream sapwood',
  'black-cherry': 'Warm salmon heartwood that will darken to a deep red-brown in the light, with a pale sapwood rim',
  'white-oak': 'Light tan, tight-grained heartwood',
  'northern-red-oak': 'Pinkish-tan heartwood with bold open grain',
  'sugar-maple': 'Creamy, hard and close-grained wood',
  'red-maple': 'Pale, even-textured wood',
  sweetgum: 'Soft brown heartwood streaked with darker lines, ringed by wide pale sapwood',
  'american-sycamore': 'Pale, pinkish-tan wood with a fine, even texture',
  'douglas-fir': 'Orange-tan wood with crisp, dark latewood rings',
  'eastern-white-pine': 'Light, straw-coloured wood with small sound knots',
};

const EDGE_WORDS = {
  both: 'live edges on both sides',
  one: 'one live edge and one straight-ripped edge',
  none: 'both edges ripped straight',
} as const;

const USES: Record<string, string> = {
  wide: 'Wide enough for a dining or conference table top.',
  bench: 'A good size for a bench, a desk or a coffee table.',
  narrow: 'Suits a shelf, a mantel or a small side table.',
};

/** The slab's own looks and uses; book-matching is said by the slab page from the yard's marked set. */
export function describeSlab(slab: CutSlab, speciesSlug: string): string {
  const minWidth = Math.min(...slab.widthsIn);
  const use = minWidth >= 20 && slab.lengthIn >= 84 ? USES.wide : minWidth >= 13 ? USES.bench : USES.narrow;
  const first = `${LOOKS[speciesSlug] ?? 'Sound wood'}, ${EDGE_WORDS[slab.liveEdge]}.`;
  return `${first} ${use}`;
}
