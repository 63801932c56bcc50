import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { area, bbox, booleanPointInPolygon } from '@turf/turf';
import { geoArea } from 'd3';
import type { Feature, MultiPolygon, Polygon, Position } from 'geojson';
import { feature } from 'topojson-client';
import type { GeometryCollection, Topology } from 'topojson-specification';
import { countryLabels, labelMinZoom, loadScale, type Scale } from '../../../tiles/naturalEarth';
import { planarPolygon, unwrapLongitudes } from '../../../tiles/planarize';
import { seaLabels } from '../../../tiles/seaLabels';

// Reference for areas: d3-geo's spherical geoArea, the renderer world-atlas is drawn for, on the raw
// (spherical) geometry; turf's area on our plane geometry must agree. Same sphere for both:
// turf's mean Earth radius 6 371 008.8 m (IUGG mean radius R1).
const R_KM = 6371.0088;
const sphericalKm2 = (g: Polygon | MultiPolygon) => geoArea({ type: 'Feature', properties: {}, geometry: g }) * R_KM ** 2;
const planarKm2 = (g: Polygon | MultiPolygon) => area(g) / 1e6;

type CountriesTopology = Topology<{ countries: GeometryCollection<{ name: string }>; land: GeometryCollection }>;
const require = createRequire(import.meta.url);
const topo = (scale: Scale) => require(`world-atlas/countries-${scale}.json`) as CountriesTopology;
const countries = (scale: Scale) =>
  feature(topo(scale), topo(scale).objects.countries).features as Feature<Polygon | MultiPolygon, { name: string }>[];
const country = (scale: Scale, name: string) => countries(scale).find((f) => f.properties.name === name)!;

function planarMulti(g: Polygon | MultiPolygon): MultiPolygon {
  const polys = g.type === 'Polygon' ? [g.coordinates] : g.coordinates;
  return { type: 'MultiPolygon', coordinates: polys.map(planarPolygon).filter((p): p is Position[][] => p !== null) };
}

describe('unwrapLongitudes', () => {
  it('continues across the antimeridian and counts a full turn', () => {
    expect(
      unwrapLongitudes([
        [179, 0],
        [-179, 1],
        [-178, 2],
      ]),
    ).toEqual({
      path: [
        [179, 0],
        [181, 1],
        [182, 2],
      ],
      turns: 1,
    });
    expect(
      unwrapLongitudes([
        [170, 0],
        [-170, 0],
        [170, 1],
      ]).turns,
    ).toBe(0);
  });
});

describe('planarPolygon keeps the area d3-geo measures on the sphere', () => {
  it.each([
    ['50m', 'Antarctica'], // a ring around the pole, plus a degenerate ring on −90°
    ['110m', 'Antarctica'],
    ['50m', 'Russia'], // crosses the antimeridian at Chukotka
    ['10m', 'Fiji'], // islands astride the antimeridian
    ['50m', 'France'], // an ordinary multipolygon, as a control
  ] as const)('%s %s', (scale, name) => {
    const g = country(scale, name).geometry;
    const expected = sphericalKm2(g);
    expect(Math.abs(planarKm2(planarMulti(g)) - expected) / expected).toBeLessThan(0.005);
  });

  it('leaves no edge longer than half the world in the tiled land at any scale, but along a pole', () => {
    for (const scale of ['110m', '50m', '10m'] as const) {
      let long = 0;
      for (const poly of loadScale(scale).land.features[0].geometry.coordinates) {
        for (const ring of poly) {
          for (let i = 1; i < ring.length; i++) {
            const onPole = Math.abs(ring[i][1]) === 90 && Math.abs(ring[i - 1][1]) === 90;
            if (!onPole && Math.abs(ring[i][0] - ring[i - 1][0]) > 180) long++;
          }
        }
      }
      expect(long).toBe(0);
    }
  });

  it('gives the 10m land its Antarctica from 50m, so the continent closes', () => {
    const land10 = loadScale('10m').land.features[0].geometry;
    const south = land10.coordinates.filter((p) => Math.min(...p[0].map((q) => q[1])) < -89.9);
    expect(south).toHaveLength(1); // one polygon reaches the pole: the 50m Antarctica
    const land50 = feature(topo('50m'), topo('50m').objects.land).features[0].geometry as MultiPolygon;
    const mainland50 = land50.coordinates.find((p) => p.some((r) => r.some((q) => q[1] < -89.9)))!;
    const expected = sphericalKm2({ type: 'Polygon', coordinates: mainland50 });
    const got = planarKm2({ type: 'Polygon', coordinates: south[0] });
    expect(Math.abs(got - expected) / expected).toBeLessThan(0.005);
  });
});

describe('countryLabels', () => {
  const labels = countryLabels().features;

  it('puts every label inside its own country (checked with turf at 50m, else 10m)', () => {
    const shapes = new Map<string, MultiPolygon>();
    for (const scale of ['10m', '50m'] as const)
      for (const f of countries(scale)) if (f.geometry) shapes.set(f.properties.name, planarMulti(f.geometry));
    expect(labels.length).toBe(shapes.size);
    const outside = labels.filter((l) => {
      const shape = shapes.get(l.properties.name)!;
      const [lon, lat] = l.geometry.coordinates;
      // The plane geometry may run past ±180° (Russia, Fiji): try the label a turn either side too.
      return ![lon, lon + 360, lon - 360].some((x) => booleanPointInPolygon([x, lat], shape));
    });
    expect(outside.map((l) => l.properties.name)).toEqual([]);
  });

  it('ranks by area: Russia is the largest country', () => {
    // Russia's 17.1 million km² is the largest national area (value recalled from memory).
    expect(labels[0].properties).toMatchObject({ name: 'Russia', rank: 1 });
    expect(labels[0].properties.area_km2).toBeGreaterThan(16e6);
    expect(labels.map((l) => l.properties.rank)).toEqual(labels.map((_, i) => i + 1));
  });

  it('starts a name at the zoom where the country spans 18 px in Web Mercator', () => {
    // EPSG:3857 tile pyramid: 156 543.03392804097 m per pixel at zoom 0 (OGC WMTS "GoogleMapsCompatible").
    const pxAt = (areaKm2: number, z: number) => (Math.sqrt(areaKm2) * 1000) / (156_543.03392804097 / 2 ** z);
    for (const areaKm2 of [17e6, 3.3e6, 640_000, 41_000, 10_000, 2.5]) {
      const z = labelMinZoom(areaKm2);
      if (z < 6) expect(pxAt(areaKm2, z)).toBeGreaterThanOrEqual(18);
      if (z > 1) expect(pxAt(areaKm2, z - 1)).toBeLessThan(18);
    }
  });
});

describe('seaLabels', () => {
  it('lie off Natural Earth land at 50m and 10m', () => {
    for (const scale of ['50m', '10m'] as const) {
      const polys = loadScale(scale).land.features[0].geometry.coordinates.map((p) => {
        const poly = { type: 'Polygon' as const, coordinates: p };
        return { poly, box: bbox(poly) };
      });
      const onLand = seaLabels().features.filter((s) => {
        const [lon, lat] = s.geometry.coordinates;
        return polys.some(({ poly, box }) =>
          [lon, lon + 360].some(
            (x) => x >= box[0] && x <= box[2] && lat >= box[1] && lat <= box[3] && booleanPointInPolygon([x, lat], poly),
          ),
        );
      });
      expect(onLand.map((s) => `${scale} ${s.properties.name}`)).toEqual([]);
    }
  });
});
