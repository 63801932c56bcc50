import proj4 from 'proj4';
import type { Surface } from '@shared/schemas/surfaces';

export type SurfaceGrid = Surface['grid'];

/**
 * Bilinear blend of one grid array at fractional cell coordinates (fi east, fj north, 0 = centre of the first
 * cell). Null outside the cell centres or when one of the four surrounding cells has no value.
 * @example bilinearAtCell([0, 10, 20, 30], 2, 2, 0.5, 0.5) // 15
 */
export function bilinearAtCell(values: readonly (number | null)[], nx: number, ny: number, fi: number, fj: number): number | null {
  if (values.length !== nx * ny) throw new Error(`Grid has ${values.length} values, expected nx × ny = ${nx * ny}`);
  if (!Number.isFinite(fi) || !Number.isFinite(fj)) return null;
  if (fi < 0 || fj < 0 || fi > nx - 1 || fj > ny - 1) return null;
  // A one-cell-wide grid still answers at its centre line.
  const i = Math.max(0, Math.min(Math.floor(fi), nx - 2));
  const j = Math.max(0, Math.min(Math.floor(fj), ny - 2));
  const tx = nx === 1 ? 0 : fi - i;
  const ty = ny === 1 ? 0 : fj - j;
  const at = (ii: number, jj: number) => values[Math.min(jj, ny - 1) * nx + Math.min(ii, nx - 1)];
  const c = [at(i, j), at(i + 1, j), at(i, j + 1), at(i + 1, j + 1)];
  if (c.some((v) => v === null || !Number.isFinite(v))) return null;
  const [v00, v10, v01, v11] = c as number[];
  return (1 - ty) * ((1 - tx) * v00 + tx * v10) + ty * ((1 - tx) * v01 + tx * v11);
}

/**
 * The surface value and standard deviation at a point of the grid's local frame (metres).
 * @example surfaceValueAtXY(grid, grid.x0, grid.y0) // { value: grid.values[0], stdDev: grid.stdDev?.[0] ?? null }
 */
export function surfaceValueAtXY(grid: SurfaceGrid, xM: number, yM: number): { value: number; stdDev: number | null } | null {
  const fi = (xM - grid.x0) / grid.cellSizeM;
  const fj = (yM - grid.y0) / grid.cellSizeM;
  const value = bilinearAtCell(grid.values, grid.nx, grid.ny, fi, fj);
  if (value === null) return null;
  return { value, stdDev: grid.stdDev ? bilinearAtCell(grid.stdDev, grid.nx, grid.ny, fi, fj) : null };
}

/**
 * The surface at a lon/lat: projected into the grid's frame with proj4, then blended between cell centres.
 * Null outside the grid's cell centres or where it has no value.
 * @example surfaceValueAt(surface.grid, -101.02, -32.51) // { value: 2431.7, stdDev: 41.2 }
 */
export function surfaceValueAt(grid: SurfaceGrid, lon: number, lat: number): { value: number; stdDev: number | null } | null {
  const [x, y] = proj4('EPSG:4326', grid.projection).forward([lon, lat]);
  return surfaceValueAtXY(grid, x, y);
}
