/**
 * The mean model of a kriging system: 'constant' is ordinary kriging (one unknown mean), 'linear' is universal
 * kriging with a planar drift a + b·x + c·y whose coefficients the system estimates with the weights
 * (Matheron 1969; Isaaks & Srivastava 1989, ch. 12 — chapter from memory).
 */
export type Drift = 'constant' | 'linear';

export interface DriftBasis {
  /** Number of drift functions: 1 (constant) or 3 (1, x, y). */
  terms: number;
  /** Writes f(x, y) into out[offset..offset + terms). */
  write(x: number, y: number, out: Float64Array, offset: number): void;
}

/**
 * The drift functions for a data set, in coordinates centred on the data and scaled by their spread, so the drift
 * rows of the system are of order one beside the covariances (a conditioning choice; the estimates do not depend on it).
 * @example
 * const basis = driftBasis(new Float64Array([0, 2]), new Float64Array([0, 0]), 'linear');
 * const f = new Float64Array(3); basis.write(2, 0, f, 0); // f = [1, 1, 0]: x centred on 1 and scaled by 1
 */
export function driftBasis(xs: Float64Array, ys: Float64Array, drift: Drift): DriftBasis {
  if (drift === 'constant')
    return {
      terms: 1,
      write(_x, _y, out, offset) {
        out[offset] = 1;
      },
    };
  if (drift !== 'linear') throw new Error(`Unknown drift: ${String(drift)}`);
  const n = xs.length;
  let x0 = 0;
  let y0 = 0;
  for (let i = 0; i < n; i++) {
    x0 += xs[i] / n;
    y0 += ys[i] / n;
  }
  let spread = 0;
  for (let i = 0; i < n; i++) spread += ((xs[i] - x0) ** 2 + (ys[i] - y0) ** 2) / n;
  const inv = 1 / (Math.sqrt(spread) || 1);
  return {
    terms: 3,
    write(x, y, out, offset) {
      out[offset] = 1;
      out[offset + 1] = (x - x0) * inv;
      out[offset + 2] = (y - y0) * inv;
    },
  };
}
