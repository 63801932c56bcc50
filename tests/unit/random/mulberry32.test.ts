import { describe, expect, it } from 'vitest';
import { mulberry32 } from '@shared/random/mulberry32';

const TWO_32 = 2n ** 32n;

/**
 * The published C reference of mulberry32 (Ettinger, docs/sources.md [mulberry32]) redone in BigInt arithmetic
 * modulo 2³², independent of the Math.imul and >>> tricks of the implementation under test:
 *   z = (state += 0x6D2B79F5); z = (z ^ z >> 15) * (z | 1); z ^= z + (z ^ z >> 7) * (z | 61); return z ^ z >> 14.
 */
function referenceStream(seed: number, count: number): bigint[] {
  let state = BigInt(seed >>> 0);
  const out: bigint[] = [];
  for (let i = 0; i < count; i++) {
    state = (state + 0x6d2b79f5n) % TWO_32;
    let z = state;
    z = ((z ^ (z >> 15n)) * (z | 1n)) % TWO_32;
    z = z ^ ((z + (z ^ (z >> 7n)) * (z | 61n)) % TWO_32);
    out.push(z ^ (z >> 14n));
  }
  return out;
}

describe('mulberry32', () => {
  it('gives the reference outputs for seed 0', () => {
    // uint32 1144304738, 1416247, 958946056: the BigInt reference above, and the same three numbers from a separate
    // Python integer computation of the C reference; divided by 2³² they are the values below.
    expect(referenceStream(0, 3)).toEqual([1144304738n, 1416247n, 958946056n]);
    const next = mulberry32(0);
    expect(next()).toBe(0.26642920868471265);
    expect(next()).toBe(0.0003297457005828619);
    expect(next()).toBe(0.2232720274478197);
  });

  it('matches the BigInt reference over many seeds and draws, negative and oversized seeds taken modulo 2³²', () => {
    for (const seed of [1, 7, 2026, 123_456_789, 0xffffffff, -1, 2 ** 32 + 5]) {
      const next = mulberry32(seed);
      const expected = referenceStream(seed, 200).map((u) => Number(u) / 2 ** 32);
      expect(Array.from({ length: 200 }, next), `seed ${seed}`).toEqual(expected);
    }
  });

  it('stays in [0, 1)', () => {
    const next = mulberry32(42);
    for (let i = 0; i < 10_000; i++) {
      const u = next();
      expect(u >= 0 && u < 1).toBe(true);
    }
  });
});
