import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { freshTeamAgent, memberAgent, startTestApp, type TestContext } from './support/testApp';

let ctx: TestContext;
let geo: Awaited<ReturnType<typeof freshTeamAgent>>;
let url: string;

const content = (tvdM: number) => ({
  normalDensityKgM3: 1030,
  trend: {
    curveId: null,
    curve: 'sonic',
    model: 'exponential',
    fromM: 800,
    toM: 1800,
    params: { matrix: 55, surface: 180, cPerM: 0.0006 },
    r2: 0.91,
    gammaCutoffApi: 75,
  },
  pore: { method: 'eaton-sonic', exponent: 3 },
  fracture: { method: 'eaton', poissonTop: 0.38, poissonGradientPerKm: 0.02 },
  top: { tvdM, method: 'auto', confidence: 'high', comment: 'ramp starts under the Orsel Shale', marginKgM3: 36, minThicknessM: 50 },
});

beforeAll(async () => {
  ctx = await startTestApp();
  geo = await freshTeamAgent(ctx, 'Interpretation tests', 'geoscientist');
  const csv = Buffer.from('name,lon,lat\nINT-1,-101,-32.5\n');
  await geo.agent.post(`/api/teams/${geo.teamId}/imports`).field('kind', 'wells').attach('file', csv, 'w.csv');
  const w = (await geo.agent.get(`/api/teams/${geo.teamId}/wells?q=INT-1`)).body.items[0];
  url = `/api/teams/${geo.teamId}/wells/${w.id}/interpretations`;
});
afterAll(() => ctx.close());

describe('well interpretations', () => {
  it('has no current interpretation until one is accepted', async () => {
    const res = await geo.agent.get(`${url}/current`);
    expect(res.status).toBe(404);
  });

  it('saves versions; the newest accepted is current; drafts do not replace it', async () => {
    const v1 = await geo.agent.post(url).send({ ...content(2450), baseVersion: null });
    expect(v1.status).toBe(201);
    expect(v1.body).toMatchObject({ version: 1, status: 'accepted', top: { tvdM: 2450, confidence: 'high' }, createdBy: geo.userId });
    const v2 = await geo.agent.post(url).send({ ...content(2500), baseVersion: 1, status: 'draft', note: 'trying a deeper pick' });
    expect(v2.body.version).toBe(2);
    const current = await geo.agent.get(`${url}/current`);
    expect(current.body).toMatchObject({ version: 1, top: { tvdM: 2450 } });
    const list = await geo.agent.get(url);
    expect(list.body.map((i: { version: number }) => i.version)).toEqual([2, 1]);
  });

  it('refuses a save from a stale base with 409 and the newest version', async () => {
    const stale = await geo.agent.post(url).send({ ...content(2600), baseVersion: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.details).toEqual({ currentVersion: 2 });
    expect(stale.body.error.message).toMatch(/reload/);
  });

  it('lets only one of two simultaneous saves of the same base through', async () => {
    const [a, b] = await Promise.all([
      geo.agent.post(url).send({ ...content(2470), baseVersion: 2 }),
      geo.agent.post(url).send({ ...content(2480), baseVersion: 2 }),
    ]);
    expect([a.status, b.status].sort()).toEqual([201, 409]);
  });

  it('restores an earlier version as a new one', async () => {
    const latest = (await geo.agent.get(url)).body[0].version;
    const res = await geo.agent.post(`${url}/1/restore`).send({ baseVersion: latest });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ version: latest + 1, restoredFrom: 1, top: { tvdM: 2450 }, status: 'accepted' });
    expect((await geo.agent.get(`${url}/current`)).body.version).toBe(latest + 1);
  });

  it('validates the content by field, and refuses viewers and other teams', async () => {
    const bad = await geo.agent.post(url).send({ ...content(2450), pore: { method: 'eaton-sonic', exponent: 50 }, baseVersion: 99 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].path).toBe('pore.exponent');
    const viewer = await memberAgent(ctx, geo.teamId, 'viewer');
    expect((await viewer.agent.get(url)).status).toBe(200);
    expect((await viewer.agent.post(url).send({ ...content(1), baseVersion: null })).status).toBe(403);
    const other = await freshTeamAgent(ctx, 'Interp other', 'geoscientist');
    expect((await other.agent.get(url)).status).toBe(403);
  });
});

