import { describe, expect, it } from 'vitest';
import { booleanPointInPolygon } from '@turf/turf';
import { closedPolygon, outlineAreaKm2, outlineProblem, prospectLabelPoints } from './prospectOutline';

describe('prospect outlines', () => {
  it('closes a drawn ring and drops double clicks', () => {
    expect(
      closedPolygon([
        [0, 0],
        [1, 0],
        [1, 0],
        [1, 1],
      ]).coordinates[0],
    ).toEqual([
      [0, 0],
      [1, 0],
      [1, 1],
      [0, 0],
    ]);
    expect(
      closedPolygon([
        [0, 0],
        [1, 0],
        [1, 1],
        [0, 0],
      ]).coordinates[0],
    ).toEqual([
      [0, 0],
      [1, 0],
      [1, 1],
      [0, 0],
    ]);
  });

  it('measures a 0.1° square at the equator close to the spherical value', () => {
    // Spherical cap area between meridians: R²·Δλ·(sin φ2 − sin φ1), R = 6371.0088 km (turf's mean radius).
    const R = 6371.0088;
    const d = (0.1 * Math.PI) / 180;
    const expected = R * R * d * Math.sin(d);
    const square = closedPolygon([
      [0, 0],
      [0.1, 0],
      [0.1, 0.1],
      [0, 0.1],
    ]);
    expect(outlineAreaKm2(square)).toBeCloseTo(expected, 1);
    expect(
      outlineAreaKm2(
        closedPolygon([
          [0, 0],
          [1, 1],
        ]),
      ),
    ).toBe(0);
  });

  it('names a crossing outline and too few corners', () => {
    expect(
      outlineProblem(
        closedPolygon([
          [0, 0],
          [1, 1],
          [1, 0],
          [0, 1],
        ]),
      ),
    ).toBe('The outline crosses itself: move a corner so that no two edges cross.');
    expect(
      outlineProblem(
        closedPolygon([
          [0, 0],
          [1, 1],
          [1, 1],
        ]),
      ),
    ).toBe('Draw at least three corners.');
    expect(
      outlineProblem(
        closedPolygon([
          [0, 0],
          [1, 0],
          [1, 1],
          [0, 1],
        ]),
      ),
    ).toBeNull();
  });

  it('puts each label inside its outline, also for a bent (C-shaped) one whose centroid lies outside', () => {
    // A "C": its centroid falls in the open middle; turf.booleanPointInPolygon is the judge.
    const c = closedPolygon([
      [0, 0],
      [3, 0],
      [3, 1],
      [1, 1],
      [1, 2],
      [3, 2],
      [3, 3],
      [0, 3],
    ]);
    const labels = prospectLabelPoints([
      { id: 'p1', name: 'Bent', geometry: c },
      {
        id: 'p2',
        name: 'Line',
        geometry: closedPolygon([
          [0, 0],
          [1, 1],
        ]),
      },
    ]);
    expect(labels.features.map((f) => f.properties)).toEqual([{ id: 'p1', name: 'Bent' }]);
    expect(booleanPointInPolygon(labels.features[0].geometry.coordinates, c)).toBe(true);
  });
});
