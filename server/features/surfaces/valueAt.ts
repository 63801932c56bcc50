import proj4 from 'proj4';
import type { Surface } from '../../../shared/schemas/surfaces';

/**
 * The surface at a lon/lat by bilinear interpolation between the four surrounding cell centres
 * (value and standard deviation); null outside the grid's cell centres (a one-cell-wide grid: outside its cell) or
 * where a neighbour cell lies outside the extent.
 * @example valueAt(surface.grid, -101.0, -32.5) // { value: 2412.3, stdDev: 38.1 }
 */
export function valueAt(grid: Surface['grid'], lon: number, lat: number): { value: number; stdDev: number | null } | null {
  const [x, y] = proj4('EPSG:4326', grid.projection).forward([lon, lat]);
  const fi = (x - grid.x0) / grid.cellSizeM;
  const fj = (y - grid.y0) / grid.cellSizeM;
  // Between cell centres as a rule; across a grid one cell wide (or tall) there is no second centre to reach,
  // so that column (row) answers over its own cell, half a cell either side of its centre line.
  const inRange = (f: number, n: number) => (n === 1 ? Math.abs(f) <= 0.5 : f >= 0 && f <= n - 1);
  if (!inRange(fi, grid.nx) || !inRange(fj, grid.ny)) return null;
  // A grid one cell wide (or tall) has no second column (row) to blend with: index −1 and a read past the row
  // would follow. Clamp to the one column and take it whole, as the client's bilinearAtCell does.
  const i = Math.max(0, Math.min(Math.floor(fi), grid.nx - 2));
  const j = Math.max(0, Math.min(Math.floor(fj), grid.ny - 2));
  const i1 = Math.min(i + 1, grid.nx - 1);
  const j1 = Math.min(j + 1, grid.ny - 1);
  const tx = grid.nx === 1 ? 0 : fi - i;
  const ty = grid.ny === 1 ? 0 : fj - j;
  const blend = (a: (number | null)[]) => {
    const c = [a[j * grid.nx + i], a[j * grid.nx + i1], a[j1 * grid.nx + i], a[j1 * grid.nx + i1]];
    if (c.some((v) => v === null || v === undefined)) return null;
    const [v00, v10, v01, v11] = c as number[];
    return (1 - ty) * ((1 - tx) * v00 + tx * v10) + ty * ((1 - tx) * v01 + tx * v11);
  };
  const value = blend(grid.values);
  if (value === null) return null;
  return { value, stdDev: grid.stdDev ? blend(grid.stdDev) : null };
}
