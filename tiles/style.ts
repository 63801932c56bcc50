/**
 * Porelith's basemap style, "chart": a calm sea chart for screening prospects. Pale sea with a faint
 * graticule, warm-grey land, a thin coast, dashed borders, country names in Inter SemiBold and water
 * names in Inter Italic. Everything it loads comes from the origin passed in: no glyph or sprite server.
 */
import type { ExpressionSpecification, StyleSpecification } from '@maplibre/maplibre-gl-style-spec';
import type { FeatureCollection, LineString } from 'geojson';
import { BASEMAP_FONTS } from './fonts';
import { BASEMAP_ATTRIBUTION, BASEMAP_BOUNDS, BASEMAP_LAYERS, BASEMAP_MAX_ZOOM, BASEMAP_MIN_ZOOM } from './layers';

export interface BasemapStyleOptions {
  dark?: boolean;
  /** Where the tiles router is mounted on the origin. */
  mountPath?: string;
}

interface Palette {
  sea: string;
  graticule: string;
  land: string;
  coast: string;
  border: string;
  countryText: string;
  countryHalo: string;
  seaText: string;
  seaHalo: string;
}

const LIGHT: Palette = {
  sea: '#dbe7ec',
  graticule: '#c2d4dc',
  land: '#ebe7e0',
  coast: '#6d8794',
  border: '#9a8d7e',
  countryText: '#3d3933',
  countryHalo: '#ebe7e0',
  seaText: '#5a7c8c',
  seaHalo: '#dbe7ec',
};

const DARK: Palette = {
  sea: '#111d26',
  graticule: '#1c2f3b',
  land: '#2a2e32',
  coast: '#6b8b99',
  border: '#7a6e61',
  countryText: '#ddd7cc',
  countryHalo: '#2a2e32',
  seaText: '#7ea2b2',
  seaHalo: '#111d26',
};

export const BASEMAP_SOURCE = 'basemap';
const GRATICULE_SOURCE = 'basemap-graticule';

/**
 * A MapLibre style (version 8) for the offline basemap, with absolute URLs on `origin`.
 * @example
 * const style = basemapStyle('http://127.0.0.1:8080', { dark: true });
 * style.sources.basemap // { type: 'vector', tiles: ['http://127.0.0.1:8080/tiles/basemap/{z}/{x}/{y}.mvt'], … }
 */
