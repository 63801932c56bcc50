import type { ExpressionSpecification, LayerSpecification } from '@maplibre/maplibre-gl-style-spec';
import { WELL_STATUSES } from '@shared/schemas/wells';
import type { AtlasPalette } from './atlasPalette';
import type { LayerToggle, LayerToggles } from './layerToggles';
import { WELL_POINTS_MIN_ZOOM } from './teamTiles';

/** Source ids the Atlas adds on top of the basemap. Team tile sources are named after their tile layer. */
export const ATLAS_SOURCES = {
  wells: 'team-wells',
  prospects: 'team-prospects',
  plannedWells: 'team-planned-wells',
  offsets: 'atlas-offsets',
  prospectLabels: 'atlas-prospect-labels',
} as const;

/** Layer ids, bottom to top. Click handling and the browser test query these. */
export const ATLAS_LAYERS = {
  prospectFill: 'prospects-fill',
  prospectLine: 'prospects-line',
  prospectSelected: 'prospects-selected',
  offsetLines: 'offsets-lines',
  offsetLinesPicked: 'offsets-lines-picked',
  clusters: 'wells-clusters',
  clusterCount: 'wells-cluster-count',
  pressureRing: 'wells-pressure-ring',
  wells: 'wells-points',
  logsMark: 'wells-logs-mark',
  lotMark: 'wells-lot-mark',
  wellSelected: 'wells-selected',
  offsetCandidates: 'offsets-candidates',
  offsetHover: 'offsets-hover',
  plannedWells: 'planned-wells',
  plannedCore: 'planned-wells-core',
  plannedSelected: 'planned-wells-selected',
  wellLabels: 'wells-labels',
  offsetRank: 'offsets-rank',
  prospectLabels: 'prospects-labels',
  plannedLabels: 'planned-wells-labels',
} as const;
export type AtlasLayerId = (typeof ATLAS_LAYERS)[keyof typeof ATLAS_LAYERS];

/** Which panel switch shows each layer. */
export const LAYER_GROUP: Record<AtlasLayerId, LayerToggle> = {
  'prospects-fill': 'prospects',
  'prospects-line': 'prospects',
  'prospects-selected': 'prospects',
  'prospects-labels': 'prospects',
  'offsets-lines': 'offsets',
  'offsets-lines-picked': 'offsets',
  'offsets-candidates': 'offsets',
  'offsets-hover': 'offsets',
  'offsets-rank': 'offsets',
  'wells-clusters': 'wells',
  'wells-cluster-count': 'wells',
  'wells-pressure-ring': 'wells',
  'wells-points': 'wells',
  'wells-logs-mark': 'wells',
  'wells-lot-mark': 'wells',
  'wells-selected': 'wells',
  'wells-labels': 'wellNames',
  'planned-wells': 'plannedWells',
  'planned-wells-core': 'plannedWells',
  'planned-wells-selected': 'plannedWells',
  'planned-wells-labels': 'plannedWells',
};

/** Labels use the faces the basemap style declares in `font-faces` (tiles/fonts.ts); the unit test checks they exist. */
export const LABEL_FONT = 'Inter Regular';
export const LABEL_FONT_STRONG = 'Inter SemiBold';

/** What is selected or hovered, to highlight; ids are the server's UUIDs. */
export interface AtlasSelection {
  wellId: string | null;
  prospectId: string | null;
  plannedWellId: string | null;
  /** The offset table row under the pointer. */
  hoverWellId: string | null;
  /** A prospect being edited in the drawing tool, hidden from the tiles so it is not drawn twice. */
  editingProspectId: string | null;
}

export const NO_SELECTION: AtlasSelection = {
  wellId: null,
  prospectId: null,
  plannedWellId: null,
  hoverWellId: null,
  editingProspectId: null,
};

// An id that never matches a UUID, so "nothing selected" filters stay valid expressions.
const NONE = '';
const idIs = (id: string | null): ExpressionSpecification => ['==', ['get', 'id'], id ?? NONE];
const isCluster: ExpressionSpecification = ['==', ['get', 'cluster'], true];
const notCluster: ExpressionSpecification = ['!=', ['get', 'cluster'], true];
const byZoom = (...stops: number[]): ExpressionSpecification => ['interpolate', ['linear'], ['zoom'], ...stops];

/** Marks sit on a corner of the well dot; offsets in pixels, away from the pressure ring. */
const MARK_OFFSET_PX = 6.5;

function statusColour(c: AtlasPalette): ExpressionSpecification {
  const pairs = WELL_STATUSES.flatMap((s) => [s, c.status[s]]);
  return ['match', ['get', 'status'], ...pairs, c.status.drilled] as unknown as ExpressionSpecification;
}

/**
 * The team layers over the basemap, bottom to top, for one theme, switch state and selection.
 * Layers of a switched-off group stay in the style with `visibility: none` so toggling is a layout change.
 * @example atlasLayers(LIGHT_PALETTE, DEFAULT_TOGGLES, NO_SELECTION).map((l) => l.id)[0] // 'prospects-fill'
 */
