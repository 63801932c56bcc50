import { luFactor, luSolve } from './denseSolve';
import { driftBasis, type Drift, type DriftBasis } from './drift';
import { createNeighbourIndex } from './neighbours';
import type { Variogram } from './types';
import { covarianceFunction } from './variogramModel';

/** Result slots written by a kriger for one target (reused between calls). */
export interface KrigerOutput {
  value: number;
  variance: number;
  /** The multiplier of the constant drift term (the only one in ordinary kriging). */
  lagrangeMultiplier: number;
  /** Number of data used; their ids are ids[0..count) and, when asked for, weights weights[0..count). */
  count: number;
  ids: Int32Array;
  weights: Float64Array;
}

export interface Kriger {
  /** Estimates at (x, y), leaving out data point `exclude` (−1 for none; neighbour mode only). */
  estimate(x: number, y: number, exclude: number): KrigerOutput;
}

/** Math.hypot guards against overflow we cannot meet with map coordinates, and is several times slower. */
function distance(x1: number, y1: number, x2: number, y2: number): number {
  const dx = x1 - x2;
  const dy = y1 - y2;
  return Math.sqrt(dx * dx + dy * dy);
}

/** n² doubles: 2,048 points take 32 MB. */
const PAIR_CACHE_MAX_POINTS = 2048;

export const SINGULAR =
  'Kriging system is singular: check that the data points are distinct and the variogram is valid (a gaussian model usually needs a small nugget; a planar drift needs wells that are not on one line)';

/** Round-off leaves about −1e-15·C(0) at a datum; a clearly negative value is reported as is. */
function clampVariance(variance: number, c00: number): number {
  return variance < 0 && variance > -1e-9 * c00 ? 0 : variance;
}

/**
 * Kriging in covariance form (Isaaks & Srivastava 1989, ch. 12): [C F; Fᵀ 0]·[w; μ] = [c0; f0] with F the drift
 * functions at the data (a column of ones for ordinary kriging; 1, x, y for a planar drift), estimate Σ wᵢzᵢ,
 * variance C(0) − Σ wᵢc0ᵢ − Σ μₖf0ₖ — with a drift this is the universal-kriging variance, which includes the
 * error of estimating the drift. All points when `maxNeighbours` is absent or ≥ n.
 * The returned output object is reused by the next call: copy what you keep.
 * @example
 * const k = createKriger(xs, ys, values, { model: 'exponential', nugget: 0, sill: 1, range: 30 }, 16, false);
 * k.estimate(120, 340, -1).value;
 */
export function createKriger(
  xs: Float64Array,
  ys: Float64Array,
  values: Float64Array,
  variogram: Variogram,
  maxNeighbours: number | undefined,
  wantWeights: boolean,
  drift: Drift = 'constant',
): Kriger {
  const basis = driftBasis(xs, ys, drift);
  if (maxNeighbours === undefined || maxNeighbours >= xs.length) return createGlobalKriger(xs, ys, values, variogram, wantWeights, basis);
  return createNeighbourKriger(xs, ys, values, variogram, maxNeighbours, basis);
}

/**
 * The full (n + p)² system for all data: covariances, then the p drift columns and rows, zero in the corner.
 * Shared with the leave-one-out shortcut, which inverts the same matrix.
 */
export function fillGlobalSystem(xs: Float64Array, ys: Float64Array, variogram: Variogram, basis: DriftBasis): Float64Array {
  const n = xs.length;
  const p = basis.terms;
  const s = n + p;
  const cov = covarianceFunction(variogram);
  const c00 = variogram.nugget + variogram.sill;
  const lu = new Float64Array(s * s);
  const f = new Float64Array(p);
  for (let i = 0; i < n; i++) {
    lu[i * s + i] = c00;
    for (let j = 0; j < i; j++) {
      const c = cov(distance(xs[i], ys[i], xs[j], ys[j]));
      lu[i * s + j] = c;
      lu[j * s + i] = c;
    }
    basis.write(xs[i], ys[i], f, 0);
    for (let q = 0; q < p; q++) {
      lu[i * s + n + q] = f[q];
      lu[(n + q) * s + i] = f[q];
    }
  }
  return lu;
}

/**
 * All points: the (n+1)² system is inverted once; then the estimate is the dual form αᵀ[c0; 1] with α = K⁻¹[z; 0]
 * (O(n) per target) and the variance C(0) − rᵀK⁻¹r, a symmetric quadratic form (O(n²/2) per target).
 */
