/**
 * Cuts the basemap layers into Mapbox Vector Tiles, zoom band by zoom band, with geojson-vt + vt-pbf.
 */
import GeoJSONVT, { type LegacyTile, type Options } from 'geojson-vt';
import type { FeatureCollection, Point } from 'geojson';
import { fromGeojsonVt } from 'vt-pbf';
import { BASEMAP_LAYERS } from './layers';
import { loadScale, type Scale } from './naturalEarth';

/** Natural Earth scale per zoom band: coarse data where detail would not show, and fewer bytes. */
export const ZOOM_BANDS: ReadonlyArray<{ scale: Scale; minZoom: number; maxZoom: number }> = [
  { scale: '110m', minZoom: 0, maxZoom: 2 },
  { scale: '50m', minZoom: 3, maxZoom: 5 },
  { scale: '10m', minZoom: 6, maxZoom: 8 },
];

const EXTENT = 4096;
const TILER: Options = { extent: EXTENT, buffer: 64, tolerance: 3, indexMaxZoom: 0 };

export interface CutTile {
  z: number;
  x: number;
  y: number;
  data: Uint8Array;
}

type LabelCollection = FeatureCollection<Point, { minzoom: number }>;

/**
 * Every non-empty tile from zoom 0 to the last band's max zoom, in a fixed order.
 * Label points go into the tiles from their `minzoom` on; the `minzoom` field itself is not shipped.
 * @example cutTiles(countryLabels(), seaLabels()).length // ≈ 40 000
 */
export function cutTiles(countryLabels: LabelCollection, seaLabels: LabelCollection): CutTile[] {
  const out: CutTile[] = [];
  for (const band of ZOOM_BANDS) {
    const layers = loadScale(band.scale);
    const options = { ...TILER, maxZoom: band.maxZoom };
    const indexes: Array<[string, GeoJSONVT]> = [
      [BASEMAP_LAYERS.land.id, new GeoJSONVT(layers.land, options)],
      [BASEMAP_LAYERS.coast.id, new GeoJSONVT(layers.coast, options)],
      [BASEMAP_LAYERS.borders.id, new GeoJSONVT(layers.borders, options)],
      [BASEMAP_LAYERS.countryLabel.id, new GeoJSONVT(countryLabels, options)],
      [BASEMAP_LAYERS.seaLabel.id, new GeoJSONVT(seaLabels, options)],
    ];
    const visit = (z: number, x: number, y: number) => {
      const found: Record<string, LegacyTile> = {};
      let any = false;
      for (const [name, index] of indexes) {
        const tile = index.getTile(z, x, y);
        if (!tile) continue;
        any = true;
        const kept = isLabelLayer(name) ? labelsFrom(tile, z) : tile;
        if (kept.features.length > 0) found[name] = kept;
      }
      if (!any) return; // nothing here, so nothing in the children either
      if (Object.keys(found).length > 0) out.push({ z, x, y, data: fromGeojsonVt(found, { version: 2, extent: EXTENT }) });
      if (z < band.maxZoom) {
        for (const [dx, dy] of [
          [0, 0],
          [1, 0],
          [0, 1],
          [1, 1],
        ])
          visit(z + 1, 2 * x + dx, 2 * y + dy);
      }
    };
    const n = 2 ** band.minZoom;
    for (let y = 0; y < n; y++) for (let x = 0; x < n; x++) visit(band.minZoom, x, y);
  }
  return out;
}

function isLabelLayer(name: string) {
  return name === BASEMAP_LAYERS.countryLabel.id || name === BASEMAP_LAYERS.seaLabel.id;
}

function labelsFrom(tile: LegacyTile, z: number): LegacyTile {
  return {
    features: tile.features
      .filter((f) => Number(f.tags?.minzoom) <= z)
      .map((f) => {
        const { minzoom: _drop, ...tags } = f.tags ?? {};
        return { ...f, tags };
      }),
  };
}
