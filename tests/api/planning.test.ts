import * as turf from '@turf/turf';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { freshTeamAgent, memberAgent, startTestApp, type TestContext } from './support/testApp';

let ctx: TestContext;
let planner: Awaited<ReturnType<typeof freshTeamAgent>>;
let base: string;

// Five wells east of a planned location at −101.0°, −32.5°, at increasing distance, and one far away.
const WELLS = [
  ['NEAR-1', -100.99, -32.5, 110, 3900],
  ['NEAR-2', -100.95, -32.52, 130, 3200],
  ['MID-3', -100.9, -32.45, 300, 4200],
  ['MID-4', -100.85, -32.6, 90, 2500],
  ['FAR-5', -100.6, -32.5, 120, 4000],
  ['AWAY-6', -99.0, -31.0, 100, 4000],
] as const;

beforeAll(async () => {
  ctx = await startTestApp();
  planner = await freshTeamAgent(ctx, 'Planning tests', 'planner');
  base = `/api/teams/${planner.teamId}`;
  const geo = await memberAgent(ctx, planner.teamId, 'geoscientist');
  const csv = ['name,lon,lat,water depth (m),td tvd (m)', ...WELLS.map((w) => w.join(','))].join('\n');
  const res = await geo.agent.post(`${base}/imports`).field('kind', 'wells').attach('file', Buffer.from(csv), 'offsets.csv');
  expect(res.status).toBe(201);
});
afterAll(() => ctx.close());

const square = (lon: number, lat: number, d: number) => ({
  type: 'Polygon' as const,
  coordinates: [
    [
      [lon - d, lat - d],
      [lon + d, lat - d],
      [lon + d, lat + d],
      [lon - d, lat + d],
      [lon - d, lat - d],
    ],
  ],
});

describe('prospects', () => {
  it('creates, reads with its area, updates with the version, and deletes', async () => {
    const geometry = square(-101, -32.5, 0.05);
    const created = await planner.agent
      .post(`${base}/prospects`)
      .send({ name: 'Lantern Fan', geometry, targetTopM: 2800, targetBaseM: 3400 });
    expect(created.status).toBe(201);
    // Area on the spheroid: PostGIS geography against turf's spherical area, within 0.5 % (they use different earth models).
    expect(created.body.areaKm2).toBeCloseTo(turf.area(turf.polygon(geometry.coordinates)) / 1e6, -1);
    expect(Math.abs(created.body.areaKm2 / (turf.area(turf.polygon(geometry.coordinates)) / 1e6) - 1)).toBeLessThan(0.005);
    const stale = await planner.agent
      .patch(`${base}/prospects/${created.body.id}`)
      .send({ version: 1, name: 'Lantern Fan North', geometry });
    expect(stale.status).toBe(200);
    const again = await planner.agent.patch(`${base}/prospects/${created.body.id}`).send({ version: 1, name: 'older', geometry });
    expect(again.status).toBe(409);
    expect((await planner.agent.get(`${base}/prospects`)).body.map((p: { name: string }) => p.name)).toContain('Lantern Fan North');
    expect((await planner.agent.delete(`${base}/prospects/${created.body.id}`)).status).toBe(204);
    expect((await planner.agent.get(`${base}/prospects/${created.body.id}`)).status).toBe(404);
  });

  it('refuses self-intersecting, open, empty and out-of-range outlines, storing nothing', async () => {
    const before = (await planner.agent.get(`${base}/prospects`)).body.length;
    const bowtie = {
      type: 'Polygon',
      coordinates: [
        [
          [-101, -32.5],
          [-100.9, -32.4],
          [-100.9, -32.5],
          [-101, -32.4],
          [-101, -32.5],
        ],
      ],
    };
    const r1 = await planner.agent.post(`${base}/prospects`).send({ name: 'Bow', geometry: bowtie });
    expect(r1.status).toBe(400);
    expect(r1.body.error.message).toMatch(/^The outline is not a valid polygon: Self-intersection/);
    const open = {
      type: 'Polygon',
      coordinates: [
        [
          [-101, -32.5],
          [-100.9, -32.5],
          [-100.9, -32.4],
          [-101, -32.4],
        ],
      ],
    };
    const r2 = await planner.agent.post(`${base}/prospects`).send({ name: 'Open', geometry: open });
    expect(r2.body.error.message).toBe('The outline is not closed: its last position must equal its first.');
    const empty = await planner.agent.post(`${base}/prospects`).send({ name: 'Empty', geometry: { type: 'Polygon', coordinates: [] } });
    expect(empty.status).toBe(400);
    const far = await planner.agent.post(`${base}/prospects`).send({ name: 'Far', geometry: square(-181, -32.5, 0.1) });
    expect(far.status).toBe(400);
    expect(far.body.error.details.some((d: { message: string }) => d.message === 'longitude must be within −180..180')).toBe(true);
    expect((await planner.agent.get(`${base}/prospects`)).body.length).toBe(before);
  });

  it('lets only roles with the grant edit', async () => {
    const viewer = await memberAgent(ctx, planner.teamId, 'viewer');
    const res = await viewer.agent.post(`${base}/prospects`).send({ name: 'V', geometry: square(-101, -32.5, 0.01) });
    expect(res.status).toBe(403);
  });
});

