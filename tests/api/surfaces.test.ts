import { sql } from 'drizzle-orm';
import proj4 from 'proj4';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { hiddenTopTvdssM } from '../../server/db/seed/demoBasin/surfaces';
import type { Variogram } from '../../shared/interpolation';
import { predictAll, shiftedCovarianceParameters, trainWithParameters } from '../bench/reference/sakitamKriging';
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

/**
 * Ordinary kriging by an outside library: @sakitam-gis/kriging fed C(h) + L is simple kriging that tends to ordinary
 * kriging as L grows; one Richardson step on L and 2L removes the O(1/L) term (the method and its check against the
 * library: tests/bench/reference/sakitamKriging.ts, tests/unit/interpolation/krigingReference.test.ts).
 */
function referenceKriging(data: { x: number; y: number; value: number }[], v: Variogram, targets: { x: number; y: number }[]) {
  const t = data.map((d) => d.value);
  const x = data.map((d) => d.x);
  const y = data.map((d) => d.y);
  const shift = 1e4 * (v.nugget + v.sill);
  const p1 = predictAll(trainWithParameters(t, x, y, shiftedCovarianceParameters(v, shift)), targets);
  const p2 = predictAll(trainWithParameters(t, x, y, shiftedCovarianceParameters(v, 2 * shift)), targets);
  return targets.map((_, i) => 2 * p2[i] - p1[i]);
}

