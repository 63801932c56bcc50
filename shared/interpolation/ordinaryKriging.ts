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
