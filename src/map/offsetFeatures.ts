import type { Feature, FeatureCollection, LineString, Point } from 'geojson';
import type { OffsetCandidate, OffsetSetEntry } from '@shared/schemas/planning';

/** One well to highlight around a planned well: where it is, its rank in the search, and whether it is picked. */
export interface OffsetMark {
  wellId: string;
  name: string;
  lon: number;
  lat: number;
  /** 1 for the best candidate; null for saved offsets shown without a search. */
  rank: number | null;
  picked: boolean;
}

export interface OffsetFeatureProps {
  kind: 'line' | 'candidate';
  wellId: string;
  name: string;
  /** Rank as text for the label; empty when the well has no rank. */
  rank: string;
  picked: boolean;
}

export type OffsetFeatureCollection = FeatureCollection<Point | LineString, OffsetFeatureProps>;

export const EMPTY_OFFSETS: OffsetFeatureCollection = { type: 'FeatureCollection', features: [] };

const finite = (lon: number, lat: number) => Number.isFinite(lon) && Number.isFinite(lat);

/**
 * The highlight layer's data: one line from the planned well to each offset well, and one point
 * per offset well. Lines come first so that, drawn from one source, points sit on top of them.
 * @example
 * offsetFeatures([-101, -32.5], [{ wellId: 'w1', name: 'A-1', lon: -101.1, lat: -32.4, rank: 1, picked: true }]).features.length // 2
 */
export function offsetFeatures(plannedLonLat: readonly [number, number] | null, marks: readonly OffsetMark[]): OffsetFeatureCollection {
  const points: Feature<Point, OffsetFeatureProps>[] = [];
  const lines: Feature<LineString, OffsetFeatureProps>[] = [];
  for (const m of marks) {
    if (!finite(m.lon, m.lat)) continue;
    const props = { wellId: m.wellId, name: m.name, rank: m.rank === null ? '' : String(m.rank), picked: m.picked };
    points.push({ type: 'Feature', properties: { kind: 'candidate', ...props }, geometry: { type: 'Point', coordinates: [m.lon, m.lat] } });
    if (plannedLonLat && finite(plannedLonLat[0], plannedLonLat[1])) {
      lines.push({
        type: 'Feature',
        properties: { kind: 'line', ...props },
        geometry: {
          type: 'LineString',
          coordinates: [
            [plannedLonLat[0], plannedLonLat[1]],
            [m.lon, m.lat],
          ],
        },
      });
    }
  }
  return { type: 'FeatureCollection', features: [...lines, ...points] };
}

/**
 * Marks for a ranked search: rank follows the server's order (best first), picks come from the table.
 * @example candidateMarks(candidates, new Set([candidates[0].wellId]))[0] // { rank: 1, picked: true, … }
 */
export function candidateMarks(candidates: readonly OffsetCandidate[], picked: ReadonlySet<string>): OffsetMark[] {
  return candidates.map((c, i) => ({ wellId: c.wellId, name: c.name, lon: c.lon, lat: c.lat, rank: i + 1, picked: picked.has(c.wellId) }));
}

/**
 * Marks for a saved offset set shown before any search, placed from the wells the map already knows;
 * entries whose well is not known here are left out.
 * @example savedMarks(entries, new Map([[w.id, { lon: w.lon, lat: w.lat }]]))
 */
export function savedMarks(entries: readonly OffsetSetEntry[], wellsById: ReadonlyMap<string, { lon: number; lat: number }>): OffsetMark[] {
  const marks: OffsetMark[] = [];
  for (const e of entries) {
    const w = wellsById.get(e.wellId);
    if (w) marks.push({ wellId: e.wellId, name: e.name, lon: w.lon, lat: w.lat, rank: null, picked: true });
  }
  return marks;
}
