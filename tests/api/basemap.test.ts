import express from 'express';
import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { validateStyleMin } from '@maplibre/maplibre-gl-style-spec';
import { VectorTile } from '@mapbox/vector-tile';
import { PbfReader } from 'pbf';
import { booleanPointInPolygon } from '@turf/turf';
import type { Polygon, MultiPolygon } from 'geojson';
import { basemapRouter } from '../../server/features/tiles/basemap.router';
import { errorHandler } from '../../server/middleware/errors';

// The router alone on a bare app with the real error middleware: no database needed. It serves the
// committed tiles/basemap.pmtiles (run `npm run tiles:build` after changing the build).
const app = express();
app.use('/tiles', basemapRouter());
app.use(errorHandler);
const api = supertest(app);

const HOST = 'maps.porelith.test:8080';
const ORIGIN = `http://${HOST}`;

/** Tile holding a lon/lat: the Web Mercator "slippy map" tile formula (OpenStreetMap wiki, Slippy map tilenames). */
function tileAt(lon: number, lat: number, z: number) {
  const n = 2 ** z;
  const rad = (lat * Math.PI) / 180;
  return {
    z,
    x: Math.floor(((lon + 180) / 360) * n),
    y: Math.floor(((1 - Math.log(Math.tan(rad) + 1 / Math.cos(rad)) / Math.PI) / 2) * n),
  };
}

async function getTile(z: number, x: number, y: number) {
  return api
    .get(`/tiles/basemap/${z}/${x}/${y}.mvt`)
    .buffer(true)
    .parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => done(null, Buffer.concat(chunks)));
    });
}

/** Decoded with @mapbox/vector-tile, the reference MVT reader. */
const decode = (body: Buffer) => new VectorTile(new PbfReader(body));

function landContains(tile: VectorTile, t: { z: number; x: number; y: number }, lon: number, lat: number) {
  const land = tile.layers.land;
  if (!land) return false;
  for (let i = 0; i < land.length; i++) {
    const geometry = land.feature(i).toGeoJSON(t.x, t.y, t.z).geometry as Polygon | MultiPolygon;
    if (booleanPointInPolygon([lon, lat], geometry)) return true;
  }
  return false;
}

describe('GET /tiles/basemap/:z/:x/:y.mvt', () => {
  it('serves the z0 tile as a gzipped vector tile with land, coast and borders (names start at z1)', async () => {
    const res = await getTile(0, 0, 0);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/vnd.mapbox-vector-tile');
    expect(res.headers['content-encoding']).toBe('gzip');
    expect(res.headers['cache-control']).toBe('public, max-age=86400');
    const tile = decode(res.body);
    expect(Object.keys(tile.layers).sort()).toEqual(['borders', 'coast', 'land']);
    expect(tile.layers.land.length).toBeGreaterThan(0);
    expect(tile.layers.land.feature(0).type).toBe(3); // MVT spec 2.1: 3 = POLYGON
    expect(tile.layers.coast.feature(0).type).toBe(2); // 2 = LINESTRING
    const z1 = decode((await getTile(1, 0, 0)).body); // north-west quarter: North America, North Atlantic
    expect(Object.keys(z1.layers).sort()).toEqual(['borders', 'coast', 'country_label', 'land', 'sea_label']);
    expect(z1.layers.country_label.feature(0).properties).toMatchObject({ name: expect.any(String), rank: expect.any(Number) });
  });

  it('has land under the central Sahara at z5, and names on it', async () => {
    const t = tileAt(10, 24, 5);
    const res = await getTile(t.z, t.x, t.y);
    expect(res.status).toBe(200);
    const tile = decode(res.body);
    expect(landContains(tile, t, 10, 24)).toBe(true);
    const names = [];
    for (let i = 0; i < (tile.layers.country_label?.length ?? 0); i++) names.push(tile.layers.country_label.feature(i).properties.name);
    expect(names.length).toBeGreaterThan(0);
  });

  it('has coast and open water side by side over the North Sea at z5', async () => {
    const t = tileAt(3.5, 56, 5);
    const tile = decode((await getTile(t.z, t.x, t.y)).body);
    expect(tile.layers.coast.length).toBeGreaterThan(0);
    expect(landContains(tile, t, 3.5, 56)).toBe(false); // Dogger Bank area, open sea
  });

  it('answers 204 for open ocean at z8 (far South Pacific) and past the last zoom', async () => {
    const t = tileAt(-130, -45, 8);
    const ocean = await getTile(t.z, t.x, t.y);
    expect(ocean.status).toBe(204);
    expect(ocean.body.length).toBe(0);
    const deep = await getTile(12, 2000, 1500);
    expect(deep.status).toBe(204);
  });

  it('sends an ETag and answers 304 when the client has it', async () => {
    const first = await getTile(0, 0, 0);
    const etag = first.headers.etag;
    expect(etag).toMatch(/^"[A-Za-z0-9_-]+"$/);
    const again = await api.get('/tiles/basemap/0/0/0.mvt').set('If-None-Match', etag);
    expect(again.status).toBe(304);
    const other = await getTile(1, 0, 0);
    expect(other.headers.etag).not.toBe(etag);
  });

  it('unzips for a client that does not accept gzip, under a different ETag', async () => {
    const gz = await getTile(0, 0, 0);
    const plain = await api
      .get('/tiles/basemap/0/0/0.mvt')
      .set('Accept-Encoding', 'identity')
      .buffer(true)
      .parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      });
    expect(plain.status).toBe(200);
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.headers.etag).not.toBe(gz.headers.etag);
    expect(Buffer.compare(plain.body, gz.body)).toBe(0); // supertest unzipped the first one
  });

  it.each([
    ['/tiles/basemap/a/0/0.mvt', 'z'],
    ['/tiles/basemap/1.5/0/0.mvt', 'z'],
    ['/tiles/basemap/25/0/0.mvt', 'z'],
    ['/tiles/basemap/2/4/0.mvt', 'x'],
    ['/tiles/basemap/2/0/-1.mvt', 'y'],
    ['/tiles/basemap/3/0/8.mvt', 'y'],
  ])('rejects %s with a 400 naming %s', async (url, field) => {
    const res = await api.get(url);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.details.map((d: { path: string }) => d.path)).toContain(field);
  });
});

