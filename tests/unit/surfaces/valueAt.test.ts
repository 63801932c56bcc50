import { describe, expect, it } from 'vitest';
import proj4 from 'proj4';
import { valueAt } from '../../../server/features/surfaces/valueAt';
import type { Surface } from '../../../shared/schemas/surfaces';

const projection = '+proj=aeqd +lat_0=-32.5 +lon_0=-101 +x_0=0 +y_0=0 +datum=WGS84 +units=m +no_defs';
const toLonLat = (x: number, y: number) => proj4(projection, 'EPSG:4326').forward([x, y]) as [number, number];

function grid(nx: number, ny: number, values: (number | null)[], stdDev: (number | null)[] | null = null): Surface['grid'] {
  return {
    nx,
    ny,
    cellSizeM: 100,
    projection,
    x0: 0,
    y0: 0,
    values,
    stdDev,
    cornersLonLat: [
      [0, 0],
      [0, 0],
      [0, 0],
      [0, 0],
    ],
    min: 0,
    max: 0,
  };
}

describe('valueAt: the surface at a lon/lat', () => {
  it('blends the four surrounding cell centres bilinearly (value and standard deviation)', () => {
    const g = grid(2, 2, [2000, 2100, 2200, 2400], [10, 20, 30, 40]);
    const [lon, lat] = toLonLat(25, 50);
    const v = valueAt(g, lon, lat)!;
    // Bilinear by hand at (¼, ½): south row 2000 + ¼·100 = 2025, north row 2200 + ¼·200 = 2250, half-way: 2137.5.
    expect(v.value).toBeCloseTo(2137.5, 3);
    // 10 + ¼·10 = 12.5, 30 + ¼·10 = 32.5, half-way: 22.5
    expect(v.stdDev).toBeCloseTo(22.5, 3);
  });

  it('answers along a grid one cell wide without reading index −1 or past the row', () => {
    const column = grid(1, 3, [2000, 2100, 2300], [5, 6, 8]);
    const [lon, lat] = toLonLat(0, 150);
    const v = valueAt(column, lon, lat)!;
    // Half-way between the second and third cells: (2100 + 2300) / 2 = 2200; (6 + 8) / 2 = 7.
    expect(v.value).toBeCloseTo(2200, 3);
    expect(v.stdDev).toBeCloseTo(7, 3);
    const row = grid(3, 1, [1, 2, 4]);
    // A click 20 m north of a one-row grid's centre line is still inside its cells: (2 + 4) / 2 = 3.
    const [lon2, lat2] = toLonLat(150, 20);
    expect(valueAt(row, lon2, lat2)!.value).toBeCloseTo(3, 3);
    expect(valueAt(row, lon2, lat2)!.stdDev).toBeNull();
    const single = grid(1, 1, [1234], [9]);
    const [lon3, lat3] = toLonLat(30, -40);
    expect(valueAt(single, lon3, lat3)).toEqual({ value: 1234, stdDev: 9 });
    // Beyond half a cell from the centre is outside the grid.
    const [lon4, lat4] = toLonLat(0, 60);
    expect(valueAt(single, lon4, lat4)).toBeNull();
  });

  it('is null outside the cell centres and next to a cell outside the extent', () => {
    const g = grid(2, 2, [2000, null, 2200, 2400]);
    const [lon, lat] = toLonLat(-10, 0);
    expect(valueAt(g, lon, lat)).toBeNull();
    const [lon2, lat2] = toLonLat(50, 50);
    expect(valueAt(g, lon2, lat2)).toBeNull();
  });
});
