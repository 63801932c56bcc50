import { createHash } from 'node:crypto';
import { VectorTile } from '@mapbox/vector-tile';
import { PbfReader } from 'pbf';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import supertest from 'supertest';
import { createApp } from '../../server/app';
import { freshTeamAgent, memberAgent, startTestApp, type TestContext } from './support/testApp';

let ctx: TestContext;
let team: Awaited<ReturnType<typeof freshTeamAgent>>;
let base: string;

/** Slippy-map tile of a lon/lat (OpenStreetMap wiki "Slippy map tilenames" formula). */
function tileOf(lon: number, lat: number, z: number) {
  const n = 2 ** z;
  const r = (lat * Math.PI) / 180;
  return { x: Math.floor(((lon + 180) / 360) * n), y: Math.floor(((1 - Math.log(Math.tan(r) + 1 / Math.cos(r)) / Math.PI) / 2) * n) };
}

async function getTile(agent: typeof team.agent, layer: string, z: number, lon: number, lat: number) {
  const { x, y } = tileOf(lon, lat, z);
  return agent
    .get(`${base}/tiles/${layer}/${z}/${x}/${y}.mvt`)
    .buffer(true)
    .parse((res, cb) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => cb(null, Buffer.concat(chunks)));
    });
}

const decode = (body: Buffer) => new VectorTile(new PbfReader(body));

beforeAll(async () => {
  ctx = await startTestApp();
  team = await freshTeamAgent(ctx, 'Tile tests', 'geoscientist');
  base = `/api/teams/${team.teamId}`;
  // 30 wells in a 0.03° cluster plus one apart.
  const rows = ['name,lon,lat'];
  for (let i = 0; i < 30; i++) rows.push(`T-${i},${(-101 + (i % 6) * 0.005).toFixed(4)},${(-32.5 + Math.floor(i / 6) * 0.005).toFixed(4)}`);
  rows.push('LONE-1,-100.5,-32.2');
  const res = await team.agent
    .post(`${base}/imports`)
    .field('kind', 'wells')
    .attach('file', Buffer.from(rows.join('\n')), 'tiles.csv');
  expect(res.status).toBe(201);
});
afterAll(() => ctx.close());

