import { validateStyleMin, type StyleSpecification } from '@maplibre/maplibre-gl-style-spec';
import { describe, expect, it } from 'vitest';
import type { Surface } from '@shared/schemas/surfaces';
import {
  SURFACE_LAYERS,
  SURFACE_SOURCES,
  contourFeatures,
  imageCoordinates,
  plannedFeatures,
  residualLimit,
  surfaceStyle,
  wellFeatures,
} from './surfaceStyle';

const base: StyleSpecification = {
  version: 8,
  glyphs: 'http://127.0.0.1/tiles/glyphs/{fontstack}/{range}.pbf',
  center: [10, 10],
  zoom: 4,
  sources: {},
  layers: [{ id: 'basemap-sea', type: 'background', paint: { 'background-color': '#dde' } }],
};

const contours: Surface['contours'] = {
  type: 'FeatureCollection',
  features: [
    {
      type: 'Feature',
      properties: { value: 2450, label: '2450 m' },
      geometry: {
        type: 'MultiPolygon',
        coordinates: [
          [
            [
              [0, 0],
              [1, 0],
              [1, 1],
              [0, 0],
            ],
          ],
        ],
      },
    },
  ],
};

describe('imageCoordinates', () => {
  it('turns [SW, SE, NE, NW] into MapLibre’s [top-left, top-right, bottom-right, bottom-left]', () => {
    expect(
      imageCoordinates([
        [-101.1, -32.6],
        [-100.9, -32.6],
        [-100.9, -32.4],
        [-101.1, -32.4],
      ]),
    ).toEqual([
      [-101.1, -32.4],
      [-100.9, -32.4],
      [-100.9, -32.6],
      [-101.1, -32.6],
    ]);
  });
});

describe('contourFeatures', () => {
  it('labels contours in the reader’s unit', () => {
    const ft = contourFeatures(contours, (m) => `${Math.round(m / 0.3048)} ft`);
    expect(ft.features[0].properties).toMatchObject({ value: 2450, text: '8038 ft' }); // 2450 / 0.3048 = 8038.06
  });
});

describe('residualLimit', () => {
  it('rounds the 90th percentile of the absolute residuals up to half a power of ten', () => {
    // R-7 quantile (Hyndman & Fan 1996, Am. Stat. 50:361): 23 + 0.9·(41 − 23) = 39.2 → 40.
    expect(residualLimit([{ residual: -23 }, { residual: 41 }, { residual: null }])).toBe(40);
    // Nine wells within 10 m and one 1,000 m outlier: 10 + 0.1·990 = 109 → 150, not 1,000.
    expect(residualLimit([...Array.from({ length: 9 }, (_, k) => ({ residual: k % 2 ? 10 : -10 })), { residual: 1000 }])).toBe(150);
    expect(residualLimit([{ residual: 120 }])).toBe(150);
    expect(residualLimit([{ residual: null }])).toBe(1);
  });
});

describe('surfaceStyle', () => {
  const style = surfaceStyle({
    base,
    theme: 'light',
    raster: {
      cornersLonLat: [
        [0, 0],
        [1, 0],
        [1, 1],
        [0, 1],
      ],
    },
    contours: contourFeatures(contours, (m) => `${m} m`),
    outline: {
      type: 'Polygon',
      coordinates: [
        [
          [0, 0],
          [1, 0],
          [1, 1],
          [0, 0],
        ],
      ],
    },
    wells: wellFeatures([
      {
        wellId: '00000000-0000-4000-8000-000000000000',
        name: 'AV-1',
        lon: 0.5,
        lat: 0.5,
        value: 2400,
        interpretationVersion: 1,
        residual: 12,
        predicted: 2412,
        looStdDev: 30,
      },
    ]),
    planned: plannedFeatures([{ name: 'AV-9 (planned)', location: { type: 'Point', coordinates: [0.4, 0.6] } }]),
    residualLimitM: 50,
  });

  it('marks the planned wells above the control wells, labelled', () => {
    const ids = style.layers.map((l) => l.id);
    expect(ids.indexOf(SURFACE_LAYERS.planned)).toBeGreaterThan(ids.indexOf(SURFACE_LAYERS.wells));
    const source = style.sources[SURFACE_SOURCES.planned] as unknown as { data: { features: { properties: { name: string } }[] } };
    expect(source.data.features.map((f) => f.properties.name)).toEqual(['AV-9 (planned)']);
  });

  it('is a valid MapLibre style (checked by the style-spec validator)', () => {
    expect(validateStyleMin(style).map((e) => e.message)).toEqual([]);
  });

  it('keeps the basemap underneath, drops its camera, and draws contour outlines as lines with line-placed labels', () => {
    expect(style.layers[0].id).toBe('basemap-sea');
    expect(style.center).toBeUndefined();
    const ids = style.layers.map((l) => l.id);
    expect(ids.indexOf(SURFACE_LAYERS.raster)).toBeLessThan(ids.indexOf(SURFACE_LAYERS.contourLines));
    const labels = style.layers.find((l) => l.id === SURFACE_LAYERS.contourLabels);
    expect(labels?.type).toBe('symbol');
    expect((labels as { layout: Record<string, unknown> }).layout['symbol-placement']).toBe('line');
    expect(style.layers.find((l) => l.id === SURFACE_LAYERS.contourLines)?.type).toBe('line');
  });

  it('has no image layer before a run is shown', () => {
    const empty = surfaceStyle({ base, theme: 'dark', raster: null, contours: null, outline: null, wells: null, residualLimitM: 1 });
    expect(empty.layers.some((l) => l.id === SURFACE_LAYERS.raster)).toBe(false);
    expect(validateStyleMin(empty).map((e) => e.message)).toEqual([]);
  });
});
