/**
 * Map tiles with 100,000 wells: the team tile endpoint over HTTP (session, permission check, cache off)
 * at z4, z8 and z12, against the same ST_AsMVT query sent directly through pg; and the 25 km offset search.
 */
import { randomUUID } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import { sql } from 'drizzle-orm';
import type { BenchSection, Row } from '../helpers/types';

const WELLS = 100_000;
const REPEAT = 15;

function tileOf(lon: number, lat: number, z: number) {
  const n = 2 ** z;
  const r = (lat * Math.PI) / 180;
  return { x: Math.floor(((lon + 180) / 360) * n), y: Math.floor(((1 - Math.log(Math.tan(r) + 1 / Math.cos(r)) / Math.PI) / 2) * n) };
}

const stats = (ms: number[]) => {
  const s = [...ms].sort((a, b) => a - b);
  return { median: s[Math.floor(s.length / 2)], p95: s[Math.min(s.length - 1, Math.ceil(s.length * 0.95) - 1)] };
};

export const section: BenchSection = {
  name: 'tiles',
  async run(): Promise<Row[]> {
    if (!process.env.DATABASE_URL) return [{ metric: 'skipped: run through `npm run bench` (needs a database)', ours: NaN, unit: '' }];
    const bcrypt = (await import('bcryptjs')).default;
    const { createDb } = await import('../../../server/db/client');
    const { parseEnv } = await import('../../../server/env');
    const { createApp } = await import('../../../server/app');
    const { memberships, teams, users } = await import('../../../server/db/schema');
    const { bulkInsert } = await import('../../../server/lib/bulkInsert');
    const { teamTileQuery } = await import('../../../server/features/tiles/teamTiles.service');
    const db = createDb(process.env.DATABASE_URL, 4);
    const env = parseEnv({ ...process.env, LOG_LEVEL: 'silent', SIGNIN_RATE_MAX: '1000' });
    const [team] = await db
      .insert(teams)
      .values({ name: `tile bench ${randomUUID()}` })
      .returning();
    const email = `tile-bench-${randomUUID()}@porelith.example`;
    const [user] = await db
      .insert(users)
      .values({ email, name: 'bench', passwordHash: await bcrypt.hash('bench-password', 4) })
      .returning();
    await db.insert(memberships).values({ teamId: team.id, userId: user.id, role: 'planner' });
    const server = createApp({ db, env, mailer: { send: async () => {}, close: () => {} }, serveClient: false, tileCache: false }).listen(
      0,
      '127.0.0.1',
    );
    await new Promise<void>((r) => server.once('listening', () => r()));
    const origin = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    try {
      // Wells scattered over ~8° × 8° around the demo basin, seeded so every run sees the same data.
      let seed = 7;
      const rand = () => (seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31;
      const rows = Array.from({ length: WELLS }, (_, i) => {
        const lon = -105 + rand() * 8;
        const lat = -36 + rand() * 8;
        return [team.id, `BW-${i}`, `SRID=4326;POINT(${lon} ${lat})`, lon, lat];
      });
      await bulkInsert(
        db,
        'wells',
        [
          ['team_id', 'uuid'],
          ['name', 'text'],
          ['location', 'text', '$value::geometry'],
          ['surface_x', 'float8'],
          ['surface_y', 'float8'],
        ],
        rows,
      );
      await db.execute(sql`ANALYZE wells`);
      const signIn = await fetch(`${origin}/api/auth/sign-in`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ email, password: 'bench-password' }),
      });
      const cookie = (signIn.headers.get('set-cookie') ?? '').split(';')[0];
      const out: Row[] = [];
      for (const z of [4, 8, 12]) {
        const { x, y } = tileOf(-101, -32.5, z);
        const endpoint: number[] = [];
        const raw: number[] = [];
        let bytes = 0;
        for (let i = 0; i < REPEAT; i++) {
          // Neighbouring tiles at z8/z12 for variety; the tile cache is off so every request reaches PostGIS.
          const dx = z === 4 ? 0 : i % 4;
          const dy = z === 4 ? 0 : Math.floor(i / 4);
          const t0 = performance.now();
          const res = await fetch(`${origin}/api/teams/${team.id}/tiles/wells/${z}/${x + dx}/${y + dy}.mvt`, { headers: { cookie } });
          bytes = (await res.arrayBuffer()).byteLength || bytes;
          endpoint.push(performance.now() - t0);
          const t1 = performance.now();
          await db.execute(teamTileQuery(team.id, { kind: 'wells' }, z, x + dx, y + dy));
          raw.push(performance.now() - t1);
        }
        const e = stats(endpoint);
        const r = stats(raw);
        out.push({
          metric: `wells tile z${z} median (${(bytes / 1024).toFixed(0)} KiB)`,
          ours: e.median,
          reference: r.median,
          unit: 'ms',
          note: 'ST_AsMVT query alone through pg',
        });
        out.push({ metric: `wells tile z${z} p95`, ours: e.p95, reference: r.p95, unit: 'ms', note: 'ST_AsMVT query alone through pg' });
      }
      const pw = await fetch(`${origin}/api/teams/${team.id}/planned-wells`, {
        method: 'POST',
        headers: { 'content-type': 'application/json', cookie },
        body: JSON.stringify({
          name: 'bench planned',
          location: { type: 'Point', coordinates: [-101, -32.5] },
          plannedTdM: 4000,
          waterDepthM: 100,
        }),
      }).then((r) => r.json() as Promise<{ id: string }>);
      const search: number[] = [];
      let found = 0;
      for (let i = 0; i < 5; i++) {
        const t0 = performance.now();
        const res = await fetch(`${origin}/api/teams/${team.id}/planned-wells/${pw.id}/offset-candidates?radiusKm=25`, {
          headers: { cookie },
        });
        found = ((await res.json()) as unknown[]).length;
        search.push(performance.now() - t0);
      }
      out.push({ metric: `offset search 25 km (${found} wells found)`, ours: stats(search).median, unit: 'ms' });
      return out;
    } finally {
      server.close();
      await db.execute(sql`DELETE FROM planned_wells WHERE team_id = ${team.id}`);
      await db.execute(sql`DELETE FROM wells WHERE team_id = ${team.id}`);
      await db.execute(sql`DELETE FROM teams WHERE id = ${team.id}`);
      await db.execute(sql`DELETE FROM users WHERE id = ${user.id}`);
      await db.$client.end();
    }
  },
};
