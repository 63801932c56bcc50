import { describe, expect, it } from 'vitest';
import { booleanValid, distance, length, lineString, point } from '@turf/turf';
import type { OffsetCandidate, OffsetSetEntry } from '@shared/schemas/planning';
import { candidateMarks, offsetFeatures, savedMarks } from './offsetFeatures';

// Reference for validity and lengths: turf (booleanValid, distance, length), a general-purpose geospatial library.
const candidate = (wellId: string, lon: number, lat: number): OffsetCandidate => ({
  wellId,
  name: `W-${wellId}`,
  uwi: null,
  status: 'drilled',
  lon,
  lat,
  distanceKm: 1,
  azimuthDeg: 0,
  waterDepthM: null,
  waterDepthDiffM: null,
  tdTvdM: null,
  tdCoverage: null,
  pressureCount: 0,
  logCount: 0,
  hasLot: false,
  hasSurvey: false,
  topTvdssM: null,
  inOffsetSet: false,
  score: 1,
});

describe('offset highlight features', () => {
  const planned: [number, number] = [-101, -32.5];
  const candidates = [candidate('a', -101.1, -32.4), candidate('b', -100.9, -32.6), candidate('c', Number.NaN, 0)];

  it('draws a valid line from the planned well to each candidate and a point on it', () => {
    const fc = offsetFeatures(planned, candidateMarks(candidates, new Set(['b'])));
    const lines = fc.features.filter((f) => f.properties.kind === 'line');
    const points = fc.features.filter((f) => f.properties.kind === 'candidate');
    expect(lines).toHaveLength(2);
    expect(points).toHaveLength(2);
    for (const f of fc.features) expect(booleanValid(f)).toBe(true);
    // Lines first, so points are drawn over them.
    expect(fc.features.map((f) => f.properties.kind)).toEqual(['line', 'line', 'candidate', 'candidate']);
    const lineToA = lines[0];
    const expectedKm = distance(point(planned), point([-101.1, -32.4]), { units: 'kilometers' });
    expect(length(lineString(lineToA.geometry.coordinates as number[][]), { units: 'kilometers' })).toBeCloseTo(expectedKm, 9);
  });

  it('keeps the server order as rank and marks the picks', () => {
    const marks = candidateMarks(candidates.slice(0, 2), new Set(['b']));
    expect(marks.map((m) => [m.wellId, m.rank, m.picked])).toEqual([
      ['a', 1, false],
      ['b', 2, true],
    ]);
    const props = offsetFeatures(planned, marks).features.map((f) => f.properties);
    expect(props.find((p) => p.kind === 'candidate' && p.wellId === 'b')).toEqual({
      kind: 'candidate',
      wellId: 'b',
      name: 'W-b',
      rank: '2',
      picked: true,
    });
  });

  it('places saved offsets from known wells, without ranks, and draws only points when no planned well is known', () => {
    const entries: OffsetSetEntry[] = [
      { wellId: 'a', name: 'A', reason: null, addedBy: null, addedByName: null, addedAt: '2026-01-01T00:00:00Z' },
      { wellId: 'zz', name: 'Unknown', reason: null, addedBy: null, addedByName: null, addedAt: '2026-01-01T00:00:00Z' },
    ];
    const marks = savedMarks(entries, new Map([['a', { lon: -101.1, lat: -32.4 }]]));
    expect(marks).toEqual([{ wellId: 'a', name: 'A', lon: -101.1, lat: -32.4, rank: null, picked: true }]);
    const fc = offsetFeatures(null, marks);
    expect(fc.features.map((f) => f.properties.kind)).toEqual(['candidate']);
    expect(fc.features[0].properties.rank).toBe('');
  });
});