describe('team vector tiles from PostGIS', () => {
  it('aggregates wells into clusters at low zoom', async () => {
    const res = await getTile(team.agent, 'wells', 5, -101, -32.5);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/vnd.mapbox-vector-tile');
    const layer = decode(res.body).layers.wells;
    let total = 0;
    let clusters = 0;
    for (let i = 0; i < layer.length; i++) {
      const f = layer.feature(i);
      total += Number(f.properties.count);
      if (f.properties.cluster) clusters++;
    }
    expect(total).toBe(31);
    expect(clusters).toBeGreaterThanOrEqual(1);
    expect(layer.length).toBeLessThan(31);
  });

  it('shows each well with its name and data flags at high zoom', async () => {
    const res = await getTile(team.agent, 'wells', 13, -101, -32.5);
    const layer = decode(res.body).layers.wells;
    const names = Array.from({ length: layer.length }, (_, i) => layer.feature(i).properties.name);
    expect(names).toContain('T-0');
    const f = layer.feature(names.indexOf('T-0'));
    expect(f.properties).toMatchObject({ status: 'drilled', pressures: 0, logs: 0, has_lot: false });
    // The feature sits where the well is: back to lon/lat within a pixel at z13 (~19 m).
    const geo = f.toGeoJSON(tileOf(-101, -32.5, 13).x, tileOf(-101, -32.5, 13).y, 13) as { geometry: { coordinates: number[] } };
    expect(geo.geometry.coordinates[0]).toBeCloseTo(-101, 3);
    expect(geo.geometry.coordinates[1]).toBeCloseTo(-32.5, 3);
  });

  it('answers 204 for a tile with nothing, and refreshes after an edit', async () => {
    const empty = await getTile(team.agent, 'prospects', 10, -101, -32.5);
    expect(empty.status).toBe(204);
    const planner = await memberAgent(ctx, team.teamId, 'planner');
    const d = 0.01;
    const ring = [
      [-101 - d, -32.5 - d],
      [-101 + d, -32.5 - d],
      [-101 + d, -32.5 + d],
      [-101 - d, -32.5 + d],
      [-101 - d, -32.5 - d],
    ];
    const created = await planner.agent
      .post(`${base}/prospects`)
      .send({ name: 'Tile box', geometry: { type: 'Polygon', coordinates: [ring] } });
    expect(created.status).toBe(201);
    const after = await getTile(team.agent, 'prospects', 10, -101, -32.5);
    expect(after.status).toBe(200);
    expect(decode(after.body).layers.prospects.feature(0).properties.name).toBe('Tile box');
  });

  it('tags a tile with a hash of its bytes, so a restarted server agrees and an edit of equal length does not', async () => {
    const res = await getTile(team.agent, 'wells', 13, -101, -32.5);
    expect(res.status).toBe(200);
    // Reference: SHA-256 from node:crypto over the bytes received.
    expect(res.headers.etag).toBe(`"${createHash('sha256').update(res.body).digest('base64url')}"`);
    const { x, y } = tileOf(-101, -32.5, 13);
    const again = await team.agent.get(`${base}/tiles/wells/13/${x}/${y}.mvt`).set('If-None-Match', res.headers.etag);
    expect(again.status).toBe(304);
    // A second app stands in for a restart: its change counter starts from 0 again, the tag stays the same.
    const restarted = createApp({ db: ctx.db, env: ctx.env, mailer: ctx.mailer, serveClient: false });
    const other = supertest.agent(restarted);
    expect((await other.post('/api/auth/sign-in').send({ email: team.email, password: team.password })).status).toBe(200);
    const fresh = await other.get(`${base}/tiles/wells/13/${x}/${y}.mvt`).set('If-None-Match', res.headers.etag);
    expect(fresh.status).toBe(304);
    // Renaming T-0 to T-Z keeps the tile's length but changes its bytes: no 304 for the old tag.
    const list = await team.agent.get(`${base}/wells?q=T-0&limit=5`);
    const t0 = (list.body.items as { id: string; name: string }[]).find((w) => w.name === 'T-0');
    expect(t0).toBeDefined();
    const detail = await team.agent.get(`${base}/wells/${t0!.id}`);
    const renamed = await team.agent.patch(`${base}/wells/${t0!.id}`).send({ name: 'T-Z', version: detail.body.version });
    expect(renamed.status).toBe(200);
    const edited = await getTile(team.agent, 'wells', 13, -101, -32.5);
    expect(edited.body.length).toBe(res.body.length);
    expect(edited.headers.etag).not.toBe(res.headers.etag);
    const revalidated = await team.agent.get(`${base}/tiles/wells/13/${x}/${y}.mvt`).set('If-None-Match', res.headers.etag);
    expect(revalidated.status).toBe(200);
    await team.agent.patch(`${base}/wells/${t0!.id}`).send({ name: 'T-0', version: renamed.body.version });
  });

  it('gives team B nothing of team A', async () => {
    const other = await freshTeamAgent(ctx, 'Tile other', 'admin');
    const { x, y } = tileOf(-101, -32.5, 5);
    const res = await other.agent.get(`${base}/tiles/wells/5/${x}/${y}.mvt`);
    expect(res.status).toBe(403);
    const own = await other.agent.get(`/api/teams/${other.teamId}/tiles/wells/5/${x}/${y}.mvt`);
    expect(own.status).toBe(204);
  });

  it('rejects tiles that do not exist and unknown layers', async () => {
    expect((await team.agent.get(`${base}/tiles/wells/3/8/1.mvt`)).status).toBe(400);
    expect((await team.agent.get(`${base}/tiles/rocks/3/1/1.mvt`)).status).toBe(400);
    expect((await team.agent.get(`${base}/tiles/wells/30/1/1.mvt`)).status).toBe(400);
  });
});
