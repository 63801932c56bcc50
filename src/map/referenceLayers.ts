import type { ExpressionSpecification, LayerSpecification, SourceSpecification } from '@maplibre/maplibre-gl-style-spec';
import type { ReferenceLayer } from '@shared/schemas/planning';
import type { AtlasPalette } from './atlasPalette';
import { LABEL_FONT } from './atlasLayers';
import { TEAM_TILES_MAX_ZOOM, teamTileUrl } from './teamTiles';

export type ReferenceKind = ReferenceLayer['kind'];

export const REFERENCE_KIND_LABELS: Record<ReferenceKind, string> = {
  lease_blocks: 'Lease blocks',
  survey_outlines: 'Survey outlines',
  faults: 'Faults',
  bathymetry: 'Bathymetry contours',
  other: 'Other',
};

/**
 * The colour the upload form suggests for each kind; the person may pick another. Chosen for Porelith
 * to stay apart from the well, prospect and planned-well colours in atlasPalette.ts.
 */
export const REFERENCE_KIND_COLOURS: Record<ReferenceKind, string> = {
  lease_blocks: '#A0782C',
  survey_outlines: '#5560B8',
  faults: '#A8461F',
  bathymetry: '#3A78A8',
  other: '#6B7F99',
};

/** The `source-layer` names of a reference tile (teamTiles.service.ts): the features, and one label point per named polygon. */
export const REFERENCE_SOURCE_LAYER = 'reference';
export const REFERENCE_LABEL_SOURCE_LAYER = 'reference-labels';

/**
 * The map source id of an uploaded layer; the same string is its tile layer name on the server.
 * @example referenceSourceId('4f…') // 'reference-4f…'
 */
export const referenceSourceId = (layerId: string): `reference-${string}` => `reference-${layerId}`;

export type GeometryFamily = 'polygon' | 'line' | 'point';
const FAMILY_ORDER: GeometryFamily[] = ['polygon', 'line', 'point'];

/**
 * The geometry families a layer holds, from the PostGIS `GeometryType` names the server lists, in the
 * order they are drawn (areas under lines under points). A collection or an unknown type could hold
 * anything, so it asks for all three.
 * @example geometryFamilies(['MULTILINESTRING', 'POINT']) // ['line', 'point']
 */
export function geometryFamilies(types: readonly string[]): GeometryFamily[] {
  const found = new Set<GeometryFamily>();
  for (const t of types) {
    const u = t.toUpperCase();
    if (u.endsWith('POLYGON')) found.add('polygon');
    else if (u.endsWith('LINESTRING')) found.add('line');
    else if (u.endsWith('POINT')) found.add('point');
    else FAMILY_ORDER.forEach((f) => found.add(f));
  }
  return FAMILY_ORDER.filter((f) => found.has(f));
}

// MapLibre reports multi-part features by their simple type in some versions and by the Multi* name in
// others; matching both keeps the filters right either way.
const isFamily = (family: GeometryFamily): ExpressionSpecification => {
  const simple = family === 'polygon' ? 'Polygon' : family === 'line' ? 'LineString' : 'Point';
  return ['match', ['geometry-type'], [simple, `Multi${simple}`], true, false];
};
const byZoom = (...stops: number[]): ExpressionSpecification => ['interpolate', ['linear'], ['zoom'], ...stops];
const nameOf: ExpressionSpecification = ['coalesce', ['get', 'name'], ''];

/** Per-kind drawing: lease blocks read as filled parcels, survey outlines as dashed frames, faults as heavy lines, contours as fine ones. */
const KIND_STYLE: Record<ReferenceKind, { fillOpacity: number; lineWidth: ExpressionSpecification | number; dash?: number[] }> = {
  lease_blocks: { fillOpacity: 0.16, lineWidth: byZoom(5, 1, 12, 2) },
  survey_outlines: { fillOpacity: 0.05, lineWidth: byZoom(5, 1.2, 12, 2.2), dash: [3, 2] },
  faults: { fillOpacity: 0.12, lineWidth: byZoom(5, 1.6, 12, 3.2) },
  bathymetry: { fillOpacity: 0.08, lineWidth: byZoom(5, 0.8, 12, 1.4) },
  other: { fillOpacity: 0.14, lineWidth: byZoom(5, 1.2, 12, 2) },
};

/** Layer ids of one uploaded layer, one per drawing, so the browser test and the panel can find them. */
export function referenceLayerIds(layerId: string) {
  const s = referenceSourceId(layerId);
  return {
    fill: `${s}-fill`,
    outline: `${s}-outline`,
    line: `${s}-line`,
    point: `${s}-point`,
    label: `${s}-label`,
    lineLabel: `${s}-line-label`,
    pointLabel: `${s}-point-label`,
  };
}

