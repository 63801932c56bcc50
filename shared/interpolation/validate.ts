import type { DataPoint, Target } from './types';

function isFiniteNumber(v: unknown): v is number {
  return typeof v === 'number' && Number.isFinite(v);
}

/**
 * Checks data points (finite x, y, value; no two at the same location) and returns their coordinates and values
 * as typed arrays for the hot loops.
 * @example
 * validatePoints([{ x: 0, y: 0, value: 1 }, { x: 0, y: 0, value: 2 }], 2, 'Ordinary kriging');
 * // throws "Duplicate location at (0, 0)"
 */
export function validatePoints(
  points: readonly DataPoint[],
  minimum: number,
  what: string,
): { xs: Float64Array; ys: Float64Array; values: Float64Array } {
  if (!Array.isArray(points)) throw new Error('points must be an array');
  if (points.length < minimum) throw new Error(`${what} needs at least ${minimum} points, got ${points.length}`);
  const n = points.length;
  const xs = new Float64Array(n);
  const ys = new Float64Array(n);
  const values = new Float64Array(n);
  const seen = new Map<number, Map<number, number>>();
  for (let i = 0; i < n; i++) {
    const p = points[i];
    if (p === null || typeof p !== 'object') throw new Error(`Point ${i} must be an object with x, y, value`);
    if (!isFiniteNumber(p.x)) throw new Error(`Point ${i}: x must be a finite number, got ${String(p.x)}`);
    if (!isFiniteNumber(p.y)) throw new Error(`Point ${i}: y must be a finite number, got ${String(p.y)}`);
    if (!isFiniteNumber(p.value)) throw new Error(`Point ${i}: value must be a finite number, got ${String(p.value)}`);
    // two data at one location make the kriging matrix singular and IDW ambiguous
    let row = seen.get(p.x);
    if (row === undefined) {
      row = new Map();
      seen.set(p.x, row);
    }
    if (row.has(p.y)) throw new Error(`Duplicate location at (${p.x}, ${p.y})`);
    row.set(p.y, i);
    xs[i] = p.x;
    ys[i] = p.y;
    values[i] = p.value;
  }
  return { xs, ys, values };
}

/**
 * Checks targets (finite x, y).
 * @example
 * validateTargets([{ x: 1, y: Number.NaN }]); // throws "Target 0: x and y must be finite numbers"
 */
export function validateTargets(targets: readonly Target[]): void {
  if (!Array.isArray(targets)) throw new Error('targets must be an array');
  for (let i = 0; i < targets.length; i++) {
    const t = targets[i];
    if (t === null || typeof t !== 'object' || !isFiniteNumber(t.x) || !isFiniteNumber(t.y)) {
      throw new Error(`Target ${i}: x and y must be finite numbers`);
    }
  }
}

/**
 * Checks an optional neighbour limit: undefined, or an integer ≥ 1.
 * @example
 * validateMaxNeighbours(0); // throws "maxNeighbours must be an integer ≥ 1, got 0"
 */
export function validateMaxNeighbours(maxNeighbours: number | undefined): void {
  if (maxNeighbours === undefined) return;
  if (!Number.isInteger(maxNeighbours) || maxNeighbours < 1) {
    throw new Error(`maxNeighbours must be an integer ≥ 1, got ${String(maxNeighbours)}`);
  }
}
