import type { ExpressionSpecification, LayerSpecification, StyleSpecification } from '@maplibre/maplibre-gl-style-spec';
import type { Feature, FeatureCollection, MultiPolygon, Point, Polygon } from 'geojson';
import type { Surface } from '@shared/schemas/surfaces';
import { quantile } from 'd3';
import { LABEL_FONT, LABEL_FONT_STRONG } from './atlasLayers';
import { RESIDUAL_RAMP } from '@/plots/surfaceRamp';

/** Source and layer ids of the surface screen, bottom to top. The browser test queries them. */
export const SURFACE_SOURCES = {
  raster: 'surface-raster',
  contours: 'surface-contours',
  outline: 'surface-prospect',
  wells: 'surface-wells',
  planned: 'surface-planned',
} as const;
export const SURFACE_LAYERS = {
  raster: 'surface-raster',
  contourLines: 'surface-contour-lines',
  contourLabels: 'surface-contour-labels',
  outline: 'surface-prospect-line',
  wells: 'surface-wells',
  wellLabels: 'surface-well-labels',
  planned: 'surface-planned',
  plannedLabels: 'surface-planned-labels',
} as const;

type LonLat = [number, number];

/**
 * MapLibre wants an image's corners as top-left, top-right, bottom-right, bottom-left; the grid gives
 * [south-west, south-east, north-east, north-west].
 * @example imageCoordinates([[0, 0], [1, 0], [1, 1], [0, 1]]) // [[0, 1], [1, 1], [1, 0], [0, 0]]
 */
export function imageCoordinates(cornersLonLat: readonly (readonly [number, number])[]): [LonLat, LonLat, LonLat, LonLat] {
  if (cornersLonLat.length !== 4) throw new Error(`A grid has 4 corners, got ${cornersLonLat.length}`);
  const [sw, se, ne, nw] = cornersLonLat.map((c) => [c[0], c[1]] as LonLat);
  return [nw, ne, se, sw];
}

/**
 * Contour features with a `text` property in the reader's depth unit (the server labels in metres).
 * @example contourFeatures(surface.contours, (m) => `${m * 3.28084} ft`)[0].properties.text // '8038 ft'
 */
export function contourFeatures(contours: Surface['contours'], label: (valueM: number) => string): FeatureCollection<MultiPolygon> {
  const features = (contours.features as Feature<MultiPolygon, { value: number; label?: string }>[]).map((f) => ({
    ...f,
    properties: { ...f.properties, text: label(f.properties.value) },
  }));
  return { type: 'FeatureCollection', features };
}

/**
 * The wells of a run as points carrying name and residual, for the circles and their labels.
 * @example wellFeatures(surface.wells).features[0].properties.residual // 12.4
 */
export function wellFeatures(wells: Surface['wells']): FeatureCollection<Point, { name: string; residual: number | null }> {
  return {
    type: 'FeatureCollection',
    features: wells.map((w) => ({
      type: 'Feature',
      geometry: { type: 'Point', coordinates: [w.lon, w.lat] },
      properties: { name: w.name, residual: w.residual },
    })),
  };
}

/**
 * The prospect's planned wells as points, so the map shows where the values in the planned-well table are read.
 * @example plannedFeatures([{ name: 'Ostrel Ridge-1 (planned)', location: { type: 'Point', coordinates: [-101.3, -32.6] } }]).features.length // 1
 */
export function plannedFeatures(planned: readonly { name: string; location: Point }[]): FeatureCollection<Point, { name: string }> {
  return {
    type: 'FeatureCollection',
    features: planned.map((w) => ({ type: 'Feature', geometry: w.location, properties: { name: w.name } })),
  };
}

/**
 * The residual scale's half-width: the 90th percentile of the absolute residuals, so one outlier well does not
 * wash out all the others (wells beyond it get the end colour), rounded up to half a power of ten for the
 * legend (never 0, so the colour scale keeps a span).
 * @example residualLimit([{ residual: -23 }, { residual: 41 }]) // 40
 */
export function residualLimit(wells: readonly { residual: number | null }[]): number {
  const abs = wells.flatMap((w) => (w.residual === null ? [] : [Math.abs(w.residual)])).sort((a, b) => a - b);
  const biggest = quantile(abs, 0.9) ?? 0;
  if (biggest === 0) return 1;
  const step = 10 ** Math.floor(Math.log10(biggest));
  return Math.ceil(biggest / (step / 2)) * (step / 2);
}

const EMPTY: FeatureCollection = { type: 'FeatureCollection', features: [] };

export interface SurfaceStyleInput {
  base: StyleSpecification;
  theme: 'light' | 'dark';
  /**
   * Where the coloured grid goes; null before a run is shown. The pixels are handed to the image source at run
   * time (`updateImage`), because the page's content policy lets no data: or blob: URL be fetched.
   */
  raster: { cornersLonLat: readonly (readonly [number, number])[] } | null;
  contours: FeatureCollection<MultiPolygon> | null;
  outline: Polygon | null;
  wells: FeatureCollection<Point> | null;
  /** The prospect's planned wells; absent or null draws none. */
  planned?: FeatureCollection<Point> | null;
  residualLimitM: number;
}

