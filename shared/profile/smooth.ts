import type { NumericArray } from '../units/convert';

/** Index of the first element of the ascending `sorted` (first `count` entries) not less than `v`. */
function lowerBound(sorted: Float64Array, count: number, v: number): number {
  let lo = 0;
  let hi = count;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (sorted[mid] < v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/**
 * Running median of a log over a depth window centred on each sample: the usual way to take the spikes and the
 * thin-bed scatter out of a sonic or resistivity log before Eaton, so that the pore-pressure curve follows the
 * shale trend rather than every reading. NaN samples (gaps, sands left out by the shale filter) neither count in
 * a window nor get a value. A window of 0 returns a copy.
 * Own code: a sorted sliding window is O(n·k) where a sort per sample would be O(n·k·log k) on 100,000-sample logs.
 * @example runningMedian([0, 1, 2, 3, 4], [10, 90, 12, 11, 13], 2); // Float64Array [50, 12, 12, 12, 12]
 */
export function runningMedian(depthM: NumericArray, values: NumericArray, windowM: number): Float64Array {
  const fn = 'runningMedian';
  if (depthM.length !== values.length) throw new Error(`${fn}: depthM has length ${depthM.length} but values has length ${values.length}`);
  if (!(windowM >= 0) || !Number.isFinite(windowM)) throw new Error(`${fn}: windowM must be a finite number >= 0 (got ${windowM})`);
  for (let i = 1; i < depthM.length; i++) {
    if (!(depthM[i] >= depthM[i - 1]))
      throw new Error(`${fn}: depthM must be sorted ascending (depthM[${i}] = ${depthM[i]} after ${depthM[i - 1]})`);
  }
  const n = values.length;
  const out = Float64Array.from(values as ArrayLike<number>);
  if (windowM === 0 || n === 0) return out;
  const half = windowM / 2;
  const sorted = new Float64Array(n);
  let count = 0;
  let head = 0; // next sample to enter the window
  let tail = 0; // oldest sample still in it
  for (let i = 0; i < n; i++) {
    const z = depthM[i];
    while (head < n && depthM[head] <= z + half) {
      const v = values[head++];
      if (Number.isNaN(v)) continue;
      const at = lowerBound(sorted, count, v);
      sorted.copyWithin(at + 1, at, count);
      sorted[at] = v;
      count++;
    }
    while (depthM[tail] < z - half) {
      const v = values[tail++];
      if (Number.isNaN(v)) continue;
      const at = lowerBound(sorted, count, v);
      sorted.copyWithin(at, at + 1, count);
      count--;
    }
    if (Number.isNaN(values[i])) continue;
    const mid = count >> 1;
    out[i] = count % 2 === 1 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
  }
  return out;
}