export function basemapStyle(origin: string, opts: BasemapStyleOptions = {}): StyleSpecification {
  if (!/^https?:\/\/[^/?#\s]+\/?$/.test(origin)) throw new Error(`basemapStyle: origin must look like http://host:port, got "${origin}".`);
  const base = `${origin.replace(/\/$/, '')}${(opts.mountPath ?? '/tiles').replace(/\/$/, '')}`;
  const c = opts.dark ? DARK : LIGHT;
  const fontUrl = (file: string) => `${base}/fonts/${file}`;
  const byZoom = (...stops: number[]): ExpressionSpecification => ['interpolate', ['linear'], ['zoom'], ...stops];

  return {
    version: 8,
    name: opts.dark ? 'Porelith chart (dark)' : 'Porelith chart',
    metadata: { 'porelith:theme': opts.dark ? 'dark' : 'light' },
    center: [0, 20],
    zoom: 1.5,
    'font-faces': Object.fromEntries(Object.values(BASEMAP_FONTS).map((f) => [f.stack, fontUrl(f.file)])),
    sources: {
      [BASEMAP_SOURCE]: {
        type: 'vector',
        tiles: [`${base}/basemap/{z}/{x}/{y}.mvt`],
        minzoom: BASEMAP_MIN_ZOOM,
        maxzoom: BASEMAP_MAX_ZOOM,
        bounds: BASEMAP_BOUNDS,
        attribution: BASEMAP_ATTRIBUTION,
      },
      [GRATICULE_SOURCE]: { type: 'geojson', data: graticule() },
    },
    layers: [
      { id: 'basemap-sea', type: 'background', paint: { 'background-color': c.sea } },
      {
        id: 'basemap-graticule',
        type: 'line',
        source: GRATICULE_SOURCE,
        filter: ['any', ['get', 'major'], ['>=', ['zoom'], 3]],
        paint: { 'line-color': c.graticule, 'line-width': byZoom(0, 0.5, 6, 0.8) },
      },
      {
        id: 'basemap-land',
        type: 'fill',
        source: BASEMAP_SOURCE,
        'source-layer': BASEMAP_LAYERS.land.id,
        paint: { 'fill-color': c.land, 'fill-antialias': true },
      },
      {
        id: 'basemap-coast',
        type: 'line',
        source: BASEMAP_SOURCE,
        'source-layer': BASEMAP_LAYERS.coast.id,
        layout: { 'line-join': 'round', 'line-cap': 'round' },
        paint: { 'line-color': c.coast, 'line-width': byZoom(0, 0.4, 4, 0.7, 8, 1.2) },
      },
      {
        id: 'basemap-borders',
        type: 'line',
        source: BASEMAP_SOURCE,
        'source-layer': BASEMAP_LAYERS.borders.id,
        minzoom: 1,
        layout: { 'line-join': 'round' },
        paint: { 'line-color': c.border, 'line-width': byZoom(1, 0.5, 5, 0.9, 8, 1.3), 'line-dasharray': [3, 2] },
      },
      {
        id: 'basemap-sea-names',
        type: 'symbol',
        source: BASEMAP_SOURCE,
        'source-layer': BASEMAP_LAYERS.seaLabel.id,
        layout: {
          'text-field': ['get', 'name'],
          'text-font': [BASEMAP_FONTS.italic.stack],
          'text-size': [
            'interpolate',
            ['linear'],
            ['zoom'],
            1,
            ['match', ['get', 'kind'], 'ocean', 11, 10],
            6,
            ['match', ['get', 'kind'], 'ocean', 15, 13],
          ],
          'text-letter-spacing': 0.12,
          'text-max-width': 6,
          'text-line-height': 1.3,
        },
        paint: { 'text-color': c.seaText, 'text-halo-color': c.seaHalo, 'text-halo-width': 1 },
      },
      {
        id: 'basemap-country-names',
        type: 'symbol',
        source: BASEMAP_SOURCE,
        'source-layer': BASEMAP_LAYERS.countryLabel.id,
        layout: {
          'text-field': ['get', 'name'],
          'text-font': [BASEMAP_FONTS.semibold.stack],
          // Larger countries get larger type and win collisions (rank 1 is the largest).
          'text-size': [
            'interpolate',
            ['linear'],
            ['zoom'],
            1,
            ['step', ['get', 'rank'], 12, 8, 10.5],
            4,
            ['step', ['get', 'rank'], 14, 30, 12, 80, 11],
            8,
            ['step', ['get', 'rank'], 17, 60, 15, 120, 13],
          ],
          'symbol-sort-key': ['get', 'rank'],
          'text-max-width': 7,
          'text-letter-spacing': 0.03,
          'text-padding': 4,
        },
        paint: { 'text-color': c.countryText, 'text-halo-color': c.countryHalo, 'text-halo-width': 1.4, 'text-halo-blur': 0.4 },
      },
    ],
  };
}

/** Meridians and parallels every 10°, those on 30° marked major; straight lines are exact in Mercator. */
function graticule(): FeatureCollection<LineString, { major: boolean }> {
  const features: FeatureCollection<LineString, { major: boolean }>['features'] = [];
  for (let lon = -180; lon < 180; lon += 10) {
    features.push({
      type: 'Feature',
      properties: { major: lon % 30 === 0 },
      geometry: {
        type: 'LineString',
        coordinates: [
          [lon, BASEMAP_BOUNDS[1]],
          [lon, BASEMAP_BOUNDS[3]],
        ],
      },
    });
  }
  for (let lat = -80; lat <= 80; lat += 10) {
    features.push({
      type: 'Feature',
      properties: { major: lat % 30 === 0 },
      geometry: {
        type: 'LineString',
        coordinates: [
          [-180, lat],
          [180, lat],
        ],
      },
    });
  }
  return { type: 'FeatureCollection', features };
}
