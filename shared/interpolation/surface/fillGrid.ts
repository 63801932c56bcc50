import type { ExtentGrid } from './extentGrid';
import type { CellEstimate } from './types';

export interface FilledGrid {
  /** Row-major, south row first; null outside the extent. */
  values: (number | null)[];
  /** Kriging standard deviation per cell; null for inverse-distance weighting. */
  stdDev: (number | null)[] | null;
  min: number;
  max: number;
}

/**
 * Puts the estimates of the cells inside the extent back on the whole grid, with their range.
 * @example fillGrid(extent, estimates, true).values.length === extent.grid.nx * extent.grid.ny
 */
export function fillGrid({ grid: g, inside }: ExtentGrid, estimates: readonly CellEstimate[], withStdDev: boolean): FilledGrid {
  const values: (number | null)[] = new Array(g.nx * g.ny).fill(null);
  const stdDev: (number | null)[] | null = withStdDev ? new Array(g.nx * g.ny).fill(null) : null;
  let t = 0;
  let min = Infinity;
  let max = -Infinity;
  for (let c = 0; c < inside.length; c++) {
    if (!inside[c]) continue;
    const e = estimates[t++];
    values[c] = e.value;
    if (stdDev) stdDev[c] = e.variance === null ? null : Math.sqrt(Math.max(0, e.variance));
    min = Math.min(min, e.value);
    max = Math.max(max, e.value);
  }
  return { values, stdDev, min, max };
}
