/**
 * Seeded randomness for the demo basin. Own code because no seeded generator is among the project's
 * dependencies and Math.random cannot be seeded: mulberry32 (a public-domain 32-bit generator) is
 * tiny, fast and gives the same stream on every JavaScript engine, which keeps the output byte-identical.
 */

/** A stream of uniform numbers in [0, 1). */
export type Uniform = () => number;

/**
 * mulberry32: a 32-bit state, one multiply-xorshift round per draw.
 * @example
 * const next = mulberry32(2026);
 * next(); // a number in [0, 1), the same on every run
 */
export function mulberry32(seed: number): Uniform {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * A 32-bit seed from a base seed and labels (FNV-1a over the text), so each well and each purpose
 * draws from its own stream and adding draws in one place never shifts the numbers elsewhere.
 * @example
 * subSeed(2026, 'well', 7, 'logs'); // a fixed 32-bit integer
 */
export function subSeed(seed: number, ...labels: (string | number)[]): number {
  let h = 0x811c9dc5;
  for (const ch of [String(seed), ...labels.map(String)].join('|')) {
    h ^= ch.charCodeAt(0);
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return h >>> 0;
}

/** Convenience draws on one stream. */
export interface Rng {
  uniform(lo?: number, hi?: number): number;
  /** An integer in [lo, hi], both ends included. */
  int(lo: number, hi: number): number;
  /** A normal deviate (Box–Muller). */
  normal(mean?: number, sd?: number): number;
  pick<T>(items: readonly T[]): T;
  chance(p: number): boolean;
}

/**
 * Draw helpers over a seeded stream.
 * @example
 * const rng = makeRng(subSeed(2026, 'layout'));
 * rng.int(1, 6); // 1 … 6
 */
export function makeRng(seed: number): Rng {
  const next = mulberry32(seed);
  return {
    uniform: (lo = 0, hi = 1) => lo + (hi - lo) * next(),
    int: (lo, hi) => lo + Math.floor(next() * (hi - lo + 1)),
    normal: (mean = 0, sd = 1) => {
      const u = 1 - next(); // (0, 1]: log(0) never happens
      const v = next();
      return mean + sd * Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
    },
    pick: (items) => items[Math.floor(next() * items.length)],
    chance: (p) => next() < p,
  };
}