export function atlasLayers(c: AtlasPalette, toggles: LayerToggles, sel: AtlasSelection): LayerSpecification[] {
  const L = ATLAS_LAYERS;
  const S = ATLAS_SOURCES;
  const wellPoint: ExpressionSpecification = notCluster;
  const hideEdited: ExpressionSpecification = ['!=', ['get', 'id'], sel.editingProspectId ?? NONE];

  const layers: LayerSpecification[] = [
    {
      id: L.prospectFill,
      type: 'fill',
      source: S.prospects,
      'source-layer': 'prospects',
      filter: hideEdited,
      paint: { 'fill-color': c.prospectFill, 'fill-opacity': 0.12 },
    },
    {
      id: L.prospectLine,
      type: 'line',
      source: S.prospects,
      'source-layer': 'prospects',
      filter: hideEdited,
      layout: { 'line-join': 'round' },
      paint: { 'line-color': c.prospectLine, 'line-width': byZoom(6, 1, 12, 2), 'line-dasharray': [4, 2] },
    },
    {
      id: L.prospectSelected,
      type: 'line',
      source: S.prospects,
      'source-layer': 'prospects',
      filter: ['all', idIs(sel.prospectId), hideEdited],
      layout: { 'line-join': 'round' },
      paint: { 'line-color': c.prospectSelected, 'line-width': 3 },
    },
    {
      id: L.offsetLines,
      type: 'line',
      source: S.offsets,
      filter: ['all', ['==', ['get', 'kind'], 'line'], ['!', ['get', 'picked']]],
      paint: { 'line-color': c.offsetLine, 'line-width': 1.2, 'line-dasharray': [2, 2], 'line-opacity': 0.85 },
    },
    {
      id: L.offsetLinesPicked,
      type: 'line',
      source: S.offsets,
      filter: ['all', ['==', ['get', 'kind'], 'line'], ['get', 'picked']],
      layout: { 'line-cap': 'round' },
      paint: { 'line-color': c.offsetPicked, 'line-width': 2.5 },
    },
    {
      id: L.clusters,
      type: 'circle',
      source: S.wells,
      'source-layer': 'wells',
      filter: isCluster,
      paint: {
        'circle-color': c.cluster,
        'circle-opacity': 0.82,
        'circle-stroke-color': c.clusterStroke,
        'circle-stroke-width': 2,
        // Steps rather than a smooth scale: the legend can then explain each size.
        'circle-radius': ['step', ['get', 'count'], 11, 5, 14, 20, 18, 100, 23],
      },
    },
    {
      id: L.clusterCount,
      type: 'symbol',
      source: S.wells,
      'source-layer': 'wells',
      filter: isCluster,
      layout: {
        'text-field': ['to-string', ['get', 'count']],
        'text-font': [LABEL_FONT_STRONG],
        'text-size': 12,
        'text-allow-overlap': true,
        'text-ignore-placement': true,
      },
      paint: { 'text-color': c.clusterText },
    },
    {
      id: L.pressureRing,
      type: 'circle',
      source: S.wells,
      'source-layer': 'wells',
      filter: ['all', wellPoint, ['>', ['coalesce', ['get', 'pressures'], 0], 0]],
      paint: {
        'circle-radius': byZoom(WELL_POINTS_MIN_ZOOM, 8, 14, 11),
        'circle-opacity': 0,
        'circle-stroke-color': c.pressureRing,
        'circle-stroke-width': 2,
      },
    },
    {
      id: L.wells,
      type: 'circle',
      source: S.wells,
      'source-layer': 'wells',
      filter: wellPoint,
      paint: {
        'circle-radius': byZoom(WELL_POINTS_MIN_ZOOM, 4.5, 14, 7),
        'circle-color': statusColour(c),
        'circle-stroke-color': c.wellStroke,
        'circle-stroke-width': 1.2,
      },
    },
    {
      id: L.logsMark,
      type: 'circle',
      source: S.wells,
      'source-layer': 'wells',
      filter: ['all', wellPoint, ['>', ['coalesce', ['get', 'logs'], 0], 0]],
      paint: {
        'circle-radius': 2.4,
        'circle-color': c.logsMark,
        'circle-stroke-color': c.wellStroke,
        'circle-stroke-width': 0.8,
        'circle-translate': [MARK_OFFSET_PX, -MARK_OFFSET_PX],
      },
    },
    {
      id: L.lotMark,
      type: 'circle',
      source: S.wells,
      'source-layer': 'wells',
      filter: ['all', wellPoint, ['==', ['get', 'has_lot'], true]],
      paint: {
        'circle-radius': 2.4,
        'circle-color': c.lotMark,
        'circle-stroke-color': c.wellStroke,
        'circle-stroke-width': 0.8,
        'circle-translate': [-MARK_OFFSET_PX, -MARK_OFFSET_PX],
      },
    },
    {
      id: L.wellSelected,
      type: 'circle',
      source: S.wells,
      'source-layer': 'wells',
      filter: ['all', wellPoint, idIs(sel.wellId)],
      paint: { 'circle-radius': 14, 'circle-opacity': 0, 'circle-stroke-color': c.selection, 'circle-stroke-width': 2.5 },
    },
    {
      id: L.offsetCandidates,
      type: 'circle',
      source: S.offsets,
      filter: ['==', ['get', 'kind'], 'candidate'],
      paint: {
        'circle-radius': ['case', ['get', 'picked'], 11, 9],
        'circle-opacity': 0,
        'circle-stroke-color': ['case', ['get', 'picked'], c.offsetPicked, c.offsetLine],
        'circle-stroke-width': ['case', ['get', 'picked'], 3, 1.5],
      },
    },
    {
      id: L.offsetHover,
      type: 'circle',
      source: S.offsets,
      filter: ['all', ['==', ['get', 'kind'], 'candidate'], ['==', ['get', 'wellId'], sel.hoverWellId ?? NONE]],
      paint: { 'circle-radius': 16, 'circle-color': c.offsetPicked, 'circle-opacity': 0.25, 'circle-stroke-width': 0 },
    },
    {
      id: L.plannedWells,
      type: 'circle',
      source: S.plannedWells,
      'source-layer': 'planned-wells',
      paint: {
        'circle-radius': byZoom(5, 6, 12, 8),
        'circle-color': c.plannedCore,
        'circle-stroke-color': c.planned,
        'circle-stroke-width': 3,
      },
    },
    {
      id: L.plannedCore,
      type: 'circle',
      source: S.plannedWells,
      'source-layer': 'planned-wells',
      paint: { 'circle-radius': 2.2, 'circle-color': c.planned },
    },
    {
      id: L.plannedSelected,
      type: 'circle',
      source: S.plannedWells,
      'source-layer': 'planned-wells',
      filter: idIs(sel.plannedWellId),
      paint: { 'circle-radius': 15, 'circle-opacity': 0, 'circle-stroke-color': c.planned, 'circle-stroke-width': 2 },
    },
    {
      id: L.wellLabels,
      type: 'symbol',
      source: S.wells,
      'source-layer': 'wells',
      minzoom: WELL_POINTS_MIN_ZOOM,
      filter: wellPoint,
      layout: {
        'text-field': ['get', 'name'],
        'text-font': [LABEL_FONT],
        'text-size': byZoom(WELL_POINTS_MIN_ZOOM, 10.5, 14, 12.5),
        'text-anchor': 'top',
        'text-offset': [0, 0.9],
        'text-optional': true,
      },
      paint: { 'text-color': c.label, 'text-halo-color': c.labelHalo, 'text-halo-width': 1.4 },
    },
    {
      id: L.offsetRank,
      type: 'symbol',
      source: S.offsets,
      filter: ['all', ['==', ['get', 'kind'], 'candidate'], ['!=', ['get', 'rank'], '']],
      layout: {
        'text-field': ['get', 'rank'],
        'text-font': [LABEL_FONT_STRONG],
        'text-size': 11,
        'text-anchor': 'bottom-left',
        'text-offset': [0.7, -0.5],
        'text-allow-overlap': true,
      },
      paint: { 'text-color': c.label, 'text-halo-color': c.labelHalo, 'text-halo-width': 1.6 },
    },
    {
      id: L.prospectLabels,
      type: 'symbol',
      source: S.prospectLabels,
      filter: hideEdited,
      layout: {
        'text-field': ['get', 'name'],
        'text-font': [LABEL_FONT_STRONG],
        'text-size': byZoom(6, 11, 12, 14),
        'text-max-width': 8,
        'text-letter-spacing': 0.04,
        // A planned well often sits where the name would go; the name then moves above or below it.
        'text-variable-anchor': ['center', 'bottom', 'top'],
        'text-radial-offset': 1.4,
      },
      paint: { 'text-color': c.prospectLine, 'text-halo-color': c.labelHalo, 'text-halo-width': 1.6 },
    },
    {
      id: L.plannedLabels,
      type: 'symbol',
      source: S.plannedWells,
      'source-layer': 'planned-wells',
      minzoom: 7,
      layout: {
        'text-field': ['get', 'name'],
        'text-font': [LABEL_FONT_STRONG],
        'text-size': 11.5,
        'text-anchor': 'top',
        'text-offset': [0, 1.1],
        'text-optional': true,
      },
      paint: { 'text-color': c.planned, 'text-halo-color': c.labelHalo, 'text-halo-width': 1.6 },
    },
  ];

  return layers.map((layer) => ({
    ...layer,
    layout: { ...(layer.layout ?? {}), visibility: toggles[LAYER_GROUP[layer.id as AtlasLayerId]] ? 'visible' : 'none' },
  })) as LayerSpecification[];
}
