import { distance, featureCollection, interpolate, point } from '@turf/turf';
import { describe, expect, it } from 'vitest';
import { idw } from '@shared/interpolation/index';
import { mulberry32 } from '@shared/random/mulberry32';

/** turf's mean Earth radius (@turf/helpers earthRadius = 6371008.8 m). */
const EARTH_RADIUS_M = 6371008.8;
const DEG = Math.PI / 180;

describe('idw against @turf/turf interpolate', () => {
  it('matches turf on a 1 km patch at the equator, where great-circle distance is planar to 1e-7', () => {
    // turf works in lon/lat with haversine distance; at the equator over ~1 km the planar frame
    // x = R·λ, y = R·φ reproduces its distances to better than 1e-7 (asserted below), so IDW values must
    // agree to 1e-6 of the data range (the weights 1/d² carry twice the relative distance error).
    const random = mulberry32(17);
    const data = Array.from({ length: 25 }, () => ({ lon: random() * 0.009, lat: random() * 0.009, value: 100 + 50 * random() }));
    const pts = featureCollection(data.map((d) => point([d.lon, d.lat], { value: d.value })));
    const result = interpolate(pts, 0.15, { gridType: 'point', property: 'value', units: 'kilometers', weight: 2 });
    const planar = data.map((d) => ({ x: EARTH_RADIUS_M * d.lon * DEG, y: EARTH_RADIUS_M * d.lat * DEG, value: d.value }));
    const targets = result.features.map((f) => ({
      x: EARTH_RADIUS_M * f.geometry.coordinates[0] * DEG,
      y: EARTH_RADIUS_M * f.geometry.coordinates[1] * DEG,
    }));
    expect(targets.length).toBeGreaterThan(20);

    let worstDistance = 0;
    result.features.forEach((f, i) => {
      data.forEach((d, j) => {
        const turfM = distance(f.geometry.coordinates, [d.lon, d.lat], { units: 'kilometers' }) * 1000;
        const planarM = Math.hypot(targets[i].x - planar[j].x, targets[i].y - planar[j].y);
        worstDistance = Math.max(worstDistance, Math.abs(turfM - planarM) / planarM);
      });
    });
    expect(worstDistance).toBeLessThan(1e-7);

    const ours = idw(planar, targets, { power: 2 });
    result.features.forEach((f, i) => expect(Math.abs(ours[i] - (f.properties!.value as number))).toBeLessThan(1e-6 * 50));
  });
});

describe('idw', () => {
  it('is the hand-computed Shepard (1968) weighted mean, and exact at data points', () => {
    const pts = [
      { x: 0, y: 0, value: 10 },
      { x: 4, y: 0, value: 20 },
      { x: 0, y: 3, value: 40 },
    ];
    // at (0, 1): d = 1, √17, 2 → p = 2 weights 1, 1/17, 1/4
    const w = [1, 1 / 17, 1 / 4];
    const expected = (10 * w[0] + 20 * w[1] + 40 * w[2]) / (w[0] + w[1] + w[2]);
    const [a, b, c] = idw(
      pts,
      [
        { x: 0, y: 1 },
        { x: 4, y: 0 },
        { x: 0, y: 1 },
      ],
      { power: 2 },
    );
    expect(a).toBeCloseTo(expected, 12);
    expect(b).toBe(20);
    // p = 1 weights 1, 1/√17, 1/2
    const w1 = [1, 1 / Math.sqrt(17), 1 / 2];
    expect(idw(pts, [{ x: 0, y: 1 }], { power: 1 })[0]).toBeCloseTo((10 * w1[0] + 20 * w1[1] + 40 * w1[2]) / (w1[0] + w1[1] + w1[2]), 12);
    expect(c).toBe(a);
  });

  it('with maxNeighbours equals IDW over the k nearest found by brute force', () => {
    const random = mulberry32(8);
    const pts = Array.from({ length: 200 }, () => ({ x: random() * 100, y: random() * 100, value: random() * 10 }));
    const targets = Array.from({ length: 50 }, () => ({ x: random() * 120 - 10, y: random() * 120 - 10 }));
    const ours = idw(pts, targets, { power: 3, maxNeighbours: 7 });
    targets.forEach((t, i) => {
      const near = pts
        .map((p) => ({ p, d: Math.hypot(p.x - t.x, p.y - t.y) }))
        .sort((a, b) => a.d - b.d)
        .slice(0, 7);
      const sw = near.reduce((s, e) => s + e.d ** -3, 0);
      expect(ours[i]).toBeCloseTo(near.reduce((s, e) => s + e.p.value * e.d ** -3, 0) / sw, 10);
    });
  });

  it('rejects bad input', () => {
    const pts = [{ x: 0, y: 0, value: 1 }];
    expect(() => idw(pts, [{ x: 1, y: 1 }], { power: 0 })).toThrow('power must be a finite number > 0, got 0');
    expect(() => idw([], [{ x: 1, y: 1 }])).toThrow('Inverse distance weighting needs at least 1 points, got 0');
    expect(() => idw([...pts, { x: 0, y: 0, value: 2 }], [{ x: 1, y: 1 }])).toThrow('Duplicate location at (0, 0)');
    expect(() => idw(pts, [{ x: 1, y: 1 }], { maxNeighbours: 2.5 })).toThrow('maxNeighbours must be an integer ≥ 1, got 2.5');
  });
});