describe('GET /tiles/basemap.json', () => {
  it('is TileJSON with the tile template on the request origin', async () => {
    const res = await api.get('/tiles/basemap.json').set('Host', HOST);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      tilejson: '3.0.0',
      tiles: [`${ORIGIN}/tiles/basemap/{z}/{x}/{y}.mvt`],
      minzoom: 0,
      maxzoom: 8,
      attribution: 'Natural Earth (public domain) via world-atlas',
    });
    expect(res.body.vector_layers.map((l: { id: string }) => l.id)).toEqual(['land', 'coast', 'borders', 'country_label', 'sea_label']);
  });
});

describe('GET /tiles/style.json', () => {
  it.each(['light', 'dark'])('%s: valid, and every URL is on the request origin', async (theme) => {
    const res = await api.get(`/tiles/style.json?theme=${theme}`).set('Host', HOST);
    expect(res.status).toBe(200);
    expect(validateStyleMin(res.body)).toEqual([]);
    const urls = JSON.stringify(res.body).match(/https?:\/\/[^"]+/g) ?? [];
    expect(urls.length).toBeGreaterThan(0);
    for (const url of urls) expect(url.startsWith(`${ORIGIN}/`)).toBe(true);
    expect(JSON.stringify(res.body)).toContain('Natural Earth (public domain) via world-atlas');
  });

  it('rejects an unknown theme', async () => {
    const res = await api.get('/tiles/style.json?theme=sepia');
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].path).toBe('theme');
  });

  it('serves the fonts the style names, as WOFF2', async () => {
    const style = (await api.get('/tiles/style.json').set('Host', HOST)).body;
    for (const url of Object.values(style['font-faces']) as string[]) {
      const res = await api.get(url.replace(ORIGIN, '')).buffer(true);
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toBe('font/woff2');
      // W3C WOFF 2.0, section 3: every file starts with the signature 0x774F4632 ("wOF2").
      expect(Buffer.from(res.body).subarray(0, 4).toString('latin1')).toBe('wOF2');
    }
  });

  it('answers 404 JSON for a font or path it does not have', async () => {
    expect((await api.get('/tiles/fonts/../basemap.pmtiles')).status).toBe(404);
    const res = await api.get('/tiles/fonts/comic.woff2');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
    expect((await api.get('/tiles/nothing-here')).body.error.code).toBe('not_found');
  });
});
