/**
 * A small seeded random source (mulberry32) so the demo yard comes out the
 * same on every run: same slabs, same widths, same readings.
 */
export type Rng = {
  /** Uniform in [0, 1). */
  next(): number;
  /** Uniform in [min, max). */
  between(min: number, max: number): number;
  /** Whole number in [min, max]. */
  int(min: number, max: number): number;
  pick<T>(items: readonly T[]): T;
  chance(p: number): boolean;
  /** Roughly normal (sum of uniforms), mean 0, given spread. */
  wobble(spread: number): number;
};

export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export function createRng(seed: number): Rng {
  const next = mulberry32(seed);
  return {
    next,
    between: (min, max) => min + next() * (max - min),
    int: (min, max) => min + Math.floor(next() * (max - min + 1)),
    pick: (items) => items[Math.floor(next() * items.length)],
    chance: (p) => next() < p,
    wobble: (spread) => ((next() + next() + next() - 1.5) / 1.5) * spread,
  };
}

/** A stable 32-bit seed from a string (FNV-1a), e.g. from a slab code. */
export function seedFrom(text: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return h >>> 0;
}

/** Round to the nearest 1/8 in, the tape-measure resolution the yard records. */
export const toEighths = (inches: number) => Math.round(inches * 8) / 8;
export const round1 = (n: number) => Math.round(n * 10) / 10;
