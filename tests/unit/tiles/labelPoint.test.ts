import { describe, expect, it } from 'vitest';
import { booleanPointInPolygon, centerOfMass, polygon } from '@turf/turf';
import { labelPoint } from '../../../tiles/labelPoint';

describe('labelPoint (pole of inaccessibility)', () => {
  it('finds the centre of a square', () => {
    // Placed on the equator so the mid-latitude scaling is exactly 1.
    const [lon, lat] = labelPoint([
      [
        [0, -1],
        [2, -1],
        [2, 1],
        [0, 1],
        [0, -1],
      ],
    ]);
    expect(lon).toBeCloseTo(1, 3);
    expect(lat).toBeCloseTo(0, 3);
  });

  it('stays inside a U shape where the centre of mass falls in the gap', () => {
    // A U of unit-wide bars, 3 × 3, centred on the equator. Elementary geometry: the largest inscribed
    // circle sits in a bottom corner, touching two outer sides and the inner corner, radius 2 − √2.
    const rings = [
      [
        [0, -1.5],
        [3, -1.5],
        [3, 1.5],
        [2, 1.5],
        [2, -0.5],
        [1, -0.5],
        [1, 1.5],
        [0, 1.5],
        [0, -1.5],
      ],
    ];
    const u = polygon(rings);
    expect(booleanPointInPolygon(centerOfMass(u), u)).toBe(false); // turf's choice lands outside
    const [lon, lat] = labelPoint(rings);
    expect(booleanPointInPolygon([lon, lat], u)).toBe(true);
    const r = 2 - Math.SQRT2;
    const cornerX = Math.abs(lon - r) < Math.abs(lon - (3 - r)) ? r : 3 - r;
    expect(lon).toBeCloseTo(cornerX, 2);
    expect(lat).toBeCloseTo(-1.5 + r, 2);
  });

  it('keeps away from a hole', () => {
    // A square with a square hole off-centre: the label must not sit in the hole.
    const rings = [
      [
        [0, -2],
        [4, -2],
        [4, 2],
        [0, 2],
        [0, -2],
      ],
      [
        [1, -1],
        [3, -1],
        [3, 1],
        [1, 1],
        [1, -1],
      ],
    ];
    const p = labelPoint(rings);
    expect(booleanPointInPolygon(p, polygon(rings))).toBe(true);
  });

  it('rejects a polygon without a proper exterior ring', () => {
    expect(() => labelPoint([])).toThrow('labelPoint: the polygon needs an exterior ring of at least 4 positions.');
    expect(() =>
      labelPoint([
        [
          [0, 0],
          [1, 1],
          [0, 0],
        ],
      ]),
    ).toThrow('labelPoint: the polygon needs an exterior ring of at least 4 positions.');
  });
});
