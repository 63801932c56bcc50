import { readFileSync } from 'node:fs';
import { eq, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { formationTops, pressureObservations, surveyStations, uploads, wells } from '../../server/db/schema';
import { freshTeamAgent, memberAgent, startTestApp, type TestContext } from './support/testApp';

const fixture = (name: string) => readFileSync(`tests/fixtures/imports/${name}`);

let ctx: TestContext;
let team: Awaited<ReturnType<typeof freshTeamAgent>>;

beforeAll(async () => {
  ctx = await startTestApp();
  team = await freshTeamAgent(ctx, 'Import tests', 'geoscientist');
});
afterAll(() => ctx.close());

function post(name: string, kind: string, fields: Record<string, string> = {}, bytes = fixture(name)) {
  let req = team.agent.post(`/api/teams/${team.teamId}/imports`).field('kind', kind);
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req.attach('file', bytes, name);
}

async function counts() {
  const [row] = await ctx.db
    .execute<{ wells: number; pressures: number; tops: number; stations: number; uploads: number }>(
      sql`
    SELECT (SELECT count(*)::int FROM ${wells} WHERE team_id = ${team.teamId}) AS wells,
           (SELECT count(*)::int FROM ${pressureObservations} p JOIN ${wells} w ON w.id = p.well_id WHERE w.team_id = ${team.teamId}) AS pressures,
           (SELECT count(*)::int FROM ${formationTops} t JOIN ${wells} w ON w.id = t.well_id WHERE w.team_id = ${team.teamId}) AS tops,
           (SELECT count(*)::int FROM ${surveyStations} s JOIN ${wells} w ON w.id = s.well_id WHERE w.team_id = ${team.teamId}) AS stations,
           (SELECT count(*)::int FROM ${uploads} WHERE team_id = ${team.teamId}) AS uploads`,
    )
    .then((r) => r.rows);
  return row;
}

describe('well header CSV', () => {
  it('previews without writing: mapping suggested from headers, units from header suffixes', async () => {
    const before = await counts();
    const res = await post('wells-good.csv', 'wells', { dryRun: 'true' });
    expect(res.status).toBe(200);
    expect(res.body.csv.columns).toEqual(
      expect.arrayContaining([
        { name: 'Well Name', field: 'name' },
        { name: 'Longitude', field: 'x' },
        { name: 'Latitude', field: 'y' },
        { name: 'RT (m)', field: 'datumElevation', unit: 'm' },
        { name: 'Water depth (m)', field: 'waterDepth', unit: 'm' },
      ]),
    );
    expect(res.body.problems).toEqual([]);
    expect(res.body.counts).toMatchObject({ records: 3, valid: 3, create: 3, update: 0 });
    // RFC 4180: the quoted name keeps its comma, "" is a quote.
    expect(res.body.preview[2]).toMatchObject({ name: 'TEST-3, sidetrack', operator: 'Quay "North" Ltd (synthetic)', action: 'create' });
    expect(await counts()).toEqual(before);
  });

  it('commits in one go and the wells appear in the list with their location', async () => {
    const res = await post('wells-good.csv', 'wells');
    expect(res.status).toBe(201);
    expect(res.body.outcome).toMatchObject({ created: 3, updated: 0 });
    const list = await team.agent.get(`/api/teams/${team.teamId}/wells?q=TEST&sort=name`);
    expect(list.body.total).toBe(3);
    expect(list.body.items[0]).toMatchObject({ name: 'TEST-1', uwi: 'TX-0001', status: 'drilled', waterDepthM: 120, offshore: true });
    expect(list.body.items[0].lon).toBeCloseTo(-101.2, 9);
    expect(list.body.items[0].lat).toBeCloseTo(-32.4, 9);
  });

  it('detects a re-import of the same file: 409 unless the user chooses update or skip', async () => {
    const again = await post('wells-good.csv', 'wells');
    expect(again.status).toBe(409);
    expect(again.body.error.details.duplicateOf.fileName).toBe('wells-good.csv');
    const before = await counts();
    const skip = await post('wells-good.csv', 'wells', { onDuplicate: 'skip' });
    expect(skip.status).toBe(201);
    expect(skip.body.skipped).toBe(true);
    expect(await counts()).toEqual(before);
    const update = await post('wells-good.csv', 'wells', { onDuplicate: 'update' });
    expect(update.body.outcome).toMatchObject({ created: 0, updated: 3, reimportOf: again.body.error.details.duplicateOf.uploadId });
    expect((await counts()).wells).toBe(before.wells);
  });

  it('reports every bad row by line and column as the file names it, in line order, and writes nothing', async () => {
    const before = await counts();
    const res = await post('wells-bad.csv', 'wells');
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('import_has_problems');
    expect(res.body.error.details).toEqual([
      { line: 3, column: 'Longitude', message: "'abc' is not a number" },
      { line: 4, column: 'Latitude', message: 'latitude -132.4 is outside −90..90' },
      { line: 5, column: 'Well Name', message: 'duplicate well "BAD-1" (first at line 2)' },
      { line: 6, column: 'Latitude', message: 'Latitude or northing is required' },
    ]);
    expect(await counts()).toEqual(before);
  });

  it('lists every problem of a row at once: a bad latitude with a bad date and a bad status', async () => {
    const csv = Buffer.from('name,lon,lat,spud_date,status\nALL-1,-101.2,-132.63,2019-13-45,maybe\n');
    const res = await post('wells-all-problems.csv', 'wells', { dryRun: 'true' }, csv);
    expect(res.status).toBe(200);
    expect(res.body.problems).toEqual([
      { line: 2, column: 'spud_date', message: "'2019-13-45' is not a date (write it as YYYY-MM-DD)" },
      { line: 2, column: 'status', message: expect.stringContaining("'maybe' is not one of") },
      { line: 2, column: 'lat', message: 'latitude -132.63 is outside −90..90' },
    ]);
    expect(res.body.counts).toMatchObject({ records: 1, invalid: 1, valid: 0 });
  });

  it('counts a row with the wrong number of fields as a skipped record', async () => {
    const csv = Buffer.from('name,lon,lat\nR-1,-101.2,-32.4\nR-2,-101.3\nR-3,-101.4,-32.5\n');
    const res = await post('ragged.csv', 'wells', { dryRun: 'true' }, csv);
    expect(res.body.problems).toEqual([{ line: 3, message: 'expected 3 fields, found 2' }]);
    expect(res.body.invalidLines).toEqual([3]);
    expect(res.body.counts).toMatchObject({ records: 3, invalid: 1, valid: 2 });
  });

  it('imports the valid rows only when asked, recording the skipped lines in the upload', async () => {
    const res = await post('wells-bad.csv', 'wells', { skipInvalid: 'true' });
    expect(res.status).toBe(201);
    expect(res.body.outcome.created).toBe(1);
    expect(res.body.outcome.skippedLines).toEqual([3, 4, 5, 6]);
    const [up] = await ctx.db.select().from(uploads).where(eq(uploads.id, res.body.outcome.uploadId));
    expect((up.outcome as { skippedLines: number[] }).skippedLines).toEqual([3, 4, 5, 6]);
    expect(up.content.equals(fixture('wells-bad.csv'))).toBe(true);
  });

  it('reads semicolon-delimited files with decimal commas', async () => {
    const res = await post('wells-semicolon.csv', 'wells', { dryRun: 'true' });
    expect(res.body.csv).toMatchObject({ delimiter: ';', decimalComma: true });
    expect(res.body.preview[0]).toMatchObject({ name: 'SEMI-1', lon: -101.25, lat: -32.41, waterDepthM: 120.5 });
  });

  it('accepts Latin-1 text', async () => {
    const res = await post('wells-latin1.csv', 'wells', { dryRun: 'true' });
    expect(res.body.csv.encoding).toBe('windows-1252');
    expect(res.body.preview[0].operator).toBe('Société Pétrolière (synthetic)');
  });

  it('converts projected coordinates with their EPSG code (WGS 84 / UTM 13S)', async () => {
    const csv = Buffer.from('name,easting,northing\nUTM-1,500000,6400000\n');
    const res = await post('utm.csv', 'wells', { dryRun: 'true', epsg: '32713' }, csv);
    expect(res.body.problems).toEqual([]);
    // Zone 13 central meridian is 105°W; the false easting sits on it (UTM definition, value recalled from memory).
    expect(res.body.preview[0].lon).toBeCloseTo(-105, 6);
    expect(res.body.preview[0].lat).toBeLessThan(-32);
  });

  it('flags a UTM pair with easting and northing swapped, naming the column as the file does', async () => {
    const csv = Buffer.from('name,easting,northing\nUTM-1,500000,6400000\nUTM-2,6400000,500000\n');
    const res = await post('utm-swapped.csv', 'wells', { dryRun: 'true', epsg: '32713' }, csv);
    // Reference: proj4 puts (6 400 000, 500 000) in zone 13S at lon −19.203, 85.8° from the 105°W central meridian.
    expect(res.body.problems).toEqual([
      {
        line: 3,
        column: 'easting',
        message:
          '(6400000, 500000) in EPSG:32713 lies at lon -19.203, 85.8° from the zone 13 central meridian (105°W): are easting and northing swapped, or is the EPSG code wrong?',
      },
    ]);
    expect(res.body.counts).toMatchObject({ valid: 1, invalid: 1 });
  });

  it('names a required field no column maps to', async () => {
    const res = await post('wells-missing-columns.csv', 'wells');
    expect(res.status).toBe(422);
    expect(res.body.error.details).toEqual([
      { line: 1, message: 'no column is mapped to the required field "Longitude or easting" (x)' },
      { line: 1, message: 'no column is mapped to the required field "Latitude or northing" (y)' },
    ]);
  });

  it('refuses empty, binary, unknown-kind and missing files clearly', async () => {
    const empty = await post('empty.csv', 'wells', {}, Buffer.from(''));
    expect(empty.status).toBe(400);
    expect(empty.body.error.message).toBe('empty.csv is empty.');
    const binary = await post('binary.bin', 'wells');
    expect(binary.status).toBe(400);
    expect(binary.body.error.message).toBe('binary.bin: File looks binary, not text');
    const kind = await post('wells-good.csv', 'rocks');
    expect(kind.status).toBe(400);
    expect(kind.body.error.details[0]).toEqual({ path: 'kind', message: 'must be one of wells, surveys, pressures, tops, las' });
    const none = await team.agent.post(`/api/teams/${team.teamId}/imports`).field('kind', 'wells');
    expect(none.status).toBe(400);
    expect(none.body.error.details).toEqual([{ path: 'file', message: 'is required' }]);
  });
});

describe('surveys and pressures', () => {
  it('computes minimum-curvature TVD from a survey, and pressure TVDs from it', async () => {
    const survey = await post('survey-good.csv', 'surveys');
    expect(survey.status).toBe(201);
    expect(survey.body.outcome).toMatchObject({ created: 6, wells: 1 });
    const wellsRes = await team.agent.get(`/api/teams/${team.teamId}/wells?q=TEST-2`);
    const wellId = wellsRes.body.items[0].id;
    const stations = await team.agent.get(`/api/teams/${team.teamId}/wells/${wellId}/surveys`);
    // Straight hold from 2000 m to 4100 m at 30°: ΔTVD = 2100·cos 30° exactly (geometry).
    expect(stations.body[5].tvdM - stations.body[4].tvdM).toBeCloseTo(2100 * Math.cos(Math.PI / 6), 6);
    // TEST-2 has TD 4100 m MD and no TD TVD: the survey, which reaches TD, gives it.
    const detail = (await team.agent.get(`/api/teams/${team.teamId}/wells/${wellId}`)).body;
    expect(detail.tdTvdM).toBeCloseTo(stations.body[5].tvdM, 6);

    const res = await post('pressures-mixed.csv', 'pressures');
    expect(res.status).toBe(201);
    expect(res.body.outcome.created).toBe(4);
    const pressures = await team.agent.get(`/api/teams/${team.teamId}/wells/${wellId}/pressures`);
    const mud = pressures.body.find((p: { kind: string }) => p.kind === 'mud_weight');
    const lot = pressures.body.find((p: { kind: string }) => p.kind === 'lot');
    // Vertical to 500 m, then building: at 2000 m MD the TVD is less than MD.
    expect(mud.tvdM).toBeLessThan(2000);
    expect(mud.tvdM).toBeCloseTo(stations.body[4].tvdM, 6);
    // 1.25 sg mud: EMW 1250 kg/m³; pressure = ρ·g·TVD (g = 9.80665, standard gravity).
    expect(mud.emwKgM3).toBeCloseTo(1250, 6);
    expect(mud.valueSi).toBeCloseTo(1250 * 9.80665 * mud.tvdM, 3);
    // 16.5 ppg: 1 ppg = 119.8264 kg/m³ (12/231 psi/ft per ppg; NIST US gallon).
    expect(lot.emwKgM3).toBeCloseTo(16.5 * 119.826427, 3);
    expect(lot.unitEntered).toBe('ppg');
  });

  it('stores TD TVD from the survey when a new TD lies beyond the last station, straight along its inclination', async () => {
    const header = (td: number) => Buffer.from(`name,lon,lat,td_md (m)\nTDTVD-1,-101.3,-32.3,${td}\n`);
    expect((await post('tdtvd-a.csv', 'wells', {}, header(1000))).status).toBe(201);
    const survey = Buffer.from('well,md (m),inc,azi\nTDTVD-1,0,0,0\nTDTVD-1,500,0,0\nTDTVD-1,1000,60,90\n');
    expect((await post('tdtvd-survey.csv', 'surveys', {}, survey)).status).toBe(201);
    const id = (await team.agent.get(`/api/teams/${team.teamId}/wells?q=TDTVD-1`)).body.items[0].id;
    const stations = (await team.agent.get(`/api/teams/${team.teamId}/wells/${id}/surveys`)).body;
    expect((await team.agent.get(`/api/teams/${team.teamId}/wells/${id}`)).body.tdTvdM).toBeCloseTo(stations[2].tvdM, 6);
    // The header re-imported with TD 1200 m and no TD TVD: 200 m on at 60° adds 200·cos 60° = 100 m (geometry).
    expect((await post('tdtvd-b.csv', 'wells', {}, header(1200))).status).toBe(201);
    expect((await team.agent.get(`/api/teams/${team.teamId}/wells/${id}`)).body.tdTvdM).toBeCloseTo(stations[2].tvdM + 100, 6);
  });

  it('converts psi and MPa values to Pa exactly', async () => {
    const wellsRes = await team.agent.get(`/api/teams/${team.teamId}/wells?q=TEST-1`);
    const pressures = await team.agent.get(`/api/teams/${team.teamId}/wells/${wellsRes.body.items[0].id}/pressures`);
    const [a, b] = pressures.body;
    expect(a.valueSi).toBeCloseTo(3000 * 6894.757293168, 3); // 1 psi = 6894.757293168 Pa (NIST SP 811)
    expect(b.valueSi).toBeCloseTo(27.5e6, 3);
    expect(b.quality).toBe('tight');
    expect(b.kind).toBe('formation_test');
  });

  it('names an unknown well and a value whose unit must be wrong, and writes nothing', async () => {
    const before = await counts();
    const csv = Buffer.from('well,kind,md (m),value,unit\nNOPE-9,kick,1000,1.2,sg\nTEST-1,kick,1000,9000,sg\nTEST-1,kick,1100,1.3,sg\n');
    const res = await post('bad-pressures.csv', 'pressures', {}, csv);
    expect(res.status).toBe(422);
    expect(res.body.error.details).toEqual([
      { line: 2, column: 'well', message: 'no well named or numbered "NOPE-9" in this team; import its header first' },
      { line: 3, column: 'value', message: '9000 sg at 1000 m TVD is an EMW of 9000.00 sg — outside 0.5–3.0 sg; is the unit right?' },
    ]);
    expect(await counts()).toEqual(before);
  });

  it("warns, naming the line, of a pressure or a top below the well's TD, without blocking it", async () => {
    // TEST-1 has TD 3500 m MD (wells-good.csv).
    const csv = Buffer.from('well,kind,md (m),value,unit\nTEST-1,kick,1000,1.2,sg\nTEST-1,kick,9000,1.3,sg\n');
    const res = await post('deep-pressure.csv', 'pressures', { dryRun: 'true' }, csv);
    expect(res.status).toBe(200);
    expect(res.body.problems).toEqual([]);
    expect(res.body.counts.valid).toBe(2);
    expect(res.body.warnings).toEqual([
      {
        line: 3,
        column: 'md (m)',
        message: 'MD 9000.0 m is deeper than the TD of well "TEST-1" (3500.0 m MD): check the depth, its unit, or the well\'s TD',
      },
    ]);
    const tops = await post(
      'deep-top.csv',
      'tops',
      { dryRun: 'true' },
      Buffer.from('well,name,md (m)\nTEST-1,Deep Sand,4000\nTEST-1,Shallow Sand,900\n'),
    );
    expect(tops.body.problems).toEqual([]);
    expect(tops.body.warnings).toEqual([
      {
        line: 2,
        column: 'md (m)',
        message: 'MD 4000.0 m is deeper than the TD of well "TEST-1" (3500.0 m MD): check the depth, its unit, or the well\'s TD',
      },
    ]);
  });

  it('re-imports a pressure file as an update without duplicating its observations', async () => {
    const before = await counts();
    const again = await post('pressures-mixed.csv', 'pressures');
    expect(again.status).toBe(409);
    const update = await post('pressures-mixed.csv', 'pressures', { onDuplicate: 'update' });
    expect(update.status).toBe(201);
    expect(update.body.outcome).toMatchObject({ created: 4, replaced: 4 });
    expect((await counts()).pressures).toBe(before.pressures);
    // and a second update still leaves one import's worth
    await post('pressures-mixed.csv', 'pressures', { onDuplicate: 'update' });
    expect((await counts()).pressures).toBe(before.pressures);
  });

  it('names an unknown chosen unit for a column, with its column, and writes nothing', async () => {
    const before = await counts();
    const csv = Buffer.from('well,kind,md,value\nTEST-1,kick,1000,1.2\n');
    const res = await post('bad-unit.csv', 'pressures', { units: JSON.stringify({ md: 'furlong', value: 'atm', depth: 'm' }) }, csv);
    expect(res.status).toBe(422);
    expect(res.body.error.details).toEqual([
      { line: 1, column: 'md', message: 'unit "furlong" is not one of m, ft' },
      { line: 1, column: 'value', message: 'unit "atm" is not one of psi, kPa, MPa, bar, Pa, ppg, sg, g/cc, kg/m3, psi/ft, kPa/m' },
      {
        line: 1,
        column: 'depth',
        message: 'a unit was chosen for "depth", which is not a numeric field of a pressures import (md, tvd, value)',
      },
    ]);
    expect(await counts()).toEqual(before);
  });

  it('names an unknown unit given row by row, with its line, and writes nothing', async () => {
    const before = await counts();
    const csv = Buffer.from('well,kind,md (m),value,UoM\nTEST-1,kick,1000,1.2,sg\nTEST-1,kick,1100,1.3,stone/ft\n');
    const res = await post('bad-row-unit.csv', 'pressures', {}, csv);
    expect(res.status).toBe(422);
    expect(res.body.error.details).toEqual([
      { line: 3, column: 'UoM', message: "unit 'stone/ft' is not one of psi, kPa, MPa, bar, Pa, ppg, sg, g/cc, kg/m3, psi/ft, kPa/m" },
    ]);
    expect(await counts()).toEqual(before);
  });

  it('reports every bad survey row by line and column, and writes nothing', async () => {
    const before = await counts();
    const res = await post('survey-bad.csv', 'surveys');
    expect(res.status).toBe(422);
    expect(res.body.error.details).toEqual([
      { line: 3, column: 'inc', message: 'inclination 200 is outside 0..180°' },
      { line: 5, column: 'azi', message: 'azimuth 360 is outside 0..360°' },
      { line: 6, column: 'inc', message: "'x' is not a number" },
      { line: 7, column: 'well', message: 'no well named or numbered "GHOST-7" in this team; import its header first' },
      { line: 8, column: 'md (m)', message: 'a second station at MD 500 m for well "TEST-1" (also line 4)' },
    ]);
    expect(await counts()).toEqual(before);
  });

  it('refuses stations out of MD order, naming the line, instead of re-sorting them', async () => {
    const before = await counts();
    const csv = Buffer.from('well,md (m),inc,azi\nTEST-1,0,0,0\nTEST-1,800,5,10\nTEST-1,600,4,10\nTEST-1,1000,6,10\n');
    const res = await post('survey-unsorted.csv', 'surveys', {}, csv);
    expect(res.status).toBe(422);
    expect(res.body.error.details).toEqual([
      {
        line: 4,
        column: 'md (m)',
        message: 'MD 600 m is shallower than MD 800 m at line 3 for well "TEST-1": stations must increase in MD',
      },
    ]);
    expect(await counts()).toEqual(before);
  });

  it('reports progress for an import run as a job', async () => {
    const lines = ['well,md (m),inc,azi'];
    for (let i = 0; i <= 3000; i++) lines.push(`"TEST-3, sidetrack",${i * 1.5},${Math.min(45, i * 0.02)},120`);
    const csv = Buffer.from(lines.join('\n'));
    const start = await post('long-survey.csv', 'surveys', { async: 'true' }, csv);
    expect(start.status).toBe(202);
    let job;
    for (let i = 0; i < 100; i++) {
      job = (await team.agent.get(`/api/teams/${team.teamId}/jobs/${start.body.jobId}`)).body;
      if (job.state !== 'running') break;
      await new Promise((r) => setTimeout(r, 100));
    }
    expect(job.error).toBeUndefined();
    expect(job.state).toBe('done');
    expect(job.phase).toBe('finished');
    expect(job.total).toBe(3001);
    expect(job.result.outcome.created).toBe(3001);
    expect(job.kind).toBe('import');
    // The one job route asks for the right to import before it shows an import job; another team never finds it.
    const viewer = await memberAgent(ctx, team.teamId, 'viewer');
    expect((await viewer.agent.get(`/api/teams/${team.teamId}/jobs/${start.body.jobId}`)).status).toBe(403);
    const other = await freshTeamAgent(ctx, 'Other import team', 'geoscientist');
    expect((await other.agent.get(`/api/teams/${other.teamId}/jobs/${start.body.jobId}`)).status).toBe(404);
    expect((await team.agent.get(`/api/teams/${team.teamId}/imports/jobs/${start.body.jobId}`)).status).toBe(404);
  });
});

describe('formation tops', () => {
  it('imports tops in feet, with TVD from the survey where the well has one', async () => {
    const before = await counts();
    const res = await post('tops-good.csv', 'tops');
    expect(res.status).toBe(201);
    expect(res.body.csv.units.md).toBe('ft');
    expect(res.body.outcome).toMatchObject({ created: 4 });
    expect((await counts()).tops).toBe(before.tops + 4);
    const id = async (q: string) => (await team.agent.get(`/api/teams/${team.teamId}/wells?q=${encodeURIComponent(q)}`)).body.items[0].id;
    const one = (await team.agent.get(`/api/teams/${team.teamId}/wells/${await id('TEST-1')}`)).body;
    // 1 ft = 0.3048 m exactly (International Yard and Pound Agreement, 1959); TEST-1 has no survey, so TVD = MD.
    expect(one.tops.map((t: { name: string; mdM: number; tvdM: number }) => [t.name, t.mdM, t.tvdM])).toEqual([
      ['Seabed Clay', expect.closeTo(600 * 0.3048, 9), expect.closeTo(600 * 0.3048, 9)],
      ['Harrow Sand', expect.closeTo(6560 * 0.3048, 9), expect.closeTo(6560 * 0.3048, 9)],
    ]);
    expect(one.tops[0].lithology).toBe('claystone');
    const twoId = await id('TEST-2');
    const two = (await team.agent.get(`/api/teams/${team.teamId}/wells/${twoId}`)).body;
    const stations = (await team.agent.get(`/api/teams/${team.teamId}/wells/${twoId}/surveys`)).body;
    // 5000 ft = 1524 m MD lies in the build from 1500 m to 2000 m MD: its TVD falls between those stations' TVDs.
    expect(two.tops[0].tvdM).toBeGreaterThan(stations[3].tvdM);
    expect(two.tops[0].tvdM).toBeLessThan(stations[4].tvdM);
  });

  it('re-imports a tops file as an update without duplicating the tops', async () => {
    const before = await counts();
    const res = await post('tops-good.csv', 'tops', { onDuplicate: 'update' });
    expect(res.status).toBe(201);
    expect(res.body.outcome).toMatchObject({ created: 4, replaced: 4 });
    expect(await counts()).toEqual({ ...before, uploads: before.uploads + 1 });
  });

  it('reports every bad tops row by line and column, and writes nothing', async () => {
    const before = await counts();
    const res = await post('tops-bad.csv', 'tops');
    expect(res.status).toBe(422);
    expect(res.body.error.details).toEqual([
      { line: 3, column: 'well', message: 'no well named or numbered "NOPE-1" in this team; import its header first' },
      { line: 4, column: 'top', message: 'Top name is required' },
      { line: 5, column: 'md (m)', message: "'abc' is not a number" },
      { line: 6, column: 'md (m)', message: 'measured depth cannot be negative' },
      { line: 7, message: 'expected 3 fields, found 2' },
    ]);
    expect(await counts()).toEqual(before);
    const preview = await post('tops-bad.csv', 'tops', { dryRun: 'true' });
    expect(preview.body.invalidLines).toEqual([3, 4, 5, 6, 7]);
    expect(preview.body.counts).toMatchObject({ records: 6, invalid: 5, valid: 1 });
  });
});

describe('permissions', () => {
  it('lets a viewer see the upload history but not import', async () => {
    const viewer = await freshTeamAgent(ctx, 'Viewer import tests', 'viewer');
    const res = await viewer.agent
      .post(`/api/teams/${viewer.teamId}/imports`)
      .field('kind', 'wells')
      .attach('file', fixture('wells-good.csv'), 'w.csv');
    expect(res.status).toBe(403);
    expect((await viewer.agent.get(`/api/teams/${viewer.teamId}/imports`)).status).toBe(200);
  });

  it('keeps team B out of team A: no import, no reading', async () => {
    const other = await freshTeamAgent(ctx, 'Other import team', 'admin');
    const res = await other.agent
      .post(`/api/teams/${team.teamId}/imports`)
      .field('kind', 'wells')
      .attach('file', fixture('wells-good.csv'), 'w.csv');
    expect(res.status).toBe(403);
    expect((await other.agent.get(`/api/teams/${team.teamId}/wells`)).status).toBe(403);
    expect((await other.agent.get(`/api/teams/${team.teamId}/imports`)).status).toBe(403);
    // and their own list holds none of team A's wells
    expect((await other.agent.get(`/api/teams/${other.teamId}/wells`)).body.total).toBe(0);
  });
});
