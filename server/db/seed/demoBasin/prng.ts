/**
 * Seeded randomness for the demo basin, on the shared mulberry32 stream, which keeps the output byte-identical
 * on every run and engine.
 */
import { mulberry32, type Uniform } from '../../../../shared/random/mulberry32';

export type { Uniform };

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
