import { ATLAS_LAYERS } from './atlasLayers';

/** The part of a rendered feature this module reads (MapLibre's `MapGeoJSONFeature` fits it). */
export interface RenderedFeatureLike {
  layer: { id: string };
  properties: Record<string, unknown> | null;
  geometry: { type: string; coordinates?: unknown };
}

/** What a click on the map lands on. */
export type MapTarget =
  | { kind: 'plannedWell'; id: string }
  | { kind: 'well'; id: string }
  | { kind: 'cluster'; lon: number; lat: number; count: number }
  | { kind: 'prospect'; id: string };

const str = (v: unknown) => (typeof v === 'string' && v !== '' ? v : null);

function pointOf(f: RenderedFeatureLike): [number, number] | null {
  if (f.geometry.type !== 'Point' || !Array.isArray(f.geometry.coordinates)) return null;
  const [lon, lat] = f.geometry.coordinates as number[];
  return Number.isFinite(lon) && Number.isFinite(lat) ? [lon, lat] : null;
}

// Smaller things first: a planned well sits inside a prospect, a well may sit under a cluster edge.
const PRIORITY: string[] = [
  ATLAS_LAYERS.plannedWells,
  ATLAS_LAYERS.plannedCore,
  ATLAS_LAYERS.wells,
  ATLAS_LAYERS.pressureRing,
  ATLAS_LAYERS.offsetCandidates,
  ATLAS_LAYERS.clusters,
  ATLAS_LAYERS.prospectFill,
];

/** Layers a click is tested against, for `queryRenderedFeatures`. */
export const CLICKABLE_LAYERS: readonly string[] = PRIORITY;

/**
 * The one thing a click means, from the features rendered under the pointer.
 * @example mapTargetOf([{ layer: { id: 'wells-points' }, properties: { id: 'w1' }, geometry: { type: 'Point', coordinates: [0, 0] } }])
 * // { kind: 'well', id: 'w1' }
 */
export function mapTargetOf(features: readonly RenderedFeatureLike[]): MapTarget | null {
  const ranked = [...features]
    .filter((f) => PRIORITY.includes(f.layer.id))
    .sort((a, b) => PRIORITY.indexOf(a.layer.id) - PRIORITY.indexOf(b.layer.id));
  for (const f of ranked) {
    const p = f.properties ?? {};
    switch (f.layer.id) {
      case ATLAS_LAYERS.plannedWells:
      case ATLAS_LAYERS.plannedCore: {
        const id = str(p.id);
        if (id) return { kind: 'plannedWell', id };
        break;
      }
      case ATLAS_LAYERS.wells:
      case ATLAS_LAYERS.pressureRing: {
        const id = str(p.id);
        if (id) return { kind: 'well', id };
        break;
      }
      case ATLAS_LAYERS.offsetCandidates: {
        const id = str(p.wellId);
        if (id) return { kind: 'well', id };
        break;
      }
      case ATLAS_LAYERS.clusters: {
        const at = pointOf(f);
        if (at) return { kind: 'cluster', lon: at[0], lat: at[1], count: Number(p.count) || 0 };
        break;
      }
      case ATLAS_LAYERS.prospectFill: {
        const id = str(p.id);
        if (id) return { kind: 'prospect', id };
        break;
      }
    }
  }
  return null;
}

/**
 * How many wells the rendered well features stand for: each well once (a point near a tile edge is
 * drawn from both tiles) plus the count of each cluster.
 * @example countRenderedWells([{ layer: { id: 'wells-clusters' }, properties: { cluster: true, count: 12 }, geometry: { type: 'Point', coordinates: [1, 2] } }]) // 12
 */
export function countRenderedWells(features: readonly RenderedFeatureLike[]): number {
  const wells = new Set<string>();
  const clusters = new Map<string, number>();
  for (const f of features) {
    const p = f.properties ?? {};
    if (f.layer.id === ATLAS_LAYERS.wells) {
      const id = str(p.id);
      if (id) wells.add(id);
    } else if (f.layer.id === ATLAS_LAYERS.clusters) {
      const at = pointOf(f);
      const count = Number(p.count);
      if (at && Number.isFinite(count)) clusters.set(`${at[0].toFixed(6)},${at[1].toFixed(6)},${count}`, count);
    }
  }
  let total = wells.size;
  for (const c of clusters.values()) total += c;
  return total;
}
