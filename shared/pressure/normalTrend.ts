import type { Numeric, NumericArray, ResultOf } from '../units/convert';
import { commonLength, param } from './inputs';

export type NormalTrendModel = 'exponential' | 'loglinear';

export interface NormalTrendOptions {
  model: NormalTrendModel;
  /** Top of the depth interval marked as normally pressured (inclusive), same datum as depthM. */
  fromM: number;
  /** Base of that interval (inclusive). */
  toM: number;
  /** Exponential model only: the matrix (zero-porosity) value Δt_m; fitted when omitted. */
  matrixValue?: number;
}

/** Δt_n(z) = matrix + (surface − matrix)·exp(−cPerM·z); `surface` is the value at depth 0 of depthM. */
export interface ExponentialTrendParams {
  matrix: number;
  surface: number;
  cPerM: number;
  /** False when the matrix value was given rather than fitted. */
  matrixFitted: boolean;
}

/** log10(R_n) = a + b·z. */
export interface LoglinearTrendParams {
  a: number;
  b: number;
}

interface TrendCommon {
  /** The trend at a depth or at each depth of a curve. */
  evaluate<Z extends Numeric>(depthM: Z): ResultOf<Z>;
  /** Coefficient of determination on the fitted points (in log10 space for loglinear). */
  r2: number;
  /** Number of points used. */
  n: number;
}
export interface ExponentialTrend extends TrendCommon {
  model: 'exponential';
  params: ExponentialTrendParams;
}
export interface LoglinearTrend extends TrendCommon {
  model: 'loglinear';
  params: LoglinearTrendParams;
}
export type NormalTrend = ExponentialTrend | LoglinearTrend;

const FN = 'fitNormalTrend';

function mapDepths<Z extends Numeric>(depthM: Z, f: (z: number) => number): ResultOf<Z> {
  if (typeof depthM === 'number') return f(depthM) as ResultOf<Z>;
  const zs = depthM as NumericArray;
  const out = new Float64Array(zs.length);
  for (let i = 0; i < zs.length; i++) out[i] = f(zs[i]);
  return out as ResultOf<Z>;
}

// Loops rather than Math.min(...xs): a long log would overflow the argument stack.
function minOf(xs: number[]): number {
  let m = Infinity;
  for (const x of xs) if (x < m) m = x;
  return m;
}
function maxOf(xs: number[]): number {
  let m = -Infinity;
  for (const x of xs) if (x > m) m = x;
  return m;
}

function rSquared(ys: number[], predicted: (i: number) => number): number {
  const mean = ys.reduce((s, y) => s + y, 0) / ys.length;
  let sse = 0;
  let sst = 0;
  for (let i = 0; i < ys.length; i++) {
    sse += (ys[i] - predicted(i)) ** 2;
    sst += (ys[i] - mean) ** 2;
  }
  if (sst === 0) return sse === 0 ? 1 : 0;
  return 1 - sse / sst;
}

function fitLoglinear(zs: number[], values: number[]): LoglinearTrend {
  const ys = values.map((v, i) => {
    if (!(v > 0)) throw new Error(`${FN}: loglinear values must be > 0 (got ${v} at ${zs[i]} m)`);
    return Math.log10(v);
  });
  const n = zs.length;
  const zMean = zs.reduce((s, z) => s + z, 0) / n;
  const yMean = ys.reduce((s, y) => s + y, 0) / n;
  let szz = 0;
  let szy = 0;
  for (let i = 0; i < n; i++) {
    szz += (zs[i] - zMean) ** 2;
    szy += (zs[i] - zMean) * (ys[i] - yMean);
  }
  const b = szy / szz;
  const a = yMean - b * zMean;
  return {
    model: 'loglinear',
    params: { a, b },
    evaluate: (depthM) => mapDepths(depthM, (z) => 10 ** (a + b * z)),
    r2: rSquared(ys, (i) => a + b * zs[i]),
    n,
  };
}

interface LinearPart {
  matrix: number;
  amplitude: number;
  sse: number;
}

/**
 * For a fixed decay c the model y = m + A·e is linear in (m, A), e = exp(−c·(z − zRef)), so the best
 * m and A come from 2×2 least squares. m is kept >= 0 (a negative matrix slowness is unphysical):
 * the objective is a convex quadratic, so when its free minimum has m < 0 the constrained one has m = 0.
 */
function linearPart(zs: number[], ys: number[], zRef: number, c: number, fixedMatrix: number | undefined): LinearPart {
  const n = zs.length;
  const es = zs.map((z) => Math.exp(-c * (z - zRef)));
  const fitAmplitude = (m: number) => {
    let sey = 0;
    let see = 0;
    for (let i = 0; i < n; i++) {
      sey += es[i] * (ys[i] - m);
      see += es[i] * es[i];
    }
    return sey / see;
  };
  let matrix: number;
  let amplitude: number;
  if (fixedMatrix !== undefined) {
    matrix = fixedMatrix;
    amplitude = fitAmplitude(matrix);
  } else {
    let se = 0;
    let see = 0;
    let sy = 0;
    let sey = 0;
    for (let i = 0; i < n; i++) {
      se += es[i];
      see += es[i] * es[i];
      sy += ys[i];
      sey += es[i] * ys[i];
    }
    const det = n * see - se * se;
    matrix = (see * sy - se * sey) / det;
    amplitude = (n * sey - se * sy) / det;
    if (!(det > 0) || !Number.isFinite(matrix) || matrix < 0) {
      matrix = 0;
      amplitude = fitAmplitude(0);
    }
  }
  let sse = 0;
  for (let i = 0; i < n; i++) sse += (ys[i] - matrix - amplitude * es[i]) ** 2;
  return { matrix, amplitude, sse };
}

