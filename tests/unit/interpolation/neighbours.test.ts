import { describe, expect, it } from 'vitest';
import { createNeighbourIndex } from '@shared/interpolation/index';
import { mulberry32 } from '@shared/random/mulberry32';

describe('createNeighbourIndex (kNN on kdbush)', () => {
  it('finds the same k nearest as a brute-force sort, nearest first, with and without an excluded point', () => {
    const random = mulberry32(5);
    const n = 3000;
    const xs = Float64Array.from({ length: n }, () => random() * 1000);
    const ys = Float64Array.from({ length: n }, () => random() * 1000);
    const index = createNeighbourIndex(xs, ys);
    const ids = new Int32Array(16);
    const d2 = new Float64Array(16);
    for (let q = 0; q < 200; q++) {
      const qx = random() * 1200 - 100;
      const qy = random() * 1200 - 100;
      const exclude = q % 2 === 0 ? -1 : Math.floor(random() * n);
      const k = 1 + (q % 16);
      const count = index.nearest(qx, qy, k, ids, d2, exclude);
      const brute = Array.from({ length: n }, (_, i) => ({ i, d: (xs[i] - qx) ** 2 + (ys[i] - qy) ** 2 }))
        .filter((e) => e.i !== exclude)
        .sort((a, b) => a.d - b.d)
        .slice(0, k);
      expect(count).toBe(k);
      expect(Array.from(d2.subarray(0, k))).toEqual(brute.map((e) => e.d));
      expect(Array.from(ids.subarray(0, k))).toEqual(brute.map((e) => e.i));
    }
  });

  it('returns fewer than k when the set is small, and nothing for an empty set', () => {
    const index = createNeighbourIndex([0, 10, 20], [0, 0, 0]);
    const ids = new Int32Array(5);
    const d2 = new Float64Array(5);
    expect(index.nearest(12, 0, 5, ids, d2, 0)).toBe(2);
    expect(Array.from(ids.subarray(0, 2))).toEqual([1, 2]);
    expect(Array.from(d2.subarray(0, 2))).toEqual([4, 64]);
    expect(createNeighbourIndex([], []).nearest(0, 0, 3, ids, d2)).toBe(0);
    expect(() => createNeighbourIndex([1, 2], [1])).toThrow('xs and ys must have the same length (2 vs 1)');
  });
});
