/**
 * The basemap's vector layers: one definition used by the build (what goes in the tiles), the style
 * (what it draws) and the TileJSON/archive metadata (what a client can discover).
 */

export const BASEMAP_LAYERS = {
  land: { id: 'land', description: 'Land areas, lakes cut out.', fields: {} },
  coast: { id: 'coast', description: 'Coastlines as lines, from the land polygon boundaries.', fields: {} },
  borders: { id: 'borders', description: 'Land boundaries between countries.', fields: {} },
  countryLabel: {
    id: 'country_label',
    description: 'One label point per country, inside its largest part.',
    fields: {
      name: 'String: the country name.',
      rank: 'Number: 1 for the largest country by area, larger numbers for smaller ones.',
      area_km2: 'Number: the country area in km².',
    },
  },
  seaLabel: {
    id: 'sea_label',
    description: 'Label points for oceans and the larger seas.',
    fields: { name: 'String: the water body name.', kind: 'String: ocean or sea.' },
  },
} as const;

export const BASEMAP_MIN_ZOOM = 0;
export const BASEMAP_MAX_ZOOM = 8;
export const BASEMAP_ATTRIBUTION = 'Natural Earth (public domain) via world-atlas';
export const BASEMAP_NAME = 'Porelith basemap';
/** Web Mercator's latitude limit, atan(sinh(π)) in degrees. */
const MERCATOR_MAX_LAT = 85.0511287798;
/** [west, south, east, north]: the whole Web Mercator world. */
export const BASEMAP_BOUNDS: [number, number, number, number] = [-180, -MERCATOR_MAX_LAT, 180, MERCATOR_MAX_LAT];

/** The `vector_layers` entry of TileJSON 3.0 and of the archive metadata. */
export function vectorLayers() {
  return Object.values(BASEMAP_LAYERS).map((l) => ({
    id: l.id,
    description: l.description,
    minzoom: BASEMAP_MIN_ZOOM,
    maxzoom: BASEMAP_MAX_ZOOM,
    fields: { ...l.fields },
  }));
}
