import type { NumericArray } from '../units/convert';

/**
 * Linear interpolation of a curve sampled at ascending `xs`, at one x. Outside the samples, and where
 * either neighbour is NaN (a log gap), the answer is NaN: a value is never invented across missing data.
 * Own code: d3's scales would need a domain per gap, and this is the one loop the profile needs.
 * @example interpolateAt([0, 10], [0, 100], 2.5); // 25
 */
export function interpolateAt(xs: NumericArray, ys: NumericArray, x: number): number {
  const n = xs.length;
  if (n === 0 || !(x >= xs[0]) || !(x <= xs[n - 1])) return NaN;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (xs[mid] <= x) lo = mid;
    else hi = mid;
  }
  if (xs[lo] === x) return ys[lo];
  if (xs[hi] === x) return ys[hi];
  const w = (x - xs[lo]) / (xs[hi] - xs[lo]);
  return ys[lo] + w * (ys[hi] - ys[lo]);
}

/**
 * A curve resampled at many ascending x (for aligning logs on one depth grid); NaN outside or across gaps.
 * @example resample([0, 10], [0, 100], [5, 20]); // Float64Array [50, NaN]
 */
export function resample(xs: NumericArray, ys: NumericArray, at: NumericArray): Float64Array {
  const out = new Float64Array(at.length);
  for (let i = 0; i < at.length; i++) out[i] = interpolateAt(xs, ys, at[i]);
  return out;
}

/**
 * NaN runs between two valid samples filled linearly in x; NaN before the first and after the last valid
 * sample stay NaN. Used where a pressure is needed across a sand that the shale filter left out.
 * @example bridgeGaps([0, 1, 2, 3], [NaN, 10, NaN, 30]); // Float64Array [NaN, 10, 20, 30]
 */
export function bridgeGaps(xs: NumericArray, ys: NumericArray): Float64Array {
  const out = Float64Array.from(ys as ArrayLike<number>);
  let last = -1;
  for (let i = 0; i < out.length; i++) {
    if (Number.isNaN(out[i])) continue;
    if (last >= 0 && i - last > 1) {
      const x0 = xs[last];
      const span = xs[i] - x0;
      for (let k = last + 1; k < i; k++) {
        const w = span === 0 ? 0 : (xs[k] - x0) / span;
        out[k] = out[last] + w * (out[i] - out[last]);
      }
    }
    last = i;
  }
  return out;
}
