import { luFactor, luSolve } from './denseSolve';
import { createIdwEstimator, validatePower } from './idw';
import { driftBasis, type Drift } from './drift';
import { createKriger, fillGlobalSystem, SINGULAR } from './kriger';
import type { DataPoint, Variogram } from './types';
import { validateMaxNeighbours, validatePoints } from './validate';
import { validateVariogram } from './variogramModel';

export type LeaveOneOutMethod =
  | {
      kind: 'kriging';
      variogram: Variogram;
      maxNeighbours?: number;
      /** 'linear': universal kriging with a planar drift, re-estimated without the left-out datum in every fold. */
      drift?: Drift;
    }
  | { kind: 'idw'; power: number; maxNeighbours?: number };

export interface LeaveOneOutResidual {
  index: number;
  observed: number;
  predicted: number;
  /** Estimation error, predicted − observed (the sign convention of Isaaks & Srivastava 1989, ch. 15). */
  residual: number;
  /** Kriging standard deviation of the prediction (kriging only). */
  stdDev?: number;
}

export interface LeaveOneOutResult {
  rmse: number;
  /** Mean of the residuals (bias; > 0 means over-estimation). */
  meanError: number;
  residuals: LeaveOneOutResidual[];
}

/**
 * All leave-one-out kriging errors from one inverse of the full system (Dubrule 1983, Mathematical Geology
 * 15(6), 687–699): with K the kriging matrix and z̃ = [z; 0], observed − predicted = (K⁻¹z̃)ᵢ/(K⁻¹)ᵢᵢ and the
 * variance is 1/(K⁻¹)ᵢᵢ — O(n³) once instead of n separate solves. It holds with drift terms in K too, and then each
 * fold's drift is estimated without the datum it leaves out, as a separate solve per fold would.
 */
function dubrule(
  xs: Float64Array,
  ys: Float64Array,
  values: Float64Array,
  variogram: Variogram,
  drift: Drift,
): { predicted: Float64Array; variance: Float64Array } {
  const n = xs.length;
  const basis = driftBasis(xs, ys, drift);
  const s = n + basis.terms;
  const lu = fillGlobalSystem(xs, ys, variogram, basis);
  const pivots = new Int32Array(s);
  if (!luFactor(lu, s, pivots)) throw new Error(SINGULAR);
  const alpha = new Float64Array(s);
  alpha.set(values);
  luSolve(lu, s, pivots, alpha);
  const predicted = new Float64Array(n);
  const variance = new Float64Array(n);
  const column = new Float64Array(s);
  for (let i = 0; i < n; i++) {
    column.fill(0);
    column[i] = 1;
    luSolve(lu, s, pivots, column);
    const inverseDiagonal = column[i];
    predicted[i] = values[i] - alpha[i] / inverseDiagonal;
    variance[i] = 1 / inverseDiagonal;
  }
  return { predicted, variance };
}

/**
 * Leave-one-out cross-validation: each datum is estimated from all the others.
 *
 * @example
 * const points = [{ x: 0, y: 0, value: 1 }, { x: 1, y: 0, value: 2 }, { x: 2, y: 0, value: 4 }];
 * leaveOneOut(points, { kind: 'idw', power: 1 }).residuals[1].predicted; // (1 + 4)/2 = 2.5
 */
export function leaveOneOut(points: readonly DataPoint[], method: LeaveOneOutMethod): LeaveOneOutResult {
  const { xs, ys, values } = validatePoints(points, 2, 'Leave-one-out');
  const n = xs.length;
  const predicted = new Float64Array(n);
  let variance: Float64Array | undefined;
  if (method?.kind === 'kriging') {
    validateVariogram(method.variogram);
    validateMaxNeighbours(method.maxNeighbours);
    if (method.maxNeighbours === undefined || method.maxNeighbours >= n - 1) {
      const all = dubrule(xs, ys, values, method.variogram, method.drift ?? 'constant');
      predicted.set(all.predicted);
      variance = all.variance;
    } else {
      variance = new Float64Array(n);
      const kriger = createKriger(xs, ys, values, method.variogram, method.maxNeighbours, false, method.drift ?? 'constant');
      for (let i = 0; i < n; i++) {
        const r = kriger.estimate(xs[i], ys[i], i);
        predicted[i] = r.value;
        variance[i] = r.variance;
      }
    }
  } else if (method?.kind === 'idw') {
    validatePower(method.power);
    validateMaxNeighbours(method.maxNeighbours);
    const estimator = createIdwEstimator(xs, ys, values, method.power, method.maxNeighbours);
    for (let i = 0; i < n; i++) predicted[i] = estimator.estimate(xs[i], ys[i], i);
  } else {
    throw new Error(`Unknown leave-one-out method: ${String((method as { kind?: unknown } | undefined)?.kind)}`);
  }

  const residuals: LeaveOneOutResidual[] = new Array(n);
  let sum = 0;
  let sumSq = 0;
  for (let i = 0; i < n; i++) {
    const residual = predicted[i] - values[i];
    sum += residual;
    sumSq += residual * residual;
    residuals[i] = { index: i, observed: values[i], predicted: predicted[i], residual };
    if (variance) residuals[i].stdDev = Math.sqrt(Math.max(0, variance[i]));
  }
  return { rmse: Math.sqrt(sumSq / n), meanError: sum / n, residuals };
}
