import { readFileSync } from 'node:fs';
import { sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { logCurves, wells } from '../../server/db/schema';
import { freshTeamAgent, startTestApp, type TestContext } from './support/testApp';

const las = (name: string) => readFileSync(`tests/fixtures/las/${name}`);

let ctx: TestContext;
let team: Awaited<ReturnType<typeof freshTeamAgent>>;
let base: string;
let wellId: string;

beforeAll(async () => {
  ctx = await startTestApp();
  team = await freshTeamAgent(ctx, 'LAS import tests', 'geoscientist');
  base = `/api/teams/${team.teamId}`;
  // The fixture wells: KESTREL-3 by UWI, KESTREL-3 ST1 by name.
  const header = Buffer.from('name,uwi,lon,lat\nKESTREL-3,100000000000W500,-101.1,-32.5\nKESTREL-3 ST1,,-101.12,-32.52\n');
  const res = await team.agent.post(`${base}/imports`).field('kind', 'wells').attach('file', header, 'kestrel.csv');
  expect(res.status).toBe(201);
  wellId = (await team.agent.get(`${base}/wells?q=100000000000W500`)).body.items[0].id;
});
afterAll(() => ctx.close());

const post = (name: string, fields: Record<string, string> = {}, bytes = las(name)) => {
  let req = team.agent.post(`${base}/imports`).field('kind', 'las');
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req.attach('file', bytes, name);
};

async function curveCount() {
  const r = await ctx.db.execute<{ n: number }>(sql`SELECT count(*)::int AS n FROM ${logCurves} l JOIN ${wells} w ON w.id = l.well_id WHERE w.team_id = ${team.teamId}`);
  return r.rows[0].n;
}

describe('LAS 2.0 import', () => {
  it('previews curves with suggested roles, matched to the well by UWI', async () => {
    const res = await post('minimal-wrap-no-m.las', { dryRun: 'true' });
    expect(res.status).toBe(200);
    expect(res.body.problems).toEqual([]);
    expect(res.body.las.plan).toMatchObject({ matchedBy: 'uwi', wellLabel: 'KESTREL-3', topMdM: 1500, baseMdM: 1502 });
    expect(res.body.preview.map((c: { mnemonic: string; role: string }) => [c.mnemonic, c.role])).toEqual([
      ['DT', 'sonic'],
      ['GR', 'gamma'],
      ['RHOB', 'density'],
      ['ILD', 'resistivity'],
    ]);
  });

  it('commits the curves with NULLs kept as gaps, and the role the user chose', async () => {
    const res = await post('minimal-wrap-no-m.las', { mapping: JSON.stringify({ GR: 'other' }) });
    expect(res.status).toBe(201);
    expect(res.body.outcome.created).toBe(4);
    const logs = await team.agent.get(`${base}/wells/${wellId}/logs`);
    expect(logs.body.find((c: { mnemonic: string }) => c.mnemonic === 'GR').role).toBe('other');
    const gr = logs.body.find((c: { mnemonic: string }) => c.mnemonic === 'GR');
    const data = await team.agent.get(`${base}/wells/${wellId}/logs/${gr.id}`);
    expect(data.body.mdM).toEqual([1500, 1500.5, 1501, 1501.5, 1502]);
    expect(data.body.values[2]).toBeNull(); // −999.25 is the file's NULL (LAS 2.0 §5.5)
  });

  it('reads feet with a negative STEP into ascending metres, matched by WELL name', async () => {
    const res = await post('feet-negative-step.las', { dryRun: 'true' });
    expect(res.body.problems).toEqual([]);
    expect(res.body.las.plan.matchedBy).toBe('name');
    expect(res.body.las.plan.topMdM).toBeLessThan(res.body.las.plan.baseMdM);
    expect(res.body.notes.length).toBeGreaterThan(0);
  });

  it('reads WRAP YES files', async () => {
    const res = await post('wrap-yes.las', { dryRun: 'true', wellId });
    expect(res.body.las.wrap).toBe('YES');
    expect(res.body.problems).toEqual([]);
    expect(res.body.counts.samples).toBeGreaterThan(1);
  });

  it('refuses broken files with the line of each problem and writes nothing', async () => {
    const before = await curveCount();
    for (const name of ['missing-a.las', 'wrong-value-count.las', 'text-in-numbers.las', 'las30.las', 'huge-line.las', 'non-monotonic.las']) {
      const res = await post(name, { wellId });
      expect(res.status, name).toBe(422);
      expect(res.body.error.details.length, name).toBeGreaterThan(0);
      for (const p of res.body.error.details) expect(p.line, name).toBeGreaterThanOrEqual(1);
    }
    expect(await curveCount()).toBe(before);
  });

  it('names the well it cannot match', async () => {
    const text = las('minimal-wrap-no-m.las').toString('utf8').replace('KESTREL-3 ', 'OSPREY-9  ').replace('100000000000W500', '199999999999W599');
    const res = await post('unknown.las', { dryRun: 'true' }, Buffer.from(text));
    expect(res.body.problems).toEqual([
      { line: 12, column: 'WELL', message: 'no well "OSPREY-9" or UWI/API "199999999999W599" in this team; import the well header first or choose the well' },
    ]);
  });

  it('warns about a NULL value that the file does not use', async () => {
    const res = await post('wrong-null-sentinel.las', { dryRun: 'true', wellId });
    expect(res.body.warnings.length).toBeGreaterThan(0);
  });
});