/**
 * Exponential trend by variable projection: the decay c is searched in one dimension (a log-spaced
 * grid over c·span from 1e-3 to 50, then golden-section refinement around the best grid point) and
 * (matrix, amplitude) solved exactly for each c. This minimises the squared misfit in slowness itself,
 * unlike a fit of log(Δt − Δt_m), which breaks where noisy samples fall below Δt_m. Own code because
 * no nonlinear least-squares package is among the project's dependencies; one bounded 1-D search
 * cannot diverge the way an unguarded Gauss–Newton step can.
 */
function fitExponential(zs: number[], ys: number[], fixedMatrix: number | undefined): ExponentialTrend {
  const zRef = minOf(zs);
  const span = maxOf(zs) - zRef;
  const zMax = maxOf(zs);
  const logLo = Math.log(1e-3 / span);
  // Also keep c·zMax below 700 so the mudline value exp(c·zRef) stays a finite double.
  const logHi = Math.max(logLo + 1, Math.log(Math.min(50 / span, 700 / zMax)));
  const steps = 120;
  const objective = (logC: number) => linearPart(zs, ys, zRef, Math.exp(logC), fixedMatrix).sse;
  let best = 0;
  let bestSse = Infinity;
  for (let k = 0; k <= steps; k++) {
    const sse = objective(logLo + ((logHi - logLo) * k) / steps);
    if (sse < bestSse) {
      bestSse = sse;
      best = k;
    }
  }
  let lo = logLo + ((logHi - logLo) * Math.max(0, best - 1)) / steps;
  let hi = logLo + ((logHi - logLo) * Math.min(steps, best + 1)) / steps;
  const golden = (Math.sqrt(5) - 1) / 2;
  let x1 = hi - golden * (hi - lo);
  let x2 = lo + golden * (hi - lo);
  let f1 = objective(x1);
  let f2 = objective(x2);
  for (let iter = 0; iter < 60; iter++) {
    if (f1 < f2) {
      hi = x2;
      x2 = x1;
      f2 = f1;
      x1 = hi - golden * (hi - lo);
      f1 = objective(x1);
    } else {
      lo = x1;
      x1 = x2;
      f1 = f2;
      x2 = lo + golden * (hi - lo);
      f2 = objective(x2);
    }
  }
  const cPerM = Math.exp((lo + hi) / 2);
  const { matrix, amplitude } = linearPart(zs, ys, zRef, cPerM, fixedMatrix);
  const surface = matrix + amplitude * Math.exp(cPerM * zRef);
  const at = (z: number) => matrix + amplitude * Math.exp(-cPerM * (z - zRef));
  return {
    model: 'exponential',
    params: { matrix, surface, cPerM, matrixFitted: fixedMatrix === undefined },
    evaluate: (depthM) => mapDepths(depthM, at),
    r2: rSquared(ys, (i) => at(zs[i])),
    n: zs.length,
  };
}

/**
 * Fits a normal compaction trend to the samples between `fromM` and `toM` (NaN samples skipped).
 * - exponential: Δt_n(z) = Δt_m + (Δt_0 − Δt_m)·exp(−c·z), for sonic slowness; pass depth below the
 *   mudline so Δt_0 is the mudline slowness (docs/sources.md [nct]).
 * - loglinear: log10(R_n) = a + b·z, for resistivity (Hottmann & Johnson 1965, JPT 17, 717).
 * @example
 * const trend = fitNormalTrend(depthM, dtUsFt, { model: 'exponential', fromM: 500, toM: 2500 });
 * trend.evaluate(3000); // normal slowness at 3000 m
 */
export function fitNormalTrend(depthM: NumericArray, values: NumericArray, options: NormalTrendOptions): NormalTrend {
  const n = commonLength(FN, { depthM, values });
  if (n === -1) throw new Error(`${FN}: depthM and values must be arrays`);
  const { model } = options;
  if (model !== 'exponential' && model !== 'loglinear') {
    throw new Error(`${FN}: model must be "exponential" or "loglinear" (got "${String(model)}")`);
  }
  const fromM = param(FN, 'fromM', options.fromM, { min: 0 });
  const toM = param(FN, 'toM', options.toM);
  if (!(toM > fromM)) throw new Error(`${FN}: toM must be greater than fromM (got ${fromM} and ${toM})`);
  const matrixValue = options.matrixValue === undefined ? undefined : param(FN, 'matrixValue', options.matrixValue, { min: 0 });
  if (model === 'loglinear' && matrixValue !== undefined) {
    throw new Error(`${FN}: matrixValue applies to the exponential model only`);
  }

  const zs: number[] = [];
  const ys: number[] = [];
  let previous = -Infinity;
  for (let i = 0; i < n; i++) {
    const z = depthM[i];
    // Samples above the interval (even at negative depths, above the mudline) are simply outside it; order is not.
    if (z < previous) throw new Error(`${FN}: depthM must be sorted ascending (depthM[${i}] = ${z} after ${previous})`);
    if (!Number.isNaN(z)) previous = z;
    const y = values[i];
    if (Number.isNaN(z) || Number.isNaN(y)) continue;
    if (!Number.isFinite(z) || !Number.isFinite(y)) {
      throw new Error(`${FN}: depthM and values must be finite or NaN (index ${i}: ${z}, ${y})`);
    }
    if (z < fromM || z > toM) continue;
    zs.push(z);
    ys.push(y);
  }
  if (zs.length < 3) {
    throw new Error(`${FN}: fewer than 3 valid points between ${fromM} m and ${toM} m (found ${zs.length})`);
  }
  if (minOf(zs) === maxOf(zs)) throw new Error(`${FN}: all points in range are at the same depth`);
  return model === 'loglinear' ? fitLoglinear(zs, ys) : fitExponential(zs, ys, matrixValue);
}
