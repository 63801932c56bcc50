import { createHash } from 'node:crypto';
import { Router } from 'express';
import { z } from 'zod';
import type { Db } from '../../db/client';
import { badRequest } from '../../lib/httpError';
import { TtlCache, type TeamChanges } from '../../lib/teamChanges';
import { requireTeam, teamIdOf } from '../../middleware/guards';
import { teamTile, type TeamLayer } from './teamTiles.service';

const MAX_ZOOM = 22;
const params = z.object({
  layer: z.string(),
  z: z.coerce.number().int().min(0).max(MAX_ZOOM),
  x: z.coerce.number().int().min(0),
  y: z.coerce.number().int().min(0),
});

function layerOf(name: string): TeamLayer | null {
  if (name === 'wells' || name === 'prospects' || name === 'planned-wells') return { kind: name };
  const m = /^reference-([0-9a-f-]{36})$/.exec(name);
  return m ? { kind: 'reference', layerId: m[1] } : null;
}

/** Team vector tiles from PostGIS (`ST_AsMVT`), cached briefly and keyed by the team's change counter; the ETag hashes the bytes. */
export function teamTilesRouter(db: Db, changes: TeamChanges, { cache: useCache = true } = {}): Router {
  const r = Router({ mergeParams: true });
  const cache = new TtlCache<{ tile: Buffer; etag: string }>(useCache ? 4000 : 0, 60_000);
  r.get('/:teamId/tiles/:layer/:z/:x/:y.mvt', requireTeam('team.read'), async (req, res) => {
    const p = params.safeParse(req.params);
    const layer = p.success ? layerOf(p.data.layer) : null;
    if (!p.success || !layer)
      throw badRequest('bad_tile', `Not a tile address: ${req.params.layer}/${req.params.z}/${req.params.x}/${req.params.y}.`);
    const { z: zoom, x, y } = p.data;
    if (x >= 2 ** zoom || y >= 2 ** zoom)
      throw badRequest('bad_tile', `Tile ${zoom}/${x}/${y} does not exist: x and y must be below ${2 ** zoom} at zoom ${zoom}.`);
    const teamId = teamIdOf(req);
    const generation = changes.generation(teamId);
    const key = `${teamId}:${generation}:${p.data.layer}:${zoom}/${x}/${y}`;
    let hit = cache.get(key);
    if (!hit) {
      const bytes = await teamTile(db, teamId, layer, zoom, x, y);
      // A hash of the bytes, not the change counter: the counter restarts at 0 with the server, and an
      // edited tile of the same length must never be answered 304.
      hit = { tile: bytes, etag: `"${createHash('sha256').update(bytes).digest('base64url')}"` };
      cache.set(key, hit);
    }
    const { tile, etag } = hit;
    res.setHeader('ETag', etag);
    res.setHeader('Cache-Control', 'private, max-age=0, must-revalidate');
    if (req.headers['if-none-match'] === etag) return void res.status(304).end();
    if (tile.length === 0) return void res.status(204).end();
    res.setHeader('Content-Type', 'application/vnd.mapbox-vector-tile');
    res.send(tile);
  });
  return r;
}
