import { describe, expect, it } from 'vitest';
import { bbox, distance, point } from '@turf/turf';
import { boundsOfPoints, boundsOfRing } from './bounds';

// Reference for frames and lengths: turf (bbox, distance), a general-purpose geospatial library.
describe('boundsOfPoints', () => {
  const wells = [
    { lon: -101.21, lat: -32.41 },
    { lon: -100.62, lat: -32.93 },
    { lon: -100.95, lat: -32.2 },
  ];

  it('frames the wells exactly as turf.bbox does', () => {
    const expected = bbox({ type: 'MultiPoint', coordinates: wells.map((w) => [w.lon, w.lat]) });
    expect(boundsOfPoints(wells)).toEqual(expected);
  });

  it('widens a single well to about ±5 km and skips impossible coordinates', () => {
    const [w, s, e, n] = boundsOfPoints([
      { lon: -101, lat: -32.5 },
      { lon: Number.NaN, lat: 0 },
      { lon: 200, lat: 0 },
    ])!;
    expect(w).toBeCloseTo(-101.045, 9);
    expect(e).toBeCloseTo(-100.955, 9);
    // 0.045° of latitude ≈ 5.0 km on the WGS 84 sphere turf uses (R = 6371.0088 km).
    expect(distance(point([-101, s]), point([-101, -32.5]), { units: 'kilometers' })).toBeCloseTo(5.0, 1);
    expect(n).toBeCloseTo(-32.455, 9);
  });

  it('gives null when there is nothing to frame', () => {
    expect(boundsOfPoints([])).toBeNull();
    expect(
      boundsOfRing([
        [0, 0],
        [2, 0],
        [2, 1],
        [0, 0],
      ]),
    ).toEqual([0, 0, 2, 1]);
  });
});