describe('wells around a prospect alone', () => {
  it('lists wells inside the outline or within the buffer, distances from the outline matching turf', async () => {
    const geometry = square(-101, -32.5, 0.02);
    const p = await planner.agent.post(`${base}/prospects`).send({ name: 'Lantern Screen', geometry, targetTopM: 2800, targetBaseM: 3500 });
    expect(p.status).toBe(201);
    const res = await planner.agent.get(`${base}/prospects/${p.body.id}/offset-wells?bufferKm=10`);
    expect(res.status).toBe(200);
    const outline = turf.polygon(geometry.coordinates);
    // Independent reference: turf's point-to-polygon distance (0 inside), computed for every seeded well.
    const expected = WELLS.filter(
      (w) => Math.max(0, turf.pointToPolygonDistance(turf.point([w[1], w[2]]), outline, { units: 'kilometers' })) <= 10,
    ).map((w) => w[0]);
    expect(res.body.map((c: { name: string }) => c.name).sort()).toEqual([...expected].sort());
    for (const c of res.body) {
      const w = WELLS.find((x) => x[0] === c.name)!;
      const ref = Math.max(0, turf.pointToPolygonDistance(turf.point([w[1], w[2]]), outline, { units: 'kilometers' }));
      // Sphere (turf) against the WGS 84 spheroid (PostGIS geography): within 1 % or 20 m.
      expect(Math.abs(c.distanceKm - ref)).toBeLessThan(Math.max(0.02, ref * 0.01));
      // Depth coverage against the base of the target, both below sea level (the CSV gives no datum: 0 m).
      expect(c.tdCoverage).toBeCloseTo(w[4] / 3500, 9);
      expect(c.inOffsetSet).toBe(false);
    }
    // NEAR-1 stands inside the outline: distance 0, and it outranks everything else.
    expect(res.body[0]).toMatchObject({ name: 'NEAR-1', distanceKm: 0 });
  });

  it('refuses a negative or huge buffer by name, and another team gets a 404', async () => {
    const p = (await planner.agent.get(`${base}/prospects`)).body.find((x: { name: string }) => x.name === 'Lantern Screen');
    for (const b of ['-1', '500']) {
      const res = await planner.agent.get(`${base}/prospects/${p.id}/offset-wells?bufferKm=${b}`);
      expect(res.status).toBe(400);
      expect(res.body.error.details[0].path).toBe('bufferKm');
    }
    const other = await freshTeamAgent(ctx, 'Other planning team', 'planner');
    const res = await other.agent.get(`/api/teams/${other.teamId}/prospects/${p.id}/offset-wells`);
    expect(res.status).toBe(404);
  });
});

