import { readFileSync } from 'node:fs';
import { sql } from 'drizzle-orm';
import proj4 from 'proj4';
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

/** The minimal fixture renamed to a well the team does not have. */
function unknownWell(name = 'OSPREY-9', uwi = '199999999999W599') {
  return las('minimal-wrap-no-m.las').toString('utf8').replace('KESTREL-3 ', name.padEnd(10, ' ')).replace('100000000000W500', uwi);
}

/** Puts ~W items right after WELL (line 12), so they become lines 13 on; lines from '~PARAMETER INFORMATION' on become a ~P section before ~C. */
function withWellItems(text: string, ...lines: string[]) {
  const all = text.split('\n');
  const well = all.findIndex((l) => l.startsWith(' WELL.'));
  const params = lines.indexOf('~PARAMETER INFORMATION');
  const wellItems = params < 0 ? lines : lines.slice(0, params);
  all.splice(well + 1, 0, ...wellItems);
  if (params >= 0)
    all.splice(
      all.findIndex((l) => l.startsWith('~CURVE')),
      0,
      ...lines.slice(params),
    );
  return all.join('\n');
}

async function curveCount() {
  const r = await ctx.db.execute<{ n: number }>(
    sql`SELECT count(*)::int AS n FROM ${logCurves} l JOIN ${wells} w ON w.id = l.well_id WHERE w.team_id = ${team.teamId}`,
  );
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
    for (const name of [
      'missing-a.las',
      'wrong-value-count.las',
      'text-in-numbers.las',
      'las30.las',
      'huge-line.las',
      'non-monotonic.las',
    ]) {
      const res = await post(name, { wellId });
      expect(res.status, name).toBe(422);
      expect(res.body.error.details.length, name).toBeGreaterThan(0);
      for (const p of res.body.error.details) expect(p.line, name).toBeGreaterThanOrEqual(1);
    }
    expect(await curveCount()).toBe(before);
  });

  it('re-imports the same file as an update without duplicating its curves', async () => {
    const before = await curveCount();
    const again = await post('minimal-wrap-no-m.las');
    expect(again.status).toBe(409);
    const res = await post('minimal-wrap-no-m.las', { onDuplicate: 'update' });
    expect(res.status).toBe(201);
    expect(res.body.outcome).toMatchObject({ created: 4, replaced: 4 });
    expect(await curveCount()).toBe(before);
  });

  it('names the well it cannot match, and what the file lacks to create it', async () => {
    const text = unknownWell();
    const res = await post('unknown.las', { dryRun: 'true' }, Buffer.from(text));
    expect(res.body.problems).toEqual([
      {
        line: 12,
        column: 'WELL',
        message:
          'no well named "OSPREY-9" or with UWI/API "199999999999W599" in this team, and the file has no LATI/LONG (or X/Y) in ~W or ~P to create it; import the well header first or choose the well',
      },
    ]);
    const half = await post(
      'half.las',
      { dryRun: 'true' },
      Buffer.from(withWellItems(text, ' LATI.DEG        -32.61                       : LATITUDE')),
    );
    expect(half.body.problems).toEqual([
      {
        line: 12,
        column: 'WELL',
        message:
          'no well named "OSPREY-9" or with UWI/API "199999999999W599" in this team, and the file has LATI but no LONG to create it; import the well header first or choose the well',
      },
    ]);
  });

  it('creates the well from WELL, UWI and LATI/LONG when none matches, saying so in the preview', async () => {
    const text = withWellItems(
      unknownWell(),
      ' LATI.DEG        32 36 36.0 S                 : LATITUDE',
      ' LONG.DEG        -101.215                     : LONGITUDE',
      '~PARAMETER INFORMATION',
      ' EKB .FT         82.0                         : KELLY BUSHING ELEVATION',
    );
    const before = await curveCount();
    const preview = await post('osprey.las', { dryRun: 'true' }, Buffer.from(text));
    expect(preview.body.problems).toEqual([]);
    // 32° 36′ 36″ = 32 + 36/60 + 36/3600 = 32.61° (ISO 6709 sexagesimal degrees); 82 ft × 0.3048 m/ft exactly.
    expect(preview.body.las.plan.createWell).toMatchObject({
      name: 'OSPREY-9',
      uwi: '199999999999W599',
      lon: -101.215,
      surfaceEpsg: 4326,
      datumKind: 'KB',
      operator: 'SYNTHETIC SURVEY CO',
    });
    expect(preview.body.las.plan.createWell.lat).toBeCloseTo(-32.61, 12);
    expect(preview.body.las.plan.createWell.datumElevationM).toBeCloseTo(82 * 0.3048, 12);
    expect(preview.body.counts).toMatchObject({ createWell: 1, valid: 4 });
    expect(preview.body.notes[0]).toEqual({
      line: 12,
      column: 'WELL',
      message:
        'no well "OSPREY-9" or UWI/API "199999999999W599" in this team: the import creates it at lon -101.21500, lat -32.61000 from LATI/LONG (lines 13, 14)',
    });
    // No water depth in the file: onshore/offshore comes from the nearest team well (KESTREL-3 ST1,
    // ~13 km away by the haversine formula), and the preview says so along with what the well lacks.
    expect(preview.body.las.plan.createWell).toMatchObject({ tdMdM: 1502, waterDepthM: null, offshore: false });
    expect(preview.body.notes[1].line).toBe(12);
    expect(preview.body.notes[1].message).toMatch(
      /^the new well "OSPREY-9" has onshore assumed from the nearest team well "KESTREL-3 ST1", 1[34]\.\d km away; TD 1502\.0 m MD taken from the deepest depth of the file, no TD TVD; no spud date; status "drilled" — edit its header before interpreting it$/,
    );
    expect((await team.agent.get(`${base}/wells?q=OSPREY-9`)).body.total).toBe(0);

    const res = await post('osprey.las', {}, Buffer.from(text));
    expect(res.status).toBe(201);
    expect(res.body.outcome).toMatchObject({ created: 4, wellCreated: true, wellName: 'OSPREY-9' });
    // LATI/LONG place it: no EPSG code for X/Y is needed, so the page shows no picker for one.
    expect(preview.body.las.plan.xyOnly).toBe(false);
    const history = (await team.agent.get(`${base}/imports`)).body;
    expect(JSON.stringify(history)).toContain('"wellName":"OSPREY-9"');
    const list = (await team.agent.get(`${base}/wells?q=OSPREY-9`)).body;
    expect(list.total).toBe(1);
    expect(list.items[0]).toMatchObject({ name: 'OSPREY-9', uwi: '199999999999W599' });
    expect(res.body.outcome.wellId).toBe(list.items[0].id);
    expect(list.items[0].lon).toBeCloseTo(-101.215, 9);
    expect(list.items[0].lat).toBeCloseTo(-32.61, 9);
    expect(await curveCount()).toBe(before + 4);
    // The same file again as an update now matches the created well by UWI and replaces its curves.
    const update = await post('osprey.las', { onDuplicate: 'update' }, Buffer.from(text));
    expect(update.body.las.plan.matchedBy).toBe('uwi');
    expect(await curveCount()).toBe(before + 4);
    expect((await team.agent.get(`${base}/wells?q=OSPREY-9`)).body.total).toBe(1);
  });

  it('creates a well offshore with its water depth and TD when the file gives them, and says what it lacks', async () => {
    const text = withWellItems(
      unknownWell('TERN-4', '155555555555W555'),
      ' LATI.DEG        -10.5                        : LATITUDE',
      ' LONG.DEG        40.25                        : LONGITUDE',
      ' WDEP.M          312.5                        : WATER DEPTH',
    );
    const preview = await post('tern.las', { dryRun: 'true' }, Buffer.from(text));
    expect(preview.body.problems).toEqual([]);
    expect(preview.body.las.plan.createWell).toMatchObject({ waterDepthM: 312.5, offshore: true, tdMdM: 1502, datumElevationM: null });
    expect(preview.body.notes[1].message).toBe(
      'the new well "TERN-4" has no rotary-table elevation (EKB, EDF or EPD/APD) in the file: the well is created with RT 0 m; offshore from WDEP (line 15); TD 1502.0 m MD taken from the deepest depth of the file, no TD TVD; no spud date; status "drilled" — edit its header before interpreting it',
    );
    const res = await post('tern.las', {}, Buffer.from(text));
    expect(res.status).toBe(201);
    const well = (await team.agent.get(`${base}/wells/${res.body.outcome.wellId}`)).body;
    expect(well).toMatchObject({ offshore: true, waterDepthM: 312.5, tdMdM: 1502 });
  });

  it('assumes onshore for a new well with no water depth and no team well within 20 km, and says so', async () => {
    const text = withWellItems(
      unknownWell('PLOVER-2', '166666666666W566'),
      ' LATI.DEG  5.5  : LATITUDE',
      ' LONG.DEG  10.25  : LONGITUDE',
      '~PARAMETER INFORMATION',
      ' EPD .M   12.0  : PERMANENT DATUM ELEVATION',
      ' APD .M   9.5  : ABOVE PERMANENT DATUM',
    );
    const preview = await post('plover.las', { dryRun: 'true' }, Buffer.from(text));
    expect(preview.body.problems).toEqual([]);
    // LAS 2.0: the log reference is APD above the permanent datum, which is EPD above sea level.
    expect(preview.body.las.plan.createWell).toMatchObject({ offshore: false, datumElevationM: 21.5, datumKind: 'RT' });
    expect(preview.body.notes[1].message).toContain('onshore assumed: no water depth in the file and no team well within 20 km');
  });

  it('says why an unreadable location cannot create the well, at both lines', async () => {
    const text = withWellItems(
      unknownWell('PETREL-4', '177777777777W577'),
      ' LATI.DEG        -132.61                      : LATITUDE',
      ' LONG.DEG        -101.215                     : LONGITUDE',
    );
    const res = await post('far.las', { dryRun: 'true' }, Buffer.from(text));
    expect(res.body.problems).toEqual([
      {
        line: 12,
        column: 'WELL',
        message:
          'no well named "PETREL-4" or with UWI/API "177777777777W577" in this team, and the location in the file cannot create it (see line 13); import the well header first or choose the well',
      },
      { line: 13, column: 'LATI', message: 'latitude -132.61 is outside −90..90' },
    ]);
  });

  it('creates the well from X/Y only with the EPSG code the user gives', async () => {
    const text = withWellItems(
      unknownWell('HERON-2', '188888888888W588'),
      ' X   .M          500000                       : EASTING',
      ' Y   .M          6400000                      : NORTHING',
    );
    const bare = await post('heron.las', { dryRun: 'true' }, Buffer.from(text));
    expect(bare.body.problems).toEqual([
      {
        line: 12,
        column: 'WELL',
        message:
          'no well named "HERON-2" or with UWI/API "188888888888W588" in this team, and the location in the file cannot create it (see line 13); import the well header first or choose the well',
      },
      { line: 13, column: 'X', message: 'the file gives X/Y but no LATI/LONG: choose the EPSG code of X/Y to create well "HERON-2"' },
    ]);
    expect(bare.body.las.plan.xyOnly).toBe(true);
    const res = await post('heron.las', { dryRun: 'true', epsg: '32713' }, Buffer.from(text));
    expect(res.body.problems).toEqual([]);
    // Reference: proj4 itself, the library the import converts with.
    const [lon, lat] = proj4('+proj=utm +zone=13 +south +datum=WGS84 +units=m +no_defs', 'EPSG:4326', [500000, 6400000]);
    expect(res.body.las.plan.createWell).toMatchObject({ surfaceX: 500000, surfaceY: 6400000, surfaceEpsg: 32713 });
    expect(res.body.las.plan.createWell.lon).toBeCloseTo(lon, 9);
    expect(res.body.las.plan.createWell.lat).toBeCloseTo(lat, 9);
    // Swapped X/Y are refused, saying they may be swapped.
    const swapped = withWellItems(
      unknownWell('HERON-2', '188888888888W588'),
      ' X   .M          6400000                      : EASTING',
      ' Y   .M          500000                       : NORTHING',
    );
    const bad = await post('heron-swapped.las', { dryRun: 'true', epsg: '32713' }, Buffer.from(swapped));
    expect(bad.body.problems).toHaveLength(2);
    expect(bad.body.problems[1]).toMatchObject({ line: 13, column: 'X' });
    expect(bad.body.problems[1].message).toMatch(/are easting and northing swapped/);
  });

  it('refuses a file whose data uses another null marker than its NULL, at the NULL line, with honest sample counts', async () => {
    const res = await post('wrong-null-sentinel.las', { dryRun: 'true', wellId });
    expect(res.body.problems).toEqual([
      {
        line: 8,
        column: 'NULL',
        message:
          "the file's NULL is -999.25 but its data uses -9999 for gaps (9 samples of GR, RHOB, first at line 25); correct NULL in ~W",
      },
    ]);
    const gr = res.body.preview.find((c: { mnemonic: string }) => c.mnemonic === 'GR');
    expect(gr).toMatchObject({ samples: 12, validSamples: 6 });
    const before = await curveCount();
    const commit = await post('wrong-null-sentinel.las', { wellId });
    expect(commit.status).toBe(422);
    expect(await curveCount()).toBe(before);
  });
});
