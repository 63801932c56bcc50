import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { hiddenTopTvdssM } from '../../server/db/seed/demoBasin/surfaces';
import { signedInAgent, startTestApp, type TestContext } from './support/testApp';

let ctx: TestContext;
let geo: Awaited<ReturnType<typeof signedInAgent>>;
let base: string;
let prospect: { id: string; name: string };

beforeAll(async () => {
  ctx = await startTestApp();
  geo = await signedInAgent(ctx, 'geoscientist@porelith.example');
  base = `/api/teams/${ctx.demoTeamId}`;
  const prospects = (await geo.get(`${base}/prospects`)).body;
  prospect = prospects.find((p: { name: string }) => p.name.startsWith('Ostrel')) ?? prospects[0];
  expect(prospect).toBeDefined();
});
afterAll(() => ctx.close());

describe('TOP surfaces over a demo prospect', () => {
  let surfaceId: string;

  it('krige the accepted TOP picks around the prospect, with contours, variogram and cross-validation', async () => {
    const res = await geo.post(`${base}/prospects/${prospect.id}/surfaces`).send({ wells: { from: 'prospect', bufferKm: 30 }, cellSizeM: 500, contourIntervalM: 50 });
    expect(res.status).toBe(201);
    surfaceId = res.body.id;
    expect(res.body.wellCount).toBeGreaterThanOrEqual(5);
    expect(res.body.grid.values.length).toBe(res.body.grid.nx * res.body.grid.ny);
    expect(res.body.contours.features.length).toBeGreaterThan(0);
    expect(res.body.variogram.fitted).toBe(true);
    expect(res.body.crossValidation.rmse).toBeGreaterThan(0);
    // Every well's interpretation version is recorded with its value.
    expect(res.body.wells.every((w: { interpretationVersion: number }) => w.interpretationVersion === 1)).toBe(true);
  });

  it('lists the run and reads the value at a planned well with its uncertainty', async () => {
    const list = await geo.get(`${base}/prospects/${prospect.id}/surfaces`);
    expect(list.body.map((s: { id: string }) => s.id)).toContain(surfaceId);
    const planned = (await geo.get(`${base}/planned-wells`)).body.find((p: { prospectId: string }) => p.prospectId === prospect.id);
    const v = await geo.get(`${base}/surfaces/${surfaceId}/planned-wells/${planned.id}/value`);
    expect(v.status).toBe(200);
    expect(v.body.stdDev).toBeGreaterThan(0);
    // The demo picks sit 100–300 m below the hidden onset (tests/unit/demoBasin/topPicks.test.ts).
    const [lon, lat] = planned.location.coordinates;
    const offset = v.body.value - hiddenTopTvdssM(lon, lat);
    expect(offset).toBeGreaterThan(0);
    expect(offset).toBeLessThan(400);
  });

  it('runs as a job with progress, two at once', async () => {
    const body = { wells: { from: 'prospect', bufferKm: 30 }, method: { kind: 'idw', power: 2 }, cellSizeM: 400 };
    const [a, b] = await Promise.all([
      geo.post(`${base}/prospects/${prospect.id}/surfaces?async=true`).send(body),
      geo.post(`${base}/prospects/${prospect.id}/surfaces?async=true`).send({ ...body, method: { kind: 'kriging', model: 'exponential' } }),
    ]);
    expect([a.status, b.status]).toEqual([202, 202]);
    for (const start of [a, b]) {
      let job;
      for (let i = 0; i < 200; i++) {
        job = (await geo.get(`${base}/surface-jobs/${start.body.jobId}`)).body;
        if (job.state !== 'running') break;
        await new Promise((r) => setTimeout(r, 100));
      }
      expect(job.error).toBeUndefined();
      expect(job.state).toBe('done');
      expect(job.result.grid.nx).toBeGreaterThan(10);
    }
  });

  it('refuses too few wells, too many cells and a lone prospect clearly, storing nothing', async () => {
    const before = (await geo.get(`${base}/prospects/${prospect.id}/surfaces`)).body.length;
    const wells = (await geo.get(`${base}/wells?limit=2`)).body.items.map((w: { id: string }) => w.id);
    const few = await geo.post(`${base}/prospects/${prospect.id}/surfaces`).send({ wells: { from: 'list', wellIds: wells } });
    expect(few.status).toBe(400);
    expect(few.body.error.message).toMatch(/^A surface needs at least 3 wells with an accepted TOP pick; \d of the 2 wells found have one\.$/);
    const fine = await geo.post(`${base}/prospects/${prospect.id}/surfaces`).send({ wells: { from: 'prospect', bufferKm: 30 }, cellSizeM: 25, extentBufferKm: 50 });
    expect(fine.status).toBe(400);
    expect(fine.body.error.message).toMatch(/exceeds the limit of 250000: choose a larger cell size/);
    const none = await geo.post(`${base}/prospects/${prospect.id}/surfaces`).send({ wells: { from: 'prospect', bufferKm: 0 } });
    expect(none.status).toBe(400);
    expect((await geo.get(`${base}/prospects/${prospect.id}/surfaces`)).body.length).toBe(before);
  });

  it('lets only permitted roles run or delete, and other teams see nothing', async () => {
    const planner = await signedInAgent(ctx, 'planner@porelith.example');
    expect((await planner.post(`${base}/prospects/${prospect.id}/surfaces`).send({})).status).toBe(403);
    expect((await planner.get(`${base}/surfaces/${surfaceId}`)).status).toBe(200);
    expect((await planner.delete(`${base}/surfaces/${surfaceId}`)).status).toBe(403);
    expect((await geo.delete(`${base}/surfaces/${surfaceId}`)).status).toBe(204);
    expect((await geo.get(`${base}/surfaces/${surfaceId}`)).status).toBe(404);
  });
});
