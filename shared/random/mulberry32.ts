/**
 * Seeded uniform numbers for the demo data and the benchmarks. Own code because no seeded generator is among the
 * project's dependencies and Math.random cannot be seeded; mulberry32 (Tommy Ettinger's public-domain 32-bit
 * generator, docs/sources.md [mulberry32]) is tiny and gives the same stream on every JavaScript engine.
 * Not for cryptography.
 */

/** A stream of uniform numbers in [0, 1). */
export type Uniform = () => number;

/**
 * mulberry32: a 32-bit state advanced by 0x6D2B79F5, one multiply-xorshift round per draw, divided by 2³².
 * @example
 * const next = mulberry32(0);
 * next(); // 0.26642920868471265 (uint32 1144304738), the same on every run
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
