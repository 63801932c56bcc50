import proj4 from 'proj4';
import { describe, expect, it } from 'vitest';
import { bilinearAtCell, surfaceValueAt, surfaceValueAtXY, type SurfaceGrid } from './surfaceValue';

// Hand-worked bilinear interpolation: f = (1−ty)[(1−tx)v00 + tx·v10] + ty[(1−tx)v01 + tx·v11].
// Grid 3 × 2, south row first:   north: 30 50 60
//                                south: 10 20 40
const values = [10, 20, 40, 30, 50, 60];

describe('bilinearAtCell', () => {
  it('returns the cell value at a cell centre', () => {
    expect(bilinearAtCell(values, 3, 2, 0, 0)).toBe(10);
    expect(bilinearAtCell(values, 3, 2, 2, 1)).toBe(60);
  });

  it('averages the four cells at the middle of a square', () => {
    expect(bilinearAtCell(values, 3, 2, 0.5, 0.5)).toBeCloseTo((10 + 20 + 30 + 50) / 4, 12); // 27.5
  });

  it('weights by distance in both directions', () => {
    // South: 20 + 0.25·(40 − 20) = 25; north: 50 + 0.25·(60 − 50) = 52.5; halfway: 38.75.
    expect(bilinearAtCell(values, 3, 2, 1.25, 0.5)).toBeCloseTo(38.75, 12);
    // Along the west column only: 10 + 0.8·(30 − 10) = 26.
    expect(bilinearAtCell(values, 3, 2, 0, 0.8)).toBeCloseTo(26, 12);
  });

  it('answers null beyond the cell centres or next to a cell without value', () => {
    expect(bilinearAtCell(values, 3, 2, 2.01, 0.5)).toBeNull();
    expect(bilinearAtCell(values, 3, 2, -0.01, 0)).toBeNull();
    expect(bilinearAtCell([10, null, 40, 30, 50, 60], 3, 2, 0.5, 0.5)).toBeNull();
    // The far side of the grid still answers: only cells 1, 2, 4, 5 are used.
    expect(bilinearAtCell([10, null, 40, 30, 50, 60], 3, 2, 1.5, 0.5)).toBeNull();
    expect(bilinearAtCell([null, 20, 40, 30, 50, 60], 3, 2, 1.5, 0.5)).toBeCloseTo((20 + 40 + 50 + 60) / 4, 12);
  });
});

const AEQD = '+proj=aeqd +lat_0=-32.5 +lon_0=-101 +x_0=0 +y_0=0 +datum=WGS84 +units=m +no_defs';
const grid: SurfaceGrid = {
  nx: 3,
  ny: 2,
  cellSizeM: 250,
  projection: AEQD,
  // Cell (1, 0) is centred on the projection's origin.
  x0: -250,
  y0: 0,
  values,
  stdDev: [5, 6, 8, 7, 9, 12],
  cornersLonLat: [
    [0, 0],
    [0, 0],
    [0, 0],
    [0, 0],
  ],
  min: 10,
  max: 60,
};

describe('surfaceValueAtXY / surfaceValueAt', () => {
  it('reads value and standard deviation in the local frame', () => {
    expect(surfaceValueAtXY(grid, -250 + 125, 125)).toEqual({ value: 27.5, stdDev: (5 + 6 + 7 + 9) / 4 });
  });

  it('finds the cell under the azimuthal-equidistant origin at the projection centre', () => {
    // An azimuthal equidistant projection maps its own centre to (0, 0) (Snyder 1987, USGS PP 1395, §25).
    expect(surfaceValueAt(grid, -101, -32.5)).toEqual({ value: 20, stdDev: 6 });
  });

  it('blends at a lon/lat that proj4 places a quarter cell north-east of the origin', () => {
    const [lon, lat] = proj4(AEQD, 'EPSG:4326').forward([62.5, 62.5]);
    const v = surfaceValueAt(grid, lon, lat)!;
    // fi = 1.25, fj = 0.25: south 25, north 52.5 → 25 + 0.25·27.5 = 31.875.
    expect(v.value).toBeCloseTo(31.875, 6);
  });

  it('is null outside the grid', () => {
    expect(surfaceValueAt(grid, -100, -32.5)).toBeNull();
  });
});
