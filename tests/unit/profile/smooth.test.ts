import { median } from 'd3';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { runningMedian } from '@shared/profile';

/** The reference: d3-array's median of the non-NaN values within ±window/2 of each sample, one sort per sample. */
function byD3(depthM: number[], values: number[], windowM: number): number[] {
  return values.map((v, i) => {
    if (Number.isNaN(v)) return NaN;
    const inWindow = values.filter((_, k) => Math.abs(depthM[k] - depthM[i]) <= windowM / 2 && !Number.isNaN(values[k]));
    return median(inWindow)!;
  });
}

describe('runningMedian', () => {
  it('takes a spike out and keeps a step (hand-computed)', () => {
    // Window 2 m: each sample sees its neighbours one metre either side.
    expect(Array.from(runningMedian([0, 1, 2, 3, 4], [10, 90, 12, 11, 13], 2))).toEqual([50, 12, 12, 12, 12]);
    const step = runningMedian([0, 1, 2, 3, 4, 5], [1, 1, 1, 5, 5, 5], 2);
    expect(Array.from(step)).toEqual([1, 1, 1, 5, 5, 5]);
  });

  it('leaves gaps as gaps and does not count them', () => {
    const out = runningMedian([0, 1, 2, 3], [10, NaN, 30, 20], 4);
    expect(Number.isNaN(out[1])).toBe(true);
    expect(out[0]).toBe(20); // median of 10, 30, 20
  });

  it('returns a copy for a window of 0 and refuses bad input', () => {
    expect(Array.from(runningMedian([0, 1], [3, 4], 0))).toEqual([3, 4]);
    expect(() => runningMedian([0, 1], [1], 10)).toThrow('runningMedian: depthM has length 2 but values has length 1');
    expect(() => runningMedian([1, 0], [1, 2], 10)).toThrow('runningMedian: depthM must be sorted ascending (depthM[1] = 0 after 1)');
    expect(() => runningMedian([0], [1], -5)).toThrow('runningMedian: windowM must be a finite number >= 0 (got -5)');
  });

  it("agrees with d3-array's median on random logs with gaps", () => {
    const sample = fc.record({
      steps: fc.array(fc.double({ min: 0.1, max: 3, noNaN: true }), { minLength: 1, maxLength: 80 }),
      window: fc.double({ min: 0.5, max: 30, noNaN: true }),
      seed: fc.array(fc.oneof(fc.double({ min: -500, max: 500, noNaN: true }), fc.constant(NaN)), { minLength: 80, maxLength: 80 }),
    });
    fc.assert(
      fc.property(sample, ({ steps, window, seed }) => {
        const depthM = steps.reduce<number[]>((acc, s) => [...acc, (acc.at(-1) ?? 100) + s], []);
        const values = depthM.map((_, i) => seed[i]);
        const ours = runningMedian(depthM, values, window);
        const ref = byD3(depthM, values, window);
        ref.forEach((r, i) => (Number.isNaN(r) ? expect(Number.isNaN(ours[i])).toBe(true) : expect(ours[i]).toBeCloseTo(r, 9)));
      }),
      { numRuns: 200 },
    );
  });
});
