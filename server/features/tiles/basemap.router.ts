import { gunzipSync } from 'node:zlib';
import { Router, type Request } from 'express';
import { z } from 'zod';
import { BASEMAP_FONTS } from '../../../tiles/fonts';
import { FONTS_DIR } from '../../../tiles/paths';
import { basemapStyle } from '../../../tiles/style';
import { notFound } from '../../lib/httpError';
import { parse } from '../../lib/parse';
import { createBasemapService, type BasemapService } from './basemap.service';

/** Highest zoom a request may name; MapLibre stops at 24, and past the archive's max zoom we answer 204. */
const MAX_REQUEST_ZOOM = 24;
const TILE_CACHE = 'public, max-age=86400';
/** Style and TileJSON carry the request's origin, so a cache must ask again rather than reuse another host's. */
const ORIGIN_BOUND_CACHE = 'no-cache';

const whole = (name: string) =>
  z
    .string()
    .regex(/^\d{1,8}$/, `${name} must be a whole number`)
    .transform(Number);
const tileParams = z.object({ z: whole('z'), x: whole('x'), y: whole('y') }).superRefine((t, ctx) => {
  if (t.z > MAX_REQUEST_ZOOM) {
    ctx.addIssue({ code: 'custom', path: ['z'], message: `z must be between 0 and ${MAX_REQUEST_ZOOM}` });
    return;
  }
  const last = 2 ** t.z - 1;
  for (const axis of ['x', 'y'] as const) {
    if (t[axis] > last) ctx.addIssue({ code: 'custom', path: [axis], message: `${axis} must be between 0 and ${last} at zoom ${t.z}` });
  }
});
const styleQuery = z.object({ theme: z.enum(['light', 'dark']).default('light') });
const fontFiles = new Set<string>(Object.values(BASEMAP_FONTS).map((f) => f.file));

const originOf = (req: Request) => `${req.protocol}://${req.get('host')}`;

/**
 * The offline basemap: vector tiles from the archive, its TileJSON, the map style and the label fonts.
 * Mount it at `/tiles`; every URL it hands out is built from the request's own origin and mount path.
 * @example app.use('/tiles', basemapRouter());
 */
export function basemapRouter(service: BasemapService = createBasemapService()): Router {
  const r = Router();

  r.get('/basemap/:z/:x/:y.mvt', async (req, res) => {
    const { z: zoom, x, y } = parse(tileParams, req.params);
    const tile = await service.tile(zoom, x, y);
    if (!tile) {
      // Open sea or past the last zoom: nothing to draw, and MapLibre overzooms the parent.
      res.set('Cache-Control', TILE_CACHE).status(204).end();
      return;
    }
    // Stored gzipped; the rare client that does not take gzip gets the tile unzipped.
    const asStored = !tile.encoding || Boolean(req.acceptsEncodings(tile.encoding));
    res.set({
      'Content-Type': 'application/vnd.mapbox-vector-tile',
      'Cache-Control': TILE_CACHE,
      ETag: asStored ? tile.etag : tile.etag.replace(/"$/, '-identity"'),
    });
    if (tile.encoding) res.vary('Accept-Encoding');
    if (tile.encoding && asStored) res.set('Content-Encoding', tile.encoding);
    if (req.fresh) {
      res.status(304).end();
      return;
    }
    res.send(asStored ? tile.bytes : gunzipSync(tile.bytes));
  });

  r.get('/basemap.json', async (req, res) => {
    const tilesUrl = `${originOf(req)}${req.baseUrl}/basemap/{z}/{x}/{y}.mvt`;
    res.set('Cache-Control', ORIGIN_BOUND_CACHE).json(await service.tileJson(tilesUrl));
  });

  r.get('/style.json', (req, res) => {
    const { theme } = parse(styleQuery, req.query);
    res.set('Cache-Control', ORIGIN_BOUND_CACHE).json(basemapStyle(originOf(req), { dark: theme === 'dark', mountPath: req.baseUrl }));
  });

  r.get('/fonts/:file', (req, res, next) => {
    const file = req.params.file;
    if (!fontFiles.has(file)) throw notFound(`The font ${file}`);
    res.sendFile(file, { root: FONTS_DIR, maxAge: '1d', headers: { 'Content-Type': 'font/woff2' } }, (err?: NodeJS.ErrnoException) => {
      if (err) next(err.code === 'ENOENT' ? notFound(`The font ${file} (run \`npm run tiles:build\`)`) : err);
    });
  });

  r.use((req) => {
    throw notFound(`The basemap resource ${req.method} ${req.originalUrl.split('?')[0]}`);
  });
  return r;
}