/**
 * The vector source of one uploaded layer, from the team tile endpoint.
 * @example referenceSource('http://127.0.0.1:8080', teamId, layerId, 3).tiles[0] // '…/tiles/reference-<id>/{z}/{x}/{y}.mvt?v=3'
 */
export function referenceSource(
  origin: string,
  teamId: string,
  layerId: string,
  tileVersion: number,
): SourceSpecification & { tiles: string[] } {
  return {
    type: 'vector',
    tiles: [teamTileUrl(origin, teamId, referenceSourceId(layerId), tileVersion)],
    minzoom: 0,
    maxzoom: TEAM_TILES_MAX_ZOOM,
  };
}

/**
 * The map layers of one uploaded layer in its own colour: fill and outline for polygons, a line for lines,
 * circles for points, and the `name` property (when a feature has one) as a label: at a point inside each
 * area, along each line, beside each point. Only the families the
 * layer holds are drawn; a switched-off layer stays in the style with `visibility: none`.
 * @example referenceLayerSpecs(layer, LIGHT_PALETTE, true).map((l) => l.type) // ['fill', 'line', 'symbol'] for lease blocks
 */
export function referenceLayerSpecs(
  layer: Pick<ReferenceLayer, 'id' | 'kind' | 'color' | 'geometryTypes'>,
  c: AtlasPalette,
  visible: boolean,
): LayerSpecification[] {
  const source = referenceSourceId(layer.id);
  const ids = referenceLayerIds(layer.id);
  const families = geometryFamilies(layer.geometryTypes);
  const k = KIND_STYLE[layer.kind] ?? KIND_STYLE.other;
  const common = { source, 'source-layer': REFERENCE_SOURCE_LAYER } as const;
  const dash = k.dash ? { 'line-dasharray': k.dash } : {};
  const labelPaint = { 'text-color': c.label, 'text-halo-color': c.labelHalo, 'text-halo-width': 1.4 };
  const out: LayerSpecification[] = [];

  if (families.includes('polygon')) {
    out.push(
      {
        ...common,
        id: ids.fill,
        type: 'fill',
        filter: isFamily('polygon'),
        paint: { 'fill-color': layer.color, 'fill-opacity': k.fillOpacity },
      },
      {
        ...common,
        id: ids.outline,
        type: 'line',
        filter: isFamily('polygon'),
        layout: { 'line-join': 'round' },
        paint: { 'line-color': layer.color, 'line-width': k.lineWidth, ...dash },
      },
    );
  }
  if (families.includes('line')) {
    out.push({
      ...common,
      id: ids.line,
      type: 'line',
      filter: isFamily('line'),
      layout: { 'line-join': 'round', 'line-cap': 'round' },
      paint: { 'line-color': layer.color, 'line-width': k.lineWidth, ...dash },
    });
  }
  if (families.includes('point')) {
    out.push({
      ...common,
      id: ids.point,
      type: 'circle',
      filter: isFamily('point'),
      paint: {
        'circle-radius': byZoom(5, 3.5, 12, 5.5),
        'circle-color': layer.color,
        'circle-stroke-color': c.wellStroke,
        'circle-stroke-width': 1.2,
      },
    });
  }
  const label = { 'text-field': nameOf, 'text-font': [LABEL_FONT], 'text-optional': true };
  if (families.includes('polygon')) {
    // From the server's label points, not the polygons: one name per area, not one per tile it crosses.
    out.push({
      source,
      'source-layer': REFERENCE_LABEL_SOURCE_LAYER,
      id: ids.label,
      type: 'symbol',
      minzoom: 6,
      layout: { ...label, 'text-size': 11.5, 'text-max-width': 8, 'text-letter-spacing': 0.03 },
      paint: labelPaint,
    });
  }
  if (families.includes('point')) {
    out.push({
      ...common,
      id: ids.pointLabel,
      type: 'symbol',
      minzoom: 6,
      filter: isFamily('point'),
      layout: { ...label, 'text-size': 11, 'text-anchor': 'left', 'text-offset': [0.8, 0] },
      paint: labelPaint,
    });
  }
  if (families.includes('line')) {
    out.push({
      ...common,
      id: ids.lineLabel,
      type: 'symbol',
      minzoom: 6,
      filter: isFamily('line'),
      layout: { ...label, 'text-size': 10.5, 'symbol-placement': 'line' },
      paint: labelPaint,
    });
  }
  return out.map((l) => ({ ...l, layout: { ...(l.layout ?? {}), visibility: visible ? 'visible' : 'none' } })) as LayerSpecification[];
}