describe('planned wells and offsets', () => {
  let plannedId: string;

  it('estimates water depth from the nearest wells when none is entered', async () => {
    const res = await planner.agent
      .post(`${base}/planned-wells`)
      .send({ name: 'Lantern-1 (planned)', location: { type: 'Point', coordinates: [-101, -32.5] }, plannedTdM: 4000 });
    expect(res.status).toBe(201);
    plannedId = res.body.id;
    expect(res.body.waterDepthSource).toBe('nearest-wells');
    // Inverse-distance-squared mean of the five nearest within 50 km: pulled hard towards NEAR-1 (110 m, ~0.9 km away).
    expect(res.body.waterDepthM).toBeGreaterThan(108);
    expect(res.body.waterDepthM).toBeLessThan(125);
  });

  it('finds offsets within the radius, with distances and azimuths matching turf', async () => {
    const res = await planner.agent.get(`${base}/planned-wells/${plannedId}/offset-candidates?radiusKm=25`);
    expect(res.status).toBe(200);
    const names = res.body.map((c: { name: string }) => c.name).sort();
    // FAR-5 is ~37 km east, AWAY-6 ~220 km away: both outside 25 km.
    expect(names).toEqual(['MID-3', 'MID-4', 'NEAR-1', 'NEAR-2']);
    const here = turf.point([-101, -32.5]);
    for (const c of res.body) {
      const w = WELLS.find((x) => x[0] === c.name)!;
      const there = turf.point([w[1], w[2]]);
      // turf uses a sphere (R = 6371.0088 km), PostGIS geography the WGS 84 spheroid: agree within 0.5 %.
      expect(Math.abs(c.distanceKm / turf.distance(here, there, { units: 'kilometers' }) - 1)).toBeLessThan(0.005);
      expect(Math.abs(((((c.azimuthDeg - (turf.bearing(here, there) + 360)) % 360) + 540) % 360) - 180)).toBeLessThan(0.5);
      expect(c.tdCoverage).toBeCloseTo(w[4] / 4000, 9);
    }
    // Ranked: the nearest, deep, similar-water-depth well first.
    expect(res.body[0].name).toBe('NEAR-1');
    expect(res.body.map((c: { score: number }) => c.score)).toEqual(
      [...res.body.map((c: { score: number }) => c.score)].sort((a: number, b: number) => b - a),
    );
  });

  it('refuses a radius of 0 or 5,000 km by name', async () => {
    for (const r of ['0', '5000']) {
      const res = await planner.agent.get(`${base}/planned-wells/${plannedId}/offset-candidates?radiusKm=${r}`);
      expect(res.status).toBe(400);
      expect(res.body.error.details[0].path).toBe('radiusKm');
    }
  });

  it('saves the offset set with who and when, and keeps it across reads', async () => {
    const cands = (await planner.agent.get(`${base}/planned-wells/${plannedId}/offset-candidates?radiusKm=25`)).body;
    const pick = cands.slice(0, 2).map((c: { wellId: string }) => ({ wellId: c.wellId, reason: 'nearest with pressure data' }));
    const put = await planner.agent.put(`${base}/planned-wells/${plannedId}/offsets`).send({ wells: pick });
    expect(put.status).toBe(200);
    expect(put.body).toHaveLength(2);
    expect(put.body[0]).toMatchObject({ reason: 'nearest with pressure data', addedBy: planner.userId });
    const again = (await planner.agent.get(`${base}/planned-wells/${plannedId}/offset-candidates?radiusKm=25`)).body;
    expect(again.filter((c: { inOffsetSet: boolean }) => c.inOffsetSet)).toHaveLength(2);
    const other = await freshTeamAgent(ctx, 'Offsets other team', 'planner');
    const foreign = await planner.agent.put(`${base}/planned-wells/${plannedId}/offsets`).send({ wells: [{ wellId: other.userId }] });
    expect(foreign.status).toBe(400);
    expect((await other.agent.get(`/api/teams/${other.teamId}/planned-wells/${plannedId}`)).status).toBe(404);
  });

  it('searches within the prospect outline plus a buffer', async () => {
    const prospect = await planner.agent.post(`${base}/prospects`).send({ name: 'Tight box', geometry: square(-100.99, -32.5, 0.01) });
    const pw = await planner.agent.post(`${base}/planned-wells`).send({
      name: 'Box-1',
      location: { type: 'Point', coordinates: [-100.99, -32.5] },
      plannedTdM: 3500,
      prospectId: prospect.body.id,
      waterDepthM: 100,
    });
    expect(pw.body.waterDepthSource).toBe('entered');
    const res = await planner.agent.get(`${base}/planned-wells/${pw.body.id}/offset-candidates?prospectBufferKm=1`);
    expect(res.body.map((c: { name: string }) => c.name)).toEqual(['NEAR-1']);
  });
});
