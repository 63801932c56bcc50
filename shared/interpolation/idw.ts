import { createNeighbourIndex } from './neighbours';
import type { DataPoint, Target } from './types';
import { validateMaxNeighbours, validatePoints, validateTargets } from './validate';

export interface IdwOptions {
  /** Distance exponent p in wᵢ = 1/dᵢᵖ; default 2. */
  power?: number;
  /** Use only the nearest data; default all. */
  maxNeighbours?: number;
}

/** Estimator for one location, reused by leave-one-out. */
export interface IdwEstimator {
  estimate(x: number, y: number, exclude: number): number;
}

/**
 * Checks the IDW distance exponent.
 * @example
 * validatePower(0); // throws "power must be a finite number > 0, got 0"
 */
export function validatePower(power: number): void {
  if (typeof power !== 'number' || !Number.isFinite(power) || power <= 0)
    throw new Error(`power must be a finite number > 0, got ${String(power)}`);
}

/**
 * Builds an inverse-distance estimator over validated arrays (`exclude` leaves one datum out).
 * @example
 * createIdwEstimator(new Float64Array([0, 10]), new Float64Array([0, 0]), new Float64Array([1, 3]), 2)
 *   .estimate(5, 0, -1); // 2
 */
export function createIdwEstimator(
  xs: Float64Array,
  ys: Float64Array,
  values: Float64Array,
  power: number,
  maxNeighbours?: number,
): IdwEstimator {
  const n = xs.length;
  const halfPower = power / 2;
  // weights from squared distances: 1/d^p = (d²)^(−p/2), with p = 2 needing no pow at all
  const weightOf = power === 2 ? (dd: number) => 1 / dd : (dd: number) => Math.pow(dd, -halfPower);
  if (maxNeighbours === undefined || maxNeighbours >= n) {
    return {
      estimate(x, y, exclude) {
        let sw = 0;
        let sz = 0;
        for (let i = 0; i < n; i++) {
          if (i === exclude) continue;
          const dx = xs[i] - x;
          const dy = ys[i] - y;
          const dd = dx * dx + dy * dy;
          if (dd === 0) return values[i];
          const w = weightOf(dd);
          sw += w;
          sz += w * values[i];
        }
        return sz / sw;
      },
    };
  }
  const index = createNeighbourIndex(xs, ys);
  const ids = new Int32Array(maxNeighbours);
  const d2 = new Float64Array(maxNeighbours);
  return {
    estimate(x, y, exclude) {
      const m = index.nearest(x, y, maxNeighbours, ids, d2, exclude);
      if (m > 0 && d2[0] === 0) return values[ids[0]];
      let sw = 0;
      let sz = 0;
      for (let i = 0; i < m; i++) {
        const w = weightOf(d2[i]);
        sw += w;
        sz += w * values[ids[i]];
      }
      return sz / sw;
    },
  };
}

/**
 * Inverse distance weighting (Shepard 1968, Proc. 23rd ACM National Conference, 517–524):
 * ẑ = Σ zᵢ/dᵢᵖ / Σ 1/dᵢᵖ, and exactly the datum at a data location.
 *
 * @example
 * idw([{ x: 0, y: 0, value: 1 }, { x: 10, y: 0, value: 3 }], [{ x: 5, y: 0 }, { x: 0, y: 0 }]); // [2, 1]
 */
export function idw(points: readonly DataPoint[], targets: readonly Target[], options: IdwOptions = {}): number[] {
  const power = options.power ?? 2;
  validatePower(power);
  validateMaxNeighbours(options.maxNeighbours);
  const { xs, ys, values } = validatePoints(points, 1, 'Inverse distance weighting');
  validateTargets(targets);
  const estimator = createIdwEstimator(xs, ys, values, power, options.maxNeighbours);
  const out = new Array<number>(targets.length);
  for (let t = 0; t < targets.length; t++) out[t] = estimator.estimate(targets[t].x, targets[t].y, -1);
  return out;
}
