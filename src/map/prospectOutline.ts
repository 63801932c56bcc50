import type { FeatureCollection, Point } from 'geojson';
import { area, kinks, pointOnFeature, polygon as turfPolygon } from '@turf/turf';
import type { PolygonGeometry, Prospect } from '@shared/schemas/planning';

const M2_PER_KM2 = 1e6;

/** Corners of a ring without the closing repeat, with consecutive duplicates (double clicks) removed. */
function corners(ring: readonly (readonly number[])[]): number[][] {
  const out: number[][] = [];
  for (const p of ring) {
    const last = out[out.length - 1];
    if (!last || last[0] !== p[0] || last[1] !== p[1]) out.push([p[0], p[1]]);
  }
  if (out.length > 1) {
    const [a, b] = [out[0], out[out.length - 1]];
    if (a[0] === b[0] && a[1] === b[1]) out.pop();
  }
  return out;
}

/**
 * A closed GeoJSON polygon from a drawn ring (closed or not), as the prospect API takes it.
 * @example closedPolygon([[0, 0], [1, 0], [1, 1]]).coordinates[0].length // 4
 */
export function closedPolygon(ring: readonly (readonly number[])[]): PolygonGeometry {
  const c = corners(ring).map(([lon, lat]) => [lon, lat] as [number, number]);
  return { type: 'Polygon', coordinates: [c.length > 0 ? [...c, c[0]] : []] };
}

/**
 * Geodesic area of an outline in km² (turf's spherical area), 0 for fewer than three corners.
 * @example outlineAreaKm2(closedPolygon([[0, 0], [0.01, 0], [0.01, 0.01]])) // ≈ 0.62
 */
export function outlineAreaKm2(outline: PolygonGeometry): number {
  if (corners(outline.coordinates[0] ?? []).length < 3) return 0;
  return area(outline) / M2_PER_KM2;
}

/**
 * What is wrong with an outline before it is sent, in words for the person drawing it; null when it looks fine.
 * The server checks again; this only saves a round trip.
 * @example outlineProblem(closedPolygon([[0, 0], [1, 1], [1, 0], [0, 1]])) // 'The outline crosses itself: …'
 */
export function outlineProblem(outline: PolygonGeometry): string | null {
  const ring = outline.coordinates[0] ?? [];
  if (corners(ring).length < 3) return 'Draw at least three corners.';
  const crossings = kinks(turfPolygon(closedPolygon(ring).coordinates)).features.length;
  if (crossings > 0) return 'The outline crosses itself: move a corner so that no two edges cross.';
  return null;
}

export type ProspectLabelCollection = FeatureCollection<Point, { id: string; name: string }>;

/**
 * One label point per prospect, inside its outline even when the outline is bent (turf's pointOnFeature).
 * Labels come from here rather than from the tiles, where an outline cut by tile edges would be named once per tile.
 * @example prospectLabelPoints([prospect]).features[0].properties.name // 'Ostrel Ridge'
 */
export function prospectLabelPoints(prospects: readonly Pick<Prospect, 'id' | 'name' | 'geometry'>[]): ProspectLabelCollection {
  return {
    type: 'FeatureCollection',
    features: prospects
      .filter((p) => corners(p.geometry.coordinates[0] ?? []).length >= 3)
      .map((p) => ({ type: 'Feature', properties: { id: p.id, name: p.name }, geometry: pointOnFeature(p.geometry).geometry })),
  };
}
