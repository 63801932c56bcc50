import type { Target } from './types';

export interface GridOptions {
  /** Largest cell count accepted; default 1,000,000 (about 16 MB of estimates and variances). */
  maxCells?: number;
}

export interface Grid {
  nx: number;
  ny: number;
  /** Centre of the first cell (minX + cellSize/2), m. */
  x0: number;
  y0: number;
  cellSize: number;
  /** Cell-centre coordinates along x (length nx) and y (length ny). */
  xs: Float64Array;
  ys: Float64Array;
  /** All cell centres, row by row: index = iy·nx + ix. */
  targets: Target[];
}

/** Cell counts within this relative slack of an integer are not rounded up (0.7/0.1 = 6.999…). */
const ROUNDING_SLACK = 1e-9;

/**
 * A regular grid of cell centres covering a bounding box; the last row/column may extend past maxX/maxY.
 *
 * @example
 * grid([0, 0, 1000, 500], 100); // nx 10, ny 5, x0 50, y0 50, 50 targets
 */
export function grid(bbox: readonly [number, number, number, number], cellSize: number, options: GridOptions = {}): Grid {
  if (!Array.isArray(bbox) || bbox.length !== 4 || !bbox.every((v) => typeof v === 'number' && Number.isFinite(v))) {
    throw new Error('bbox must be [minX, minY, maxX, maxY] of finite numbers');
  }
  const [minX, minY, maxX, maxY] = bbox;
  if (!(minX < maxX) || !(minY < maxY)) throw new Error(`bbox must have minX < maxX and minY < maxY, got [${bbox.join(', ')}]`);
  if (typeof cellSize !== 'number' || !Number.isFinite(cellSize) || cellSize <= 0) {
    throw new Error(`cellSize must be a finite number > 0, got ${String(cellSize)}`);
  }
  const maxCells = options.maxCells ?? 1_000_000;
  if (!Number.isInteger(maxCells) || maxCells < 1) throw new Error(`maxCells must be an integer ≥ 1, got ${String(maxCells)}`);
  const nx = Math.max(1, Math.ceil((maxX - minX) / cellSize - ROUNDING_SLACK));
  const ny = Math.max(1, Math.ceil((maxY - minY) / cellSize - ROUNDING_SLACK));
  const count = nx * ny;
  if (count > maxCells) throw new Error(`Grid of ${nx} × ${ny} = ${count} cells exceeds the limit of ${maxCells}`);
  const x0 = minX + cellSize / 2;
  const y0 = minY + cellSize / 2;
  const xs = new Float64Array(nx);
  const ys = new Float64Array(ny);
  for (let i = 0; i < nx; i++) xs[i] = x0 + i * cellSize;
  for (let j = 0; j < ny; j++) ys[j] = y0 + j * cellSize;
  const targets: Target[] = new Array(count);
  for (let j = 0; j < ny; j++) for (let i = 0; i < nx; i++) targets[j * nx + i] = { x: xs[i], y: ys[j] };
  return { nx, ny, x0, y0, cellSize, xs, ys, targets };
}