describe('the current interpretation, as surfaces and offsets read it', () => {
  // Three wells with a rig datum 30 m above sea level: TOP TVDSS = TOP TVD below the datum − 30 m.
  const WELLS = [
    ['CUR-A', -101.0, -32.5],
    ['CUR-B', -100.95, -32.55],
    ['CUR-C', -100.9, -32.48],
  ] as const;
  let admin: Awaited<ReturnType<typeof freshTeamAgent>>;
  let base: string;
  const ids: Record<string, string> = {};

  beforeAll(async () => {
    admin = await freshTeamAgent(ctx, 'Current interpretation', 'admin');
    base = `/api/teams/${admin.teamId}`;
    const csv = ['name,lon,lat,datum elevation', ...WELLS.map((w) => `${w.join(',')},30`)].join('\n');
    expect((await admin.agent.post(`${base}/imports`).field('kind', 'wells').attach('file', Buffer.from(csv), 'cur.csv')).status).toBe(201);
    for (const [name] of WELLS) ids[name] = (await admin.agent.get(`${base}/wells?q=${name}`)).body.items[0].id;
    const save = (name: string, body: object) => admin.agent.post(`${base}/wells/${ids[name]}/interpretations`).send(body);
    for (const [name] of WELLS) expect((await save(name, { ...content(2000), baseVersion: null })).status).toBe(201);
    // A: a newer accepted version supersedes version 1. B: a newer draft does not. C: stays at version 1.
    expect((await save('CUR-A', { ...content(2600), baseVersion: 1 })).status).toBe(201);
    expect((await save('CUR-B', { ...content(2900), baseVersion: 1, status: 'draft' })).status).toBe(201);
  });

  it('feeds the newest accepted version, not an older one or a newer draft, into a TOP surface', async () => {
    const prospect = await admin.agent.post(`${base}/prospects`).send({
      name: 'Current-interpretation prospect',
      geometry: {
        type: 'Polygon',
        coordinates: [
          [
            [-101.05, -32.6],
            [-100.85, -32.6],
            [-100.85, -32.43],
            [-101.05, -32.43],
            [-101.05, -32.6],
          ],
        ],
      },
    });
    expect(prospect.status).toBe(201);
    const res = await admin.agent
      .post(`${base}/prospects/${prospect.body.id}/surfaces`)
      .send({ wells: { from: 'list', wellIds: Object.values(ids) }, method: { kind: 'idw', power: 2 }, cellSizeM: 1000 });
    expect(res.status).toBe(201);
    const byName = Object.fromEntries(res.body.wells.map((w: { name: string }) => [w.name, w]));
    expect(byName['CUR-A']).toMatchObject({ interpretationVersion: 2, value: 2570 });
    expect(byName['CUR-B']).toMatchObject({ interpretationVersion: 1, value: 1970 });
    expect(byName['CUR-C']).toMatchObject({ interpretationVersion: 1, value: 1970 });
  });

  it('shows the same TOP per offset candidate', async () => {
    const planned = await admin.agent
      .post(`${base}/planned-wells`)
      .send({ name: 'Current-1 (planned)', location: { type: 'Point', coordinates: [-100.97, -32.52] }, plannedTdM: 3000 });
    expect(planned.status).toBe(201);
    const res = await admin.agent.get(`${base}/planned-wells/${planned.body.id}/offset-candidates?radiusKm=25`);
    expect(res.status).toBe(200);
    const top = Object.fromEntries(res.body.map((c: { name: string; topTvdssM: number | null }) => [c.name, c.topTvdssM]));
    expect(top).toEqual({ 'CUR-A': 2570, 'CUR-B': 1970, 'CUR-C': 1970 });
  });
});
