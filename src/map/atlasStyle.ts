import type { SourceSpecification, StyleSpecification } from '@maplibre/maplibre-gl-style-spec';
import type { ReferenceLayer } from '@shared/schemas/planning';
import { atlasPalette } from './atlasPalette';
import { ATLAS_SOURCES, atlasLayers, type AtlasSelection } from './atlasLayers';
import { referenceShown, type LayerToggles, type ReferenceToggles } from './layerToggles';
import type { OffsetFeatureCollection } from './offsetFeatures';
import type { ProspectLabelCollection } from './prospectOutline';
import { referenceLayerSpecs, referenceSource, referenceSourceId } from './referenceLayers';
import { TEAM_TILES_MAX_ZOOM, teamTileUrl } from './teamTiles';

/** Everything the Atlas style depends on. The map view keeps it reactive and hands it to MapLibre's style diff. */
export interface AtlasStyleInput {
  /** The basemap style as `/tiles/style.json` serves it. */
  base: StyleSpecification;
  theme: 'light' | 'dark';
  /** The page's origin, for absolute tile URLs. */
  origin: string;
  teamId: string;
  /** Bumped after the team's data changes, so tiles are fetched again. */
  tileVersion: number;
  toggles: LayerToggles;
  selection: AtlasSelection;
  offsets: OffsetFeatureCollection;
  prospectLabels: ProspectLabelCollection;
  /** The team's uploaded reference layers and their switches; absent means none. */
  referenceLayers?: readonly Pick<ReferenceLayer, 'id' | 'kind' | 'color' | 'geometryTypes'>[];
  referenceToggles?: ReferenceToggles;
}

/** Ids that belong to the drawing tool; the style diff must leave its sources and layers alone. */
export const DRAW_PREFIX = 'atlas-draw';

/**
 * The whole map style: the basemap, then the team's reference layers (context under the team's own
 * data), then the team's vector tile sources and layers, then the offset highlights. The basemap's own
 * camera is dropped so a style change never moves the map.
 * @example
 * const style = atlasStyle({ base, theme: 'light', origin: location.origin, teamId, tileVersion: 0, toggles: DEFAULT_TOGGLES, selection: NO_SELECTION, offsets: EMPTY_OFFSETS, prospectLabels: prospectLabelPoints(prospects) });
 * map.setStyle(style, { diff: true, transformStyle: keepDrawLayers });
 */
export function atlasStyle(input: AtlasStyleInput): StyleSpecification {
  const { base, origin, teamId, tileVersion } = input;
  const team = (layer: 'wells' | 'prospects' | 'planned-wells'): SourceSpecification => ({
    type: 'vector',
    tiles: [teamTileUrl(origin, teamId, layer, tileVersion)],
    minzoom: 0,
    maxzoom: TEAM_TILES_MAX_ZOOM,
  });
  const { center: _center, zoom: _zoom, bearing: _bearing, pitch: _pitch, ...rest } = base;
  const palette = atlasPalette(input.theme);
  const references = input.referenceLayers ?? [];
  // An uploaded layer's features never change (layers are only added or deleted whole), so its tiles keep
  // one URL instead of following tileVersion, and an edit elsewhere does not refetch them.
  const referenceSources = Object.fromEntries(references.map((l) => [referenceSourceId(l.id), referenceSource(origin, teamId, l.id, 0)]));
  const referenceLayers = references.flatMap((l) => referenceLayerSpecs(l, palette, referenceShown(input.referenceToggles ?? {}, l.id)));
  return {
    ...rest,
    sources: {
      ...base.sources,
      ...referenceSources,
      [ATLAS_SOURCES.prospects]: team('prospects'),
      [ATLAS_SOURCES.wells]: team('wells'),
      [ATLAS_SOURCES.plannedWells]: team('planned-wells'),
      [ATLAS_SOURCES.offsets]: { type: 'geojson', data: input.offsets },
      [ATLAS_SOURCES.prospectLabels]: { type: 'geojson', data: input.prospectLabels },
    },
    layers: [...base.layers, ...referenceLayers, ...atlasLayers(palette, input.toggles, input.selection)],
  };
}

/**
 * `transformStyle` for `map.setStyle`: carries the drawing tool's sources and layers (added by
 * terra-draw at run time) over into the next style, on top, so a theme or selection change keeps a
 * half-drawn outline.
 * @example map.setStyle(next, { diff: true, transformStyle: keepDrawLayers });
 */
export function keepDrawLayers(previous: StyleSpecification | undefined, next: StyleSpecification): StyleSpecification {
  if (!previous) return next;
  const ours = (id: string) => id.startsWith(DRAW_PREFIX);
  const drawSources = Object.fromEntries(Object.entries(previous.sources).filter(([id]) => ours(id)));
  const drawLayers = previous.layers.filter((l) => ours(l.id));
  if (drawLayers.length === 0 && Object.keys(drawSources).length === 0) return next;
  return {
    ...next,
    sources: { ...next.sources, ...drawSources },
    layers: [...next.layers.filter((l) => !ours(l.id)), ...drawLayers],
  };
}