describe('TOP surfaces over a demo prospect', () => {
  let surfaceId: string;

  it('krige the accepted TOP picks around the prospect, with contours, variogram and cross-validation', async () => {
    const res = await geo
      .post(`${base}/prospects/${prospect.id}/surfaces`)
      .send({ wells: { from: 'prospect', bufferKm: 30 }, cellSizeM: 500, contourIntervalM: 50 });
    expect(res.status).toBe(201);
    surfaceId = res.body.id;
    expect(res.body.wellCount).toBeGreaterThanOrEqual(5);
    expect(res.body.grid.values.length).toBe(res.body.grid.nx * res.body.grid.ny);
    expect(res.body.contours.features.length).toBeGreaterThan(0);
    expect(res.body.variogram.fitted).toBe(true);

    // The same wells and fitted variogram through an outside kriging library give the grid and the cross-validation.
    const { grid, variogram, wells } = res.body as {
      grid: {
        nx: number;
        ny: number;
        cellSizeM: number;
        x0: number;
        y0: number;
        projection: string;
        values: (number | null)[];
        min: number;
        max: number;
      };
      variogram: { model: Variogram };
      wells: { lon: number; lat: number; value: number; predicted: number }[];
    };
    const frame = proj4('EPSG:4326', grid.projection);
    const data = wells.map((w) => {
      const [x, y] = frame.forward([w.lon, w.lat]);
      return { x, y, value: w.value };
    });
    const cells = grid.values.flatMap((value, k) =>
      value === null || k % 5 !== 0
        ? []
        : [{ value, x: grid.x0 + (k % grid.nx) * grid.cellSizeM, y: grid.y0 + Math.floor(k / grid.nx) * grid.cellSizeM }],
    );
    expect(cells.length).toBeGreaterThan(10);
    const expected = referenceKriging(data, variogram.model, cells);
    cells.forEach((c, i) => expect(c.value).toBeCloseTo(expected[i], 2));
    // Leave-one-out: each well estimated from all the others (Isaaks & Srivastava 1989, ch. 15).
    const looPredicted = data.map(
      (d, i) =>
        referenceKriging(
          data.filter((_, j) => j !== i),
          variogram.model,
          [d],
        )[0],
    );
    wells.forEach((w, i) => expect(w.predicted).toBeCloseTo(looPredicted[i], 2));
    const rmse = Math.sqrt(looPredicted.reduce((sum, p, i) => sum + (p - data[i].value) ** 2, 0) / data.length);
    expect(res.body.crossValidation.rmse).toBeCloseTo(rmse, 2);
    // d3-contour bands: one per multiple of the 50 m interval within the grid's range, each at least one cell.
    const levels: number[] = [];
    for (let level = Math.ceil(grid.min / 50) * 50; level <= grid.max; level += 50) levels.push(level);
    expect(levels.length).toBeGreaterThan(3);
    expect(res.body.contours.features.map((f: { properties: { value: number } }) => f.properties.value)).toEqual(levels);
    // Every well's interpretation version is recorded with its value.
    expect(res.body.wells.every((w: { interpretationVersion: number }) => w.interpretationVersion === 1)).toBe(true);
  });

  it('kriges the residuals of a planar regional trend when asked, and stores how it was run', async () => {
    const res = await geo.post(`${base}/prospects/${prospect.id}/surfaces`).send({
      wells: { from: 'prospect', bufferKm: 30 },
      cellSizeM: 500,
      contourIntervalM: 50,
      method: { kind: 'kriging', model: 'exponential', trend: 'planar' },
    });
    expect(res.status).toBe(201);
    expect(res.body.warnings.some((w: string) => w.startsWith('A planar regional trend was removed before kriging'))).toBe(true);
    const again = await geo.get(`${base}/surfaces/${res.body.id}`);
    expect(again.body.params.method.trend).toBe('planar');
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
        job = (await geo.get(`${base}/jobs/${start.body.jobId}`)).body;
        if (job.state !== 'running') break;
        await new Promise((r) => setTimeout(r, 100));
      }
      expect(job.error).toBeUndefined();
      expect(job.state).toBe('done');
      expect(job.kind).toBe('surface');
      expect(job.result.grid.nx).toBeGreaterThan(10);
    }
    // Anyone who may read the team may follow its surface runs (a planner cannot run one); the old URL is gone.
    const planner = await signedInAgent(ctx, 'planner@porelith.example');
    const seen = await planner.get(`${base}/jobs/${a.body.jobId}`);
    expect(seen.status).toBe(200);
    expect(seen.body.result.id).toBeDefined();
    expect((await geo.get(`${base}/surface-jobs/${a.body.jobId}`)).status).toBe(404);
  });

  it('refuses too few wells, too many cells and a lone prospect clearly, storing nothing', async () => {
    const before = (await geo.get(`${base}/prospects/${prospect.id}/surfaces`)).body.length;
    const wells = (await geo.get(`${base}/wells?limit=2`)).body.items.map((w: { id: string }) => w.id);
    const few = await geo.post(`${base}/prospects/${prospect.id}/surfaces`).send({ wells: { from: 'list', wellIds: wells } });
    expect(few.status).toBe(400);
    expect(few.body.error.message).toMatch(
      /^A surface needs at least 3 wells with an accepted TOP pick; \d of the 2 wells found have one\.$/,
    );
    const fine = await geo
      .post(`${base}/prospects/${prospect.id}/surfaces`)
      .send({ wells: { from: 'prospect', bufferKm: 30 }, cellSizeM: 25, extentBufferKm: 50 });
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

/** g, m/s² (standard gravity, CGPM 1901 / NIST SP 330). */
const G = 9.80665;
type AtDepth = { tvdM: number; porePa: number; hydrostaticPa: number; overburdenPa: number; poreEmwKgM3: number; overpressurePa: number };
type RunWell = { wellId: string; name: string; value: number; interpretationVersion: number; atDepth: AtDepth };

describe('surfaces of pore pressure at a depth over the demo prospect', () => {
  const storedCount = async () => (await geo.get(`${base}/prospects/${prospect.id}/surfaces`)).body.length;

  it('maps the pore-pressure EMW at 3000 m TVDSS from each well’s logs, within the normal-brine and overburden EMW', async () => {
    const res = await geo
      .post(`${base}/prospects/${prospect.id}/surfaces`)
      .send({ quantity: 'emw_at_depth', depthTvdssM: 3000, wells: { from: 'prospect', bufferKm: 30 }, cellSizeM: 500 });
    expect(res.status).toBe(201);
    expect(res.body.unit).toBe('kg/m3');
    expect(res.body.depthTvdssM).toBe(3000);
    expect(res.body.rmseM).toBeNull();
    expect(res.body.rmse).toBeGreaterThan(0);
    expect(res.body.name).toMatch(/^Pore-pressure EMW at 3,000 m TVDSS — ordinary kriging/);
    const wells = res.body.wells as RunWell[];
    expect(wells.length).toBeGreaterThanOrEqual(5);
    for (const w of wells) {
      const a = w.atDepth;
      expect(w.value).toBeCloseTo(a.poreEmwKgM3, 6);
      // EMW = P / (g · TVD below the rig datum): the definition of equivalent mud weight.
      expect(a.poreEmwKgM3).toBeCloseTo(a.porePa / (G * a.tvdM), 6);
      // The read depth is 3000 m below sea level, i.e. 3000 m + the rig's height above the sea (22–28 m in the demo).
      expect(a.tvdM).toBeGreaterThan(3020);
      expect(a.tvdM).toBeLessThan(3030);
      const normalEmw = a.hydrostaticPa / (G * a.tvdM);
      const overburdenEmw = a.overburdenPa / (G * a.tvdM);
      // Brine 1030 kg/m³ from sea level, seen from a rig datum ~25 m above it: just under 1030 (common practice, no source).
      expect(normalEmw).toBeGreaterThan(1015);
      expect(normalEmw).toBeLessThan(1030);
      // Overburden EMW of a clastic basin at 3 km lies between brine and grain density, 2650 kg/m³ (quartz; handbook value).
      expect(overburdenEmw).toBeGreaterThan(1900);
      expect(overburdenEmw).toBeLessThan(2650);
      // Pore pressure lies between hydrostatic (small negative excursions of a noisy log allowed) and the overburden.
      expect(a.poreEmwKgM3).toBeGreaterThan(normalEmw - 30);
      expect(a.poreEmwKgM3).toBeLessThan(overburdenEmw);
    }
    // The grid never leaves the range the wells span by much (kriging weights sum to one).
    const emws = wells.map((w) => w.value);
    expect(res.body.grid.min).toBeGreaterThan(Math.min(...emws) - 50);
    expect(res.body.grid.max).toBeLessThan(Math.max(...emws) + 50);
    expect(res.body.contours.features[0].properties.label).toMatch(/kg\/m3$/);
    // Wells of the buffer that were not used are listed with a reason.
    const excluded = res.body.excluded as { name: string; reason: string }[];
    for (const e of excluded) expect(e.reason.length).toBeGreaterThan(5);
  });

  it('maps overpressure: about zero above the top of overpressure, positive deep', async () => {
    const shallow = await geo.post(`${base}/prospects/${prospect.id}/surfaces`).send({
      quantity: 'overpressure_at_depth',
      depthTvdssM: 1200,
      wells: { from: 'prospect', bufferKm: 30 },
      method: { kind: 'idw', power: 2 },
      cellSizeM: 1000,
    });
    expect(shallow.status).toBe(201);
    expect(shallow.body.unit).toBe('Pa');
    // The demo TOP picks lie at 1960–3630 m TVDSS: at 1200 m every well is normally pressured, within the noise of an
    // Eaton reading and below the 0.3 ppg TOP margin (≈ 36 kg/m³ · g · 1225 m ≈ 0.43 MPa; common practice, no source).
    for (const w of shallow.body.wells as RunWell[]) {
      expect(w.value).toBeGreaterThan(-0.5e6);
      expect(w.value).toBeLessThan(0.45e6);
      expect(w.value).toBeCloseTo(w.atDepth.porePa - w.atDepth.hydrostaticPa, 3);
    }
    const deep = await geo
      .post(`${base}/prospects/${prospect.id}/surfaces`)
      .send({ quantity: 'overpressure_at_depth', depthTvdssM: 3800, wells: { from: 'prospect', bufferKm: 30 }, cellSizeM: 1000 });
    expect(deep.status).toBe(201);
    const deepWells = deep.body.wells as RunWell[];
    expect(deepWells.length).toBeGreaterThanOrEqual(3);
    // Below every TOP pick (≤ 3630 m TVDSS) each well is overpressured, and less so than the overburden allows.
    for (const w of deepWells) {
      expect(w.value).toBeGreaterThan(0);
      expect(w.value).toBeLessThan(w.atDepth.overburdenPa - w.atDepth.hydrostaticPa);
    }
    expect(deep.body.grid.min).toBeGreaterThan(0);
    // The wells whose logs stop above 3800 m TVDSS are reported, not silently dropped.
    const used = new Set(deepWells.map((w) => w.wellId));
    const excluded = deep.body.excluded as { wellId: string; name: string; reason: string }[];
    for (const e of excluded) expect(used.has(e.wellId)).toBe(false);
    expect(excluded.length + deepWells.length).toBeGreaterThanOrEqual(shallow.body.wells.length);
    expect(excluded.some((e) => /no accepted interpretation|ends at \d+ m TVDSS, above the depth/.test(e.reason))).toBe(true);
    const [sw, , ne] = deep.body.grid.cornersLonLat;
    const v = await geo.get(`${base}/surfaces/${deep.body.id}/value`).query({ lon: (sw[0] + ne[0]) / 2, lat: (sw[1] + ne[1]) / 2 });
    expect(v.body.unit).toBe('Pa');
  });

  it('refuses a depth deeper than any log with a clear message naming the field, and stores nothing', async () => {
    const before = await storedCount();
    const res = await geo
      .post(`${base}/prospects/${prospect.id}/surfaces`)
      .send({ quantity: 'emw_at_depth', depthTvdssM: 9000, wells: { from: 'prospect', bufferKm: 30 } });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('depth_beyond_logs');
    expect(res.body.error.message).toMatch(
      /^depthTvdssM: no well's pore-pressure curve reaches 9,000 m TVDSS \(the deepest ends at [\d,]+ m TVDSS in .+\); choose a shallower depth\.$/,
    );
    const missing = await geo.post(`${base}/prospects/${prospect.id}/surfaces`).send({ quantity: 'overpressure_at_depth' });
    expect(missing.status).toBe(400);
    expect(missing.body.error.message).toContain('depthTvdssM: is required for overpressure_at_depth');
    expect(await storedCount()).toBe(before);
  });

  it('maps the TOP below the mudline offshore and below the ground onshore', async () => {
    const tvdss = await geo
      .post(`${base}/prospects/${prospect.id}/surfaces`)
      .send({ wells: { from: 'prospect', bufferKm: 30 }, method: { kind: 'idw', power: 2 }, cellSizeM: 1000 });
    const offshore = (tvdss.body.wells as RunWell[]).slice(0, 3);
    // An onshore well beside them: rig floor 310 m above sea level, ground at 302 m, TOP picked 2500 m below the rig floor.
    const [{ content }] = (
      await ctx.db.execute<{ content: unknown }>(
        sql`SELECT content FROM interpretations WHERE well_id = ${offshore[0].wellId} AND status = 'accepted' LIMIT 1`,
      )
    ).rows;
    const [sw, , ne] = tvdss.body.grid.cornersLonLat;
    const [lon, lat] = [(sw[0] + ne[0]) / 2, (sw[1] + ne[1]) / 2];
    const [land] = (
      await ctx.db.execute<{ id: string }>(sql`
        INSERT INTO wells (team_id, name, location, surface_x, surface_y, datum_elevation_m, ground_elevation_m, offshore)
        VALUES (${ctx.demoTeamId}, 'Test onshore well (surfaces)', ST_SetSRID(ST_MakePoint(${lon}, ${lat}), 4326), ${lon}, ${lat}, 310, 302, false) RETURNING id`)
    ).rows;
    try {
      await ctx.db.execute(
        sql`INSERT INTO interpretations (well_id, version, status, content) VALUES (${land.id}, 1, 'accepted', ${JSON.stringify({ ...(content as object), top: { ...(content as { top: object }).top, tvdM: 2500 } })}::jsonb)`,
      );
      const res = await geo.post(`${base}/prospects/${prospect.id}/surfaces`).send({
        quantity: 'top_below_mudline',
        wells: { from: 'list', wellIds: [...offshore.map((w) => w.wellId), land.id] },
        method: { kind: 'idw', power: 2 },
        cellSizeM: 1000,
      });
      expect(res.status).toBe(201);
      expect(res.body.unit).toBe('m');
      const byId = new Map((res.body.wells as RunWell[]).map((w) => [w.wellId, w.value]));
      // Onshore: 2500 m below the rig floor, which stands 310 − 302 = 8 m above the ground.
      expect(byId.get(land.id)).toBeCloseTo(2492, 9);
      const water = (
        await ctx.db.execute<{ id: string; water_depth_m: number }>(
          sql`SELECT id, water_depth_m FROM wells WHERE id IN (${sql.join(
            offshore.map((w) => sql`${w.wellId}::uuid`),
            sql`, `,
          )})`,
        )
      ).rows;
      for (const w of water) {
        // Offshore: below sea level less the water depth.
        const top = offshore.find((o) => o.wellId === w.id)!.value;
        expect(byId.get(w.id)).toBeCloseTo(top - Number(w.water_depth_m), 6);
      }
      expect(res.body.excluded).toEqual([]);
    } finally {
      await ctx.db.execute(sql`DELETE FROM wells WHERE id = ${land.id}`);
    }
  });

  it('reads the value ± standard deviation at a clicked point, and nothing outside the grid', async () => {
    const variogram = { model: 'exponential', nugget: 0, sill: 90_000, range: 20_000 };
    const res = await geo
      .post(`${base}/prospects/${prospect.id}/surfaces`)
      .send({ wells: { from: 'prospect', bufferKm: 30 }, method: { kind: 'kriging', model: 'exponential', variogram }, cellSizeM: 250 });
    expect(res.status).toBe(201);
    // A hand-set variogram is used as given, not fitted.
    expect(res.body.variogram.fitted).toBe(false);
    expect(res.body.variogram.model).toEqual(variogram);
    expect(res.body.method).toBe('ordinary kriging (exponential)');
    const { grid } = res.body;
    // At a cell centre the bilinear read is that cell's value and standard deviation.
    const k = grid.values.findIndex(
      (v: number | null, idx: number) => v !== null && grid.values[idx + 1] !== null && grid.values[idx + grid.nx] !== null,
    );
    const [x, y] = [grid.x0 + (k % grid.nx) * grid.cellSizeM, grid.y0 + Math.floor(k / grid.nx) * grid.cellSizeM];
    const [lon, lat] = proj4(grid.projection, 'EPSG:4326').forward([x, y]);
    const v = await geo.get(`${base}/surfaces/${res.body.id}/value`).query({ lon, lat });
    expect(v.status).toBe(200);
    expect(v.body.unit).toBe('m');
    expect(v.body.value).toBeCloseTo(grid.values[k], 3);
    expect(v.body.stdDev).toBeCloseTo(grid.stdDev[k], 3);
    // Ordinary kriging with no nugget: the standard deviation stays within the sill's (Isaaks & Srivastava 1989, ch. 12).
    expect(v.body.stdDev).toBeGreaterThan(0);
    expect(v.body.stdDev).toBeLessThanOrEqual(Math.sqrt(variogram.sill) * 1.05);
    // Near a well with no nugget the kriged surface honours its value (exact interpolator), up to the cell's blend.
    const w = (res.body.wells as { lon: number; lat: number; value: number }[])[0];
    const atWell = await geo.get(`${base}/surfaces/${res.body.id}/value`).query({ lon: w.lon, lat: w.lat });
    if (atWell.body.value !== null) expect(Math.abs(atWell.body.value - w.value)).toBeLessThan(100);
    const outside = await geo.get(`${base}/surfaces/${res.body.id}/value`).query({ lon: lon + 5, lat });
    expect(outside.body).toMatchObject({ value: null, stdDev: null, unit: 'm' });
    const bad = await geo.get(`${base}/surfaces/${res.body.id}/value`).query({ lon: 400, lat });
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toMatch(/lon must be within/);
  });
});
