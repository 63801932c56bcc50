import { luFactor, luSolve } from './denseSolve';
import type { DataPoint } from './types';

/** A plane value = a + b·(x − x̄) + c·(y − ȳ), fitted to the data by least squares; x, y in metres. */
export interface PlanarTrend {
  a: number;
  /** Gradient east, value per metre. */
  b: number;
  /** Gradient north, value per metre. */
  c: number;
  x0: number;
  y0: number;
  evaluate(x: number, y: number): number;
}

/**
 * The least-squares plane through the data (the regional trend that regression kriging removes before fitting a
 * variogram to the residuals). Centred on the data's mean position so the 3×3 normal equations stay well scaled.
 * Needs at least three points not on one line.
 * @example fitPlanarTrend([{ x: 0, y: 0, value: 1 }, { x: 1000, y: 0, value: 2 }, { x: 0, y: 1000, value: 3 }]).evaluate(1000, 1000); // 4
 */
export function fitPlanarTrend(points: readonly DataPoint[]): PlanarTrend {
  const n = points.length;
  if (n < 3) throw new Error(`fitPlanarTrend: a plane needs at least 3 points, got ${n}`);
  let x0 = 0;
  let y0 = 0;
  for (const p of points) {
    if (![p.x, p.y, p.value].every(Number.isFinite)) throw new Error('fitPlanarTrend: every x, y and value must be a finite number');
    x0 += p.x / n;
    y0 += p.y / n;
  }
  // Normal equations in kilometres: terms of similar size keep the LU pivots honest.
  const m = new Float64Array(9);
  const r = new Float64Array(3);
  for (const p of points) {
    const row = [1, (p.x - x0) / 1000, (p.y - y0) / 1000];
    for (let i = 0; i < 3; i++) {
      r[i] += row[i] * p.value;
      for (let j = 0; j < 3; j++) m[i * 3 + j] += row[i] * row[j];
    }
  }
  const piv = new Int32Array(3);
  if (!luFactor(m, 3, piv)) throw new Error('fitPlanarTrend: the points lie on one line, so no plane is defined');
  luSolve(m, 3, piv, r);
  const [a, bKm, cKm] = r;
  const b = bKm / 1000;
  const c = cKm / 1000;
  return { a, b, c, x0, y0, evaluate: (x, y) => a + b * (x - x0) + c * (y - y0) };
}
