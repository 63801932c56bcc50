/**
 * Natural Earth geometry from world-atlas, made plane and grouped into our layers for one scale.
 */
import { createRequire } from 'node:module';
import { area } from '@turf/turf';
import type { Feature, FeatureCollection, MultiLineString, MultiPolygon, Point, Polygon, Position } from 'geojson';
import { feature, mesh } from 'topojson-client';
import type { GeometryCollection, Topology } from 'topojson-specification';
import { labelPoint } from './labelPoint';
import { planarCoast, planarLines, planarPolygon } from './planarize';

export type Scale = '110m' | '50m' | '10m';

type CountriesTopology = Topology<{ countries: GeometryCollection<{ name: string }>; land: GeometryCollection }>;

export interface ScaleLayers {
  land: FeatureCollection<MultiPolygon>;
  coast: FeatureCollection<MultiLineString>;
  borders: FeatureCollection<MultiLineString>;
}

/** South of this, polygons are Antarctica and its islands: the 10m Antarctica is cut short, so 50m stands in. */
const ANTARCTIC_LAT = -60;

const require = createRequire(import.meta.url);
const cache = new Map<Scale, CountriesTopology>();

function topology(scale: Scale): CountriesTopology {
  let t = cache.get(scale);
  if (!t) {
    t = require(`world-atlas/countries-${scale}.json`) as CountriesTopology;
    cache.set(scale, t);
  }
  return t;
}

/** The polygons of a (multi)polygon geometry as they are in world-atlas (spherical rings). */
function polygonsOf(geometry: Polygon | MultiPolygon | null | undefined): Position[][][] {
  if (!geometry) return [];
  return geometry.type === 'Polygon' ? [geometry.coordinates] : geometry.coordinates;
}

function landPolygons(scale: Scale): Position[][][] {
  const t = topology(scale);
  const fc = feature(t, t.objects.land);
  return fc.features.flatMap((f) => polygonsOf(f.geometry as Polygon | MultiPolygon));
}

const minLatitude = (ring: readonly Position[]) => ring.reduce((m, p) => Math.min(m, p[1]), 90);

/**
 * Land, coast and country borders at one Natural Earth scale, in plane coordinates ready for tiling.
 * At 10m the Antarctic polygons come from 50m (the 10m Antarctica does not close).
 * @example loadScale('110m').land.features[0].geometry.coordinates.length // ≈ 125 polygons
 */
export function loadScale(scale: Scale): ScaleLayers {
  let raw = landPolygons(scale);
  if (scale === '10m') {
    const antarctic = landPolygons('50m').filter((p) => minLatitude(p[0]) < ANTARCTIC_LAT);
    raw = [...raw.filter((p) => minLatitude(p[0]) >= ANTARCTIC_LAT), ...antarctic];
  }
  const polygons = raw.map(planarPolygon).filter((p): p is Position[][] => p !== null);
  const coast = raw.flatMap((p) => p.flatMap(planarCoast));

  const t = topology(scale);
  const borderMesh = mesh(t, t.objects.countries, (a, b) => a !== b);
  const borders = planarLines(borderMesh.coordinates);

  const one = <G extends MultiPolygon | MultiLineString>(geometry: G): FeatureCollection<G> => ({
    type: 'FeatureCollection',
    features: [{ type: 'Feature', properties: {}, geometry }],
  });
  return {
    land: one({ type: 'MultiPolygon', coordinates: polygons }),
    coast: one({ type: 'MultiLineString', coordinates: coast }),
    borders: one({ type: 'MultiLineString', coordinates: borders }),
  };
}

export interface CountryLabelProps {
  name: string;
  /** 1 for the largest country by area. */
  rank: number;
  area_km2: number;
  /** First zoom at which the country is large enough on screen to carry its name. */
  minzoom: number;
}

/** On-screen size a country needs before its name is drawn. */
const LABEL_MIN_PX = 18; // common practice, no source
/** Web Mercator: 256 px span the equator (40 075 km) at zoom 0 (WGS 84 equatorial circumference). */
const EQUATOR_KM = 40_075.017;

/**
 * One label point per country, inside its largest polygon, at the 50m scale (stable across zooms, and
 * well inside the coast at every scale); countries that only 10m has come from 10m.
 * @example countryLabels().features.find((f) => f.properties.name === 'Chile')?.geometry.coordinates // ≈ [-70, -30]
 */
export function countryLabels(): FeatureCollection<Point, CountryLabelProps> {
  const byName = new Map<string, Feature<Polygon | MultiPolygon, { name: string }>>();
  for (const scale of ['50m', '10m'] as const) {
    const t = topology(scale);
    for (const f of feature(t, t.objects.countries).features) {
      if (!byName.has(f.properties.name) && f.geometry)
        byName.set(f.properties.name, f as Feature<Polygon | MultiPolygon, { name: string }>);
    }
  }
  const rows = [...byName.values()].flatMap((f) => {
    const parts = polygonsOf(f.geometry)
      .map(planarPolygon)
      .filter((p): p is Position[][] => p !== null)
      .map((p) => ({ rings: p, m2: area({ type: 'Polygon', coordinates: p }) }));
    if (parts.length === 0) return [];
    const largest = parts.reduce((a, b) => (b.m2 > a.m2 ? b : a));
    const [lon, lat] = labelPoint(largest.rings);
    const areaKm2 = parts.reduce((s, p) => s + p.m2, 0) / 1e6;
    return [{ name: f.properties.name, lon: ((((lon + 180) % 360) + 360) % 360) - 180, lat, areaKm2 }];
  });
  // Largest first, ties by name, so ranks and feature order are the same on every build.
  rows.sort((a, b) => b.areaKm2 - a.areaKm2 || a.name.localeCompare(b.name, 'en'));
  return {
    type: 'FeatureCollection',
    features: rows.map((r, i) => ({
      type: 'Feature',
      properties: { name: r.name, rank: i + 1, area_km2: Math.round(r.areaKm2), minzoom: labelMinZoom(r.areaKm2) },
      geometry: { type: 'Point', coordinates: [round6(r.lon), round6(r.lat)] },
    })),
  };
}

/**
 * The zoom at which a country of this area spans LABEL_MIN_PX on screen, between 1 and 6 (by 6 every
 * country may try; label collision then decides).
 * @example labelMinZoom(17_000_000) // 1
 */
export function labelMinZoom(areaKm2: number): number {
  const pxAtZ0 = (Math.sqrt(areaKm2) * 256) / EQUATOR_KM;
  return Math.min(6, Math.max(1, Math.ceil(Math.log2(LABEL_MIN_PX / pxAtZ0))));
}

const round6 = (v: number) => Math.round(v * 1e6) / 1e6;
