import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { decimateMinMax } from '../../server/features/wells/wells.service';
import { freshTeamAgent, startTestApp, type TestContext } from './support/testApp';

let ctx: TestContext;
let team: Awaited<ReturnType<typeof freshTeamAgent>>;
let base: string;

beforeAll(async () => {
  ctx = await startTestApp();
  team = await freshTeamAgent(ctx, 'Wells API tests', 'geoscientist');
  base = `/api/teams/${team.teamId}`;
  const res = await team.agent
    .post(`${base}/imports`)
    .field('kind', 'wells')
    .attach('file', readFileSync('tests/fixtures/imports/wells-good.csv'), 'w.csv');
  expect(res.status).toBe(201);
});
afterAll(() => ctx.close());

describe('well list', () => {
  it('pages, sorts and counts', async () => {
    const page1 = await team.agent.get(`${base}/wells?limit=2&sort=name&order=desc`);
    expect(page1.body.total).toBe(3);
    expect(page1.body.items.map((w: { name: string }) => w.name)).toEqual(['TEST-3, sidetrack', 'TEST-2']);
    const page2 = await team.agent.get(`${base}/wells?limit=2&offset=2&sort=name&order=desc`);
    expect(page2.body.items.map((w: { name: string }) => w.name)).toEqual(['TEST-1']);
  });

  it('filters by status, search text and bounding box', async () => {
    expect((await team.agent.get(`${base}/wells?status=abandoned`)).body.total).toBe(1);
    expect((await team.agent.get(`${base}/wells?q=tx-0002`)).body.items[0].name).toBe('TEST-2');
    // Only TEST-1 lies west of −101.15°.
    const box = await team.agent.get(`${base}/wells?bbox=-101.3,-32.6,-101.15,-32.3`);
    expect(box.body.items.map((w: { name: string }) => w.name)).toEqual(['TEST-1']);
    expect((await team.agent.get(`${base}/wells?hasPressures=true`)).body.total).toBe(0);
  });

  it('counts each well’s own data (pressures, survey, LOT) in the list and filters on it', async () => {
    const csv = Buffer.from('well,kind,md (m),value,unit\nTEST-2,formation_test,2000,3000,psi\nTEST-2,lot,1500,16,ppg\n');
    expect((await team.agent.post(`${base}/imports`).field('kind', 'pressures').attach('file', csv, 'p.csv')).status).toBe(201);
    const list = await team.agent.get(`${base}/wells?sort=name`);
    const byName = Object.fromEntries(list.body.items.map((w: { name: string }) => [w.name, w]));
    expect(byName['TEST-2']).toMatchObject({ pressureCount: 2, hasLot: true, hasSurvey: false, logCount: 0 });
    expect(byName['TEST-1']).toMatchObject({ pressureCount: 0, hasLot: false });
    const withData = await team.agent.get(`${base}/wells?hasPressures=true`);
    expect(withData.body.items.map((w: { name: string }) => w.name)).toEqual(['TEST-2']);
    const sorted = await team.agent.get(`${base}/wells?sort=pressureCount&order=desc`);
    expect(sorted.body.items[0].name).toBe('TEST-2');
  });

  it('rejects a malformed bounding box and an unknown sort by name', async () => {
    const bad = await team.agent.get(`${base}/wells?bbox=10,20,5,30&sort=colour`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.map((d: { path: string }) => d.path).sort()).toEqual(['bbox', 'sort']);
  });
});

describe('well detail and edits', () => {
  it('returns header and datums, and guards edits with the version (409 when stale)', async () => {
    const list = await team.agent.get(`${base}/wells?q=TEST-1`);
    const id = list.body.items[0].id;
    const detail = await team.agent.get(`${base}/wells/${id}`);
    expect(detail.body).toMatchObject({ name: 'TEST-1', datumElevationM: 25, waterDepthM: 120, version: 1, tops: [], survey: null });
    const ok = await team.agent.patch(`${base}/wells/${id}`).send({ version: 1, note: 'checked header against the end-of-well report' });
    expect(ok.status).toBe(200);
    expect(ok.body.version).toBe(2);
    const stale = await team.agent.patch(`${base}/wells/${id}`).send({ version: 1, note: 'an older edit' });
    expect(stale.status).toBe(409);
    expect(stale.body.error.details).toEqual({ currentVersion: 2 });
    expect((await team.agent.get(`${base}/wells/${id}`)).body.note).toBe('checked header against the end-of-well report');
  });

  it('refuses a name taken by another well, and unknown fields', async () => {
    const list = await team.agent.get(`${base}/wells?q=TEST-2`);
    const w = list.body.items[0];
    const clash = await team.agent.patch(`${base}/wells/${w.id}`).send({ version: 1, name: 'TEST-1' });
    expect(clash.status).toBe(409);
    const extra = await team.agent.patch(`${base}/wells/${w.id}`).send({ version: 1, colour: 'red' });
    expect(extra.status).toBe(400);
  });

  it('answers 404 for a well of another team and a viewer may not edit', async () => {
    const other = await freshTeamAgent(ctx, 'Wells API other', 'viewer');
    const list = await team.agent.get(`${base}/wells?q=TEST-1`);
    const res = await other.agent.get(`/api/teams/${other.teamId}/wells/${list.body.items[0].id}`);
    expect(res.status).toBe(404);
    const edit = await other.agent.patch(`/api/teams/${other.teamId}/wells/${list.body.items[0].id}`).send({ version: 1 });
    expect(edit.status).toBe(403);
  });
});

describe('log decimation for plots', () => {
  it('keeps each bucket’s minimum and maximum so spikes survive', () => {
    const md = Array.from({ length: 1000 }, (_, i) => i);
    const values = md.map((i) => (i === 503 ? 999 : i % 7));
    const out = decimateMinMax(md, values, 100);
    expect(out.mdM.length).toBeLessThanOrEqual(100);
    expect(out.values).toContain(999);
    expect(out.mdM).toEqual([...out.mdM].sort((a, b) => a - b));
  });
});
