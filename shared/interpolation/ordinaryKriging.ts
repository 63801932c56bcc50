import { createKriger } from './kriger';
import type { DataPoint, Target, Variogram } from './types';
import { validateMaxNeighbours, validatePoints, validateTargets } from './validate';
import { validateVariogram } from './variogramModel';

export interface KrigingOptions {
  /** Use only the nearest data (kd-tree search); default: all points, one factorisation for all targets. */
  maxNeighbours?: number;
  /** Also return the weights (by data index) and the Lagrange multiplier. */
  returnWeights?: boolean;
}

export interface KrigingEstimate {
  value: number;
  /** Ordinary-kriging (estimation) variance, same units as value². */
  variance: number;
  weights?: { index: number; weight: number }[];
  /** μ in [C 1; 1ᵀ 0]·[w; μ] = [c0; 1], so variance = C(0) − Σ wᵢc0ᵢ − μ. */
  lagrangeMultiplier?: number;
}

/**
 * Ordinary kriging at each target (Isaaks & Srivastava 1989, An Introduction to Applied Geostatistics, ch. 12):
 * weights summing to one from the covariance form of the system with a Lagrange multiplier.
 *
 * @example
 * const points = [{ x: 0, y: 0, value: 1 }, { x: 10, y: 0, value: 3 }];
 * ordinaryKriging(points, { model: 'exponential', nugget: 0, sill: 1, range: 30 }, [{ x: 5, y: 0 }]);
 * // [{ value: 2, variance: … }] — midway, equal weights
 */
export function ordinaryKriging(
  points: readonly DataPoint[],
  variogram: Variogram,
  targets: readonly Target[],
  options: KrigingOptions = {},
): KrigingEstimate[] {
  const { xs, ys, values } = validatePoints(points, 2, 'Ordinary kriging');
  validateVariogram(variogram);
  validateTargets(targets);
  validateMaxNeighbours(options.maxNeighbours);
  const kriger = createKriger(xs, ys, values, variogram, options.maxNeighbours, options.returnWeights === true);
  const results: KrigingEstimate[] = new Array(targets.length);
  for (let t = 0; t < targets.length; t++) {
    const r = kriger.estimate(targets[t].x, targets[t].y, -1);
    if (options.returnWeights) {
      const weights = new Array<{ index: number; weight: number }>(r.count);
      for (let i = 0; i < r.count; i++) weights[i] = { index: r.ids[i], weight: r.weights[i] };
      results[t] = { value: r.value, variance: r.variance, weights, lagrangeMultiplier: r.lagrangeMultiplier };
    } else {
      results[t] = { value: r.value, variance: r.variance };
    }
  }
  return results;
}

/**
 * Universal kriging with a planar drift a + b·x + c·y (Matheron 1969; Isaaks & Srivastava 1989, ch. 12 — chapter
 * from memory): the weights filter the plane out, so a regional dip needs no separate fit, and the variance is the
 * universal-kriging variance, which includes the error of estimating the plane from the same wells. The variogram is
 * that of the residuals from the trend (fit it to the residuals of a least-squares plane).
 *
 * @example
 * const points = [{ x: 0, y: 0, value: 0 }, { x: 10, y: 0, value: 10 }, { x: 0, y: 10, value: 20 }, { x: 10, y: 10, value: 30 }];
 * universalKriging(points, { model: 'exponential', nugget: 0, sill: 1, range: 30 }, [{ x: 20, y: 0 }])[0].value; // 20: a plane is kept exactly
 */
export function universalKriging(
  points: readonly DataPoint[],
  variogram: Variogram,
  targets: readonly Target[],
  options: Pick<KrigingOptions, 'maxNeighbours'> = {},
): KrigingEstimate[] {
  const { xs, ys, values } = validatePoints(points, 4, 'Universal kriging with a planar drift');
  validateVariogram(variogram);
  validateTargets(targets);
  validateMaxNeighbours(options.maxNeighbours);
  if (options.maxNeighbours !== undefined && options.maxNeighbours < 4)
    throw new Error(`maxNeighbours must be at least 4 with a planar drift, got ${options.maxNeighbours}`);
  const kriger = createKriger(xs, ys, values, variogram, options.maxNeighbours, false, 'linear');
  return targets.map((t) => {
    const r = kriger.estimate(t.x, t.y, -1);
    return { value: r.value, variance: r.variance };
  });
}
