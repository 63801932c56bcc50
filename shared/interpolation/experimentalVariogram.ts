import type { DataPoint, VariogramLag } from './types';
import { validatePoints } from './validate';

export interface ExperimentalVariogramOptions {
  /** Number of lag bins. */
  lags: number;
  /** Bin width, m. Bin k holds pairs with separation in [k·lagWidth, (k+1)·lagWidth). */
  lagWidth: number;
}

/**
 * Omnidirectional experimental semivariogram γ(h) = 1/(2N(h))·Σ (zᵢ − zⱼ)² over all pairs i < j
 * (Matheron 1962, Traité de géostatistique appliquée; Isaaks & Srivastava 1989, ch. 7).
 * Bins are [k·w, (k+1)·w); each reports the mean separation of its pairs (as GSLIB's gamv does), and bins
 * without pairs are left out.
 *
 * @example
 * experimentalVariogram([{ x: 0, y: 0, value: 1 }, { x: 1, y: 0, value: 3 }, { x: 2, y: 0, value: 2 }],
 *   { lags: 2, lagWidth: 1 });
 * // [{ lagM: 1, gamma: 1.25, pairs: 2 }] — bin [1, 2) holds the two 1 m pairs: (2² + 1²)/(2·2); the 2 m pair is past the last bin
 */
export function experimentalVariogram(points: readonly DataPoint[], options: ExperimentalVariogramOptions): VariogramLag[] {
  const { lags, lagWidth } = options ?? ({} as ExperimentalVariogramOptions);
  if (!Number.isInteger(lags) || lags < 1) throw new Error(`lags must be an integer ≥ 1, got ${String(lags)}`);
  if (typeof lagWidth !== 'number' || !Number.isFinite(lagWidth) || lagWidth <= 0)
    throw new Error(`lagWidth must be a finite number > 0, got ${String(lagWidth)}`);
  const { xs, ys, values } = validatePoints(points, 2, 'An experimental variogram');
  const n = xs.length;
  const sumH = new Float64Array(lags);
  const sumSq = new Float64Array(lags);
  const count = new Float64Array(lags);
  const maxH = lags * lagWidth;
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const h = Math.hypot(xs[i] - xs[j], ys[i] - ys[j]);
      if (h >= maxH) continue;
      // h/w can round up to `lags` just below maxH
      const k = Math.min(Math.floor(h / lagWidth), lags - 1);
      const dz = values[i] - values[j];
      sumH[k] += h;
      sumSq[k] += dz * dz;
      count[k]++;
    }
  }
  const out: VariogramLag[] = [];
  for (let k = 0; k < lags; k++) {
    if (count[k] === 0) continue;
    out.push({ lagM: sumH[k] / count[k], gamma: sumSq[k] / (2 * count[k]), pairs: count[k] });
  }
  return out;
}