const INK = {
  light: { text: '#1B262C', halo: '#F6F8F9', contour: '#1B262C', outline: '#B0306A' },
  dark: { text: '#EEF2F4', halo: '#121A1E', contour: '#F1F4F5', outline: '#F08BB0' },
};

/**
 * The whole map style of the surface screen: the basemap, then the coloured grid, contours, the prospect
 * outline and the wells coloured by residual. The basemap's camera is dropped so a
 * change never moves the map.
 * @example map.setStyle(surfaceStyle({ base, theme: 'light', raster: null, contours: null, outline, wells: null, residualLimitM: 1 }));
 */
export function surfaceStyle(input: SurfaceStyleInput): StyleSpecification {
  const { center: _c, zoom: _z, bearing: _b, pitch: _p, ...rest } = input.base;
  const ink = INK[input.theme];
  const sources: StyleSpecification['sources'] = {
    ...input.base.sources,
    [SURFACE_SOURCES.contours]: { type: 'geojson', data: input.contours ?? EMPTY },
    [SURFACE_SOURCES.outline]: {
      type: 'geojson',
      data: input.outline ? { type: 'Feature', geometry: input.outline, properties: {} } : EMPTY,
    },
    [SURFACE_SOURCES.wells]: { type: 'geojson', data: input.wells ?? EMPTY },
    [SURFACE_SOURCES.planned]: { type: 'geojson', data: input.planned ?? EMPTY },
  };
  const layers: LayerSpecification[] = [];
  if (input.raster) {
    sources[SURFACE_SOURCES.raster] = { type: 'image', coordinates: imageCoordinates(input.raster.cornersLonLat) };
    layers.push({
      id: SURFACE_LAYERS.raster,
      type: 'raster',
      source: SURFACE_SOURCES.raster,
      paint: { 'raster-opacity': 0.82, 'raster-fade-duration': 0 },
    });
  }
  const lim = input.residualLimitM;
  const residualColour: ExpressionSpecification = [
    'case',
    ['==', ['get', 'residual'], null],
    '#9AA5AB',
    ['interpolate', ['linear'], ['get', 'residual'], -lim, RESIDUAL_RAMP[0][1], 0, RESIDUAL_RAMP[1][1], lim, RESIDUAL_RAMP[2][1]],
  ];
  layers.push(
    {
      id: SURFACE_LAYERS.contourLines,
      type: 'line',
      source: SURFACE_SOURCES.contours,
      paint: { 'line-color': ink.contour, 'line-opacity': 0.7, 'line-width': 1 },
    },
    {
      id: SURFACE_LAYERS.contourLabels,
      type: 'symbol',
      source: SURFACE_SOURCES.contours,
      layout: {
        'symbol-placement': 'line',
        'symbol-spacing': 280,
        'text-field': ['get', 'text'],
        'text-font': [LABEL_FONT],
        'text-size': 11,
        'text-max-angle': 35,
      },
      paint: { 'text-color': ink.text, 'text-halo-color': ink.halo, 'text-halo-width': 1.6 },
    },
    {
      id: SURFACE_LAYERS.outline,
      type: 'line',
      source: SURFACE_SOURCES.outline,
      paint: { 'line-color': ink.outline, 'line-width': 2.5, 'line-dasharray': [3, 2] },
    },
    {
      id: SURFACE_LAYERS.wells,
      type: 'circle',
      source: SURFACE_SOURCES.wells,
      paint: { 'circle-radius': 6, 'circle-color': residualColour, 'circle-stroke-color': '#1B262C', 'circle-stroke-width': 1.2 },
    },
    {
      id: SURFACE_LAYERS.wellLabels,
      type: 'symbol',
      source: SURFACE_SOURCES.wells,
      minzoom: 8,
      layout: {
        'text-field': ['get', 'name'],
        'text-font': [LABEL_FONT_STRONG],
        'text-size': 11,
        'text-offset': [0, 1.1],
        'text-anchor': 'top',
        'text-optional': true,
      },
      paint: { 'text-color': ink.text, 'text-halo-color': ink.halo, 'text-halo-width': 1.6 },
    },
    // Planned wells as a ring with a dot in the outline's colour, as on the Atlas, always labelled.
    {
      id: SURFACE_LAYERS.planned,
      type: 'circle',
      source: SURFACE_SOURCES.planned,
      paint: { 'circle-radius': 7, 'circle-color': ink.halo, 'circle-stroke-color': ink.outline, 'circle-stroke-width': 2.5 },
    },
    {
      id: SURFACE_LAYERS.plannedLabels,
      type: 'symbol',
      source: SURFACE_SOURCES.planned,
      layout: {
        'text-field': ['get', 'name'],
        'text-font': [LABEL_FONT_STRONG],
        'text-size': 11.5,
        'text-offset': [0, 1.2],
        'text-anchor': 'top',
      },
      paint: { 'text-color': ink.outline, 'text-halo-color': ink.halo, 'text-halo-width': 1.8 },
    },
  );
  return { ...rest, sources, layers: [...input.base.layers, ...layers] };
}