function createGlobalKriger(
  xs: Float64Array,
  ys: Float64Array,
  values: Float64Array,
  variogram: Variogram,
  wantWeights: boolean,
  basis: DriftBasis,
): Kriger {
  const n = xs.length;
  const p = basis.terms;
  const s = n + p;
  const cov = covarianceFunction(variogram);
  const c00 = variogram.nugget + variogram.sill;
  const lu = fillGlobalSystem(xs, ys, variogram, basis);
  const pivots = new Int32Array(s);
  if (!luFactor(lu, s, pivots)) throw new Error(SINGULAR);
  const inverse = new Float64Array(s * s);
  const column = new Float64Array(s);
  for (let j = 0; j < s; j++) {
    column.fill(0);
    column[j] = 1;
    luSolve(lu, s, pivots, column);
    for (let i = 0; i < s; i++) inverse[i * s + j] = column[i];
  }
  const alpha = new Float64Array(s);
  alpha.set(values);
  luSolve(lu, s, pivots, alpha);

  const r = new Float64Array(s);
  const out: KrigerOutput = {
    value: 0,
    variance: 0,
    lagrangeMultiplier: 0,
    count: n,
    ids: new Int32Array(n),
    weights: new Float64Array(n),
  };
  for (let i = 0; i < n; i++) out.ids[i] = i;
  return {
    estimate(x, y, exclude) {
      if (exclude >= 0) throw new Error('internal: leaving a point out needs neighbour mode');
      let value = 0;
      basis.write(x, y, r, n);
      for (let i = 0; i < n; i++) r[i] = cov(distance(x, y, xs[i], ys[i]));
      for (let i = 0; i < s; i++) value += alpha[i] * r[i];
      // rᵀK⁻¹r from the upper triangle: diagonal once, off-diagonal twice
      let quad = 0;
      for (let i = 0; i < s; i++) {
        const row = i * s;
        let t = 0.5 * inverse[row + i] * r[i];
        for (let j = i + 1; j < s; j++) t += inverse[row + j] * r[j];
        quad += r[i] * t;
      }
      out.value = value;
      out.variance = clampVariance(c00 - 2 * quad, c00);
      if (wantWeights) {
        for (let i = 0; i <= n; i++) {
          const row = i * s;
          let t = 0;
          for (let j = 0; j < s; j++) t += inverse[row + j] * r[j];
          if (i < n) out.weights[i] = t;
          else out.lagrangeMultiplier = t;
        }
      }
      return out;
    },
  };
}

/**
 * Nearest `k` data per target. Buffers are allocated once; consecutive targets with the same neighbour set reuse
 * the factorisation (neighbouring grid cells often do), and data-to-data covariances are cached.
 */
function createNeighbourKriger(
  xs: Float64Array,
  ys: Float64Array,
  values: Float64Array,
  variogram: Variogram,
  k: number,
  basis: DriftBasis,
): Kriger {
  const n = xs.length;
  const p = basis.terms;
  const cov = covarianceFunction(variogram);
  const c00 = variogram.nugget + variogram.sill;
  const size = k + p;
  const f = new Float64Array(p);
  const lu = new Float64Array(size * size);
  const pivots = new Int32Array(size);
  const rhs = new Float64Array(size);
  const c0 = new Float64Array(size);
  const d2 = new Float64Array(k);
  const out: KrigerOutput = {
    value: 0,
    variance: 0,
    lagrangeMultiplier: 0,
    count: 0,
    ids: new Int32Array(k),
    weights: new Float64Array(k),
  };
  const ids = out.ids;
  const pairCache = n <= PAIR_CACHE_MAX_POINTS ? new Float64Array(n * n).fill(NaN) : undefined;

  function pairCovariance(a: number, b: number): number {
    if (pairCache === undefined) return cov(distance(xs[a], ys[a], xs[b], ys[b]));
    let c = pairCache[a * n + b];
    if (c !== c) {
      c = cov(distance(xs[a], ys[a], xs[b], ys[b]));
      pairCache[a * n + b] = c;
      pairCache[b * n + a] = c;
    }
    return c;
  }

  function factor(m: number): void {
    const s = m + p;
    for (let i = 0; i < m; i++) {
      const a = ids[i];
      lu[i * s + i] = c00;
      for (let j = 0; j < i; j++) {
        const c = pairCovariance(a, ids[j]);
        lu[i * s + j] = c;
        lu[j * s + i] = c;
      }
      basis.write(xs[a], ys[a], f, 0);
      for (let q = 0; q < p; q++) {
        lu[i * s + m + q] = f[q];
        lu[(m + q) * s + i] = f[q];
      }
    }
    for (let q = 0; q < p; q++) for (let r = 0; r < p; r++) lu[(m + q) * s + m + r] = 0;
    if (!luFactor(lu, s, pivots)) throw new Error(SINGULAR);
  }

  const index = createNeighbourIndex(xs, ys);
  const previous = new Int32Array(k);
  let previousCount = -1;
  return {
    estimate(x, y, exclude) {
      const m = index.nearest(x, y, k, ids, d2, exclude);
      // order by id so that an unchanged neighbour set gives an identical matrix
      for (let i = 1; i < m; i++) {
        const id = ids[i];
        const dd = d2[i];
        let j = i - 1;
        while (j >= 0 && ids[j] > id) {
          ids[j + 1] = ids[j];
          d2[j + 1] = d2[j];
          j--;
        }
        ids[j + 1] = id;
        d2[j + 1] = dd;
      }
      let same = m === previousCount;
      for (let i = 0; same && i < m; i++) same = ids[i] === previous[i];
      if (!same) {
        factor(m);
        previous.set(ids.subarray(0, m));
        previousCount = m;
      }
      for (let i = 0; i < m; i++) {
        c0[i] = cov(Math.sqrt(d2[i]));
        rhs[i] = c0[i];
      }
      basis.write(x, y, rhs, m);
      basis.write(x, y, f, 0);
      luSolve(lu, m + p, pivots, rhs);
      let value = 0;
      let wc = 0;
      for (let i = 0; i < m; i++) {
        out.weights[i] = rhs[i];
        value += rhs[i] * values[ids[i]];
        wc += rhs[i] * c0[i];
      }
      for (let q = 0; q < p; q++) wc += rhs[m + q] * f[q];
      out.value = value;
      out.lagrangeMultiplier = rhs[m];
      out.variance = clampVariance(c00 - wc, c00);
      out.count = m;
      return out;
    },
  };
}
