import { eq, inArray, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { logCurves, pressureObservations, surveyStations, teams, wells } from '../../server/db/schema';
import { generateDemoBasin, type DemoBasin } from '../../server/db/seed/demoBasin/generate';
import { seedDemoBasin } from '../../server/db/seed/demoBasin/write';
import { freshTeamAgent, signedInAgent, startTestApp, type TestContext } from './support/testApp';

let ctx: TestContext;
let demo: DemoBasin;
const createdTeams: string[] = [];
beforeAll(async () => {
  ctx = await startTestApp();
  demo = generateDemoBasin();
}, 120_000);
afterAll(async () => {
  // Each fresh team holds a whole basin: drop them (wells and data go by cascade).
  if (createdTeams.length) await ctx.db.delete(teams).where(inArray(teams.id, createdTeams));
  await ctx.close();
});

/** Everything the seed wrote for a team, without ids, in a stable order. */
async function contentOf(teamId: string) {
  const ws = await ctx.db
    .select({ id: wells.id, name: wells.name, uwi: wells.uwi, tdMdM: wells.tdMdM })
    .from(wells)
    .where(eq(wells.teamId, teamId))
    .orderBy(wells.name);
  const ids = ws.map((w) => w.id);
  const nameOf = new Map(ws.map((w) => [w.id, w.name]));
  const pressures = await ctx.db
    .select({
      wellId: pressureObservations.wellId,
      kind: pressureObservations.kind,
      mdM: pressureObservations.mdM,
      valueEntered: pressureObservations.valueEntered,
      unit: pressureObservations.unitEntered,
      pa: pressureObservations.pressurePa,
    })
    .from(pressureObservations)
    .where(inArray(pressureObservations.wellId, ids));
  const curves = await ctx.db
    .select({
      wellId: logCurves.wellId,
      mnemonic: logCurves.mnemonic,
      samples: sql<number>`cardinality(${logCurves.values})`,
      sum: sql<number>`(SELECT sum(v) FROM unnest(${logCurves.values}) v)`,
    })
    .from(logCurves)
    .where(inArray(logCurves.wellId, ids));
  const stations = await ctx.db
    .select({ n: sql<number>`count(*)::int` })
    .from(surveyStations)
    .where(inArray(surveyStations.wellId, ids));
  const named = <T extends { wellId: string }>(rows: T[]) =>
    rows
      .map(({ wellId, ...r }) => ({ well: nameOf.get(wellId)!, ...r }))
      .sort((a, b) => JSON.stringify(a).localeCompare(JSON.stringify(b)));
  return { ids, wells: ws.map(({ id: _id, ...w }) => w), pressures: named(pressures), curves: named(curves), stations: stations[0].n };
}

// Most of these seed a whole basin (the idempotence check twice): the timeout guards against a hang, it is no speed
// check, so it is wide enough for a loaded shared machine.
describe('seeding the demo basin', { timeout: 180_000 }, () => {
  it('gives the demo team its ~60 synthetic wells, listed by the wells API', async () => {
    // `npm test` runs the set-up with --demo; seeding again here is a no-op when the basin is there.
    await seedDemoBasin(ctx.db, ctx.demoTeamId);
    const agent = await signedInAgent(ctx, 'viewer@porelith.example');
    const res = await agent.get(`/api/teams/${ctx.demoTeamId}/wells?limit=500`);
    expect(res.status).toBe(200);
    const names = res.body.items.map((w: { name: string }) => w.name);
    expect(names).toEqual(expect.arrayContaining(demo.wells.map((w) => w.name)));
  });

  it('writes every well, observation, survey station, top and curve into a team', async () => {
    const team = await freshTeamAgent(ctx, 'Demo basin seed', 'viewer');
    createdTeams.push(team.teamId);
    const result = await seedDemoBasin(ctx.db, team.teamId);
    expect(result.written).toBe(true);
    expect(result.wells).toBe(60);
    expect(result.pressures).toBe(demo.wells.reduce((n, w) => n + w.pressures.length, 0));
    expect(result.surveyStations).toBe(demo.wells.reduce((n, w) => n + (w.survey?.length ?? 0), 0));
    expect(result.tops).toBe(demo.wells.reduce((n, w) => n + w.tops.length, 0));
    expect(result.logCurves).toBe(240);

    const res = await team.agent.get(`/api/teams/${team.teamId}/wells?limit=500`);
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(60);
    const items: { name: string; lon: number; lat: number; offshore: boolean; waterDepthM: number; tdMdM: number }[] = res.body.items;
    expect(items.map((w) => w.name).sort()).toEqual(demo.wells.map((w) => w.name).sort());
    for (const w of demo.wells) {
      const listed = items.find((x) => x.name === w.name)!;
      expect(listed.lon).toBeCloseTo(w.lon, 9);
      expect(listed.lat).toBeCloseTo(w.lat, 9);
      expect(listed.offshore).toBe(true);
      expect(listed.waterDepthM).toBe(w.waterDepthM);
      expect(listed.tdMdM).toBe(w.tdMdM);
    }

    // A directional well's pressures, survey and logs through the API, as generated.
    const well = demo.wells.find((w) => w.profile !== 'vertical')!;
    const [row] = await ctx.db
      .select({ id: wells.id })
      .from(wells)
      .where(sql`${wells.teamId} = ${team.teamId} AND ${wells.name} = ${well.name}`);
    const base = `/api/teams/${team.teamId}/wells/${row.id}`;
    const pressures = await team.agent.get(`${base}/pressures`);
    expect(pressures.status).toBe(200);
    expect(pressures.body.map((p: { valueSi: number }) => p.valueSi).sort()).toEqual(well.pressures.map((p) => p.pressurePa).sort());
    const survey = await team.agent.get(`${base}/surveys`);
    expect(survey.body).toHaveLength(well.survey!.length);
    expect(survey.body[survey.body.length - 1].tvdM).toBeCloseTo(well.tdTvdM, 6);
    const logs = await team.agent.get(`${base}/logs`);
    expect(logs.body.map((c: { mnemonic: string }) => c.mnemonic).sort()).toEqual(['DT', 'GR', 'RDEP', 'RHOB']);
    expect(logs.body[0].samples).toBe(well.logs[0].mdM.length);
  });

  it('changes nothing when run again, and writes the same data anew on regenerate', async () => {
    const team = await freshTeamAgent(ctx, 'Demo basin idempotence', 'viewer');
    createdTeams.push(team.teamId);
    await seedDemoBasin(ctx.db, team.teamId);
    const before = await contentOf(team.teamId);

    const again = await seedDemoBasin(ctx.db, team.teamId);
    expect(again.written).toBe(false);
    const after = await contentOf(team.teamId);
    expect(after.ids).toEqual(before.ids);
    expect(after).toEqual(before);

    const regenerated = await seedDemoBasin(ctx.db, team.teamId, { regenerate: true });
    expect(regenerated.written).toBe(true);
    const fresh = await contentOf(team.teamId);
    expect(fresh.ids.some((id) => before.ids.includes(id))).toBe(false);
    const { ids: _a, ...freshContent } = fresh;
    const { ids: _b, ...beforeContent } = before;
    expect(freshContent).toEqual(beforeContent);
  });

  it('adds the invented prospects with their planned wells inside them', async () => {
    const team = await freshTeamAgent(ctx, 'Demo prospects', 'planner');
    createdTeams.push(team.teamId);
    await seedDemoBasin(ctx.db, team.teamId);
    const prospects = (await team.agent.get(`/api/teams/${team.teamId}/prospects`)).body;
    expect(prospects.map((p: { name: string }) => p.name).sort()).toEqual(demo.prospects.map((p) => p.name).sort());
    const planned = (await team.agent.get(`/api/teams/${team.teamId}/planned-wells`)).body;
    expect(planned).toHaveLength(demo.prospects.reduce((n, p) => n + p.plannedWells.length, 0));
    const inside = await ctx.db.execute<{ n: number }>(sql`
      SELECT count(*)::int AS n FROM planned_wells pw JOIN prospects p ON p.id = pw.prospect_id
      WHERE pw.team_id = ${team.teamId} AND ST_Contains(p.outline, pw.location)`);
    expect(inside.rows[0].n).toBe(planned.length);
    expect(planned.every((w: { waterDepthSource: string }) => w.waterDepthSource === 'nearest-wells')).toBe(true);
    // The demo offsets are real: a 15 km search around the first planned well finds demo wells.
    const cands = (await team.agent.get(`/api/teams/${team.teamId}/planned-wells/${planned[0].id}/offset-candidates?radiusKm=15`)).body;
    expect(cands.length).toBeGreaterThan(0);
    // Demo wells come with an accepted automatic TOP pick, so surfaces and offsets have something to show.
    const withTop = await Promise.all(
      cands
        .slice(0, 5)
        .map((c: { wellId: string }) => team.agent.get(`/api/teams/${team.teamId}/wells/${c.wellId}/interpretations/current`)),
    );
    const found = withTop.filter((r) => r.status === 200);
    expect(found.length).toBeGreaterThan(0);
    expect(found[0].body).toMatchObject({ version: 1, status: 'accepted', top: { method: 'auto' } });
    const withPick = cands.find((c: { topTvdssM: number | null }) => c.topTvdssM !== null);
    expect(withPick.topTvdssM).toBeGreaterThan(1500);
  });

  it("drills every demo planned well to at least 150 m below the base of its prospect's target", async () => {
    const team = await freshTeamAgent(ctx, 'Demo planned TD', 'planner');
    createdTeams.push(team.teamId);
    await seedDemoBasin(ctx.db, team.teamId);
    const prospects: { id: string; name: string; targetBaseM: number }[] = (await team.agent.get(`/api/teams/${team.teamId}/prospects`))
      .body;
    const planned: { name: string; prospectId: string; plannedTdM: number; datumElevationM: number }[] = (
      await team.agent.get(`/api/teams/${team.teamId}/planned-wells`)
    ).body;
    expect(planned.length).toBeGreaterThan(0);
    for (const w of planned) {
      const p = prospects.find((x) => x.id === w.prospectId)!;
      // Planned TD is MD below the rotary table; the demo wells are vertical, so TVDSS = MD − RT elevation.
      const tdTvdssM = w.plannedTdM - w.datumElevationM;
      expect(tdTvdssM - p.targetBaseM, `${w.name} in ${p.name}`).toBeGreaterThanOrEqual(150);
    }
    // The Fennick Fan target's base is 4,200 m TVDSS: its planned TD must pass 4,350 m TVDSS plus the RT height.
    const fennick = planned.find((w) => w.name.startsWith('Fennick Fan-1'))!;
    expect(fennick.plannedTdM).toBeGreaterThanOrEqual(4_350 + fennick.datumElevationM);
  });
});
