import { and, eq, inArray, sql } from 'drizzle-orm';
import type { Db } from '../../client';
import { formationTops, logCurves, pressureObservations, surveyStations, wells } from '../../schema';
import { ewktPoint } from '../../schema/geometry';
import { DEFAULT_DEMO_SEED, generateDemoBasin } from './generate';
import { demoWellSpecs } from './layout';
import { writeDemoProspects } from './writeProspects';
import { writeDemoInterpretations } from './writeInterpretations';
import type { DemoWell } from './well';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

/** Rows per INSERT: well under PostgreSQL's 65,535 bind parameters for the widest of these tables. */
const ROWS_PER_INSERT = 2000;
/** Log curves per INSERT: each carries two arrays of thousands of numbers, so a few at a time. */
const CURVES_PER_INSERT = 16;

export interface SeedDemoBasinOptions {
  /** Delete the team's wells (their data goes with them) and write the basin anew. */
  regenerate?: boolean;
  seed?: number;
}

export interface SeedDemoBasinResult {
  /** False when the team already had the demo wells and nothing was written. */
  written: boolean;
  wells: number;
  pressures: number;
  surveyStations: number;
  tops: number;
  logCurves: number;
  ms: number;
}

async function inChunks<T>(rows: T[], size: number, write: (chunk: T[]) => Promise<unknown>) {
  for (let i = 0; i < rows.length; i += size) await write(rows.slice(i, i + size));
}

function wellRow(teamId: string, w: DemoWell) {
  return {
    teamId,
    name: w.name,
    uwi: w.uwi,
    operator: w.operator,
    location: ewktPoint(w.lon, w.lat),
    surfaceX: w.lon,
    surfaceY: w.lat,
    surfaceEpsg: w.surfaceEpsg,
    datumElevationM: w.datumElevationM,
    datumKind: w.datumKind,
    waterDepthM: w.waterDepthM,
    airGapM: w.airGapM,
    offshore: w.offshore,
    spudDate: w.spudDate,
    tdMdM: w.tdMdM,
    tdTvdM: w.tdTvdM,
    status: w.status,
    note: w.note,
    extra: w.extra,
  };
}

async function writeBasin(tx: Tx, teamId: string, demo: DemoWell[]): Promise<Omit<SeedDemoBasinResult, 'written' | 'ms'>> {
  const ids = await tx
    .insert(wells)
    .values(demo.map((w) => wellRow(teamId, w)))
    .returning({ id: wells.id, name: wells.name });
  const idOf = new Map(ids.map((r) => [r.name, r.id]));
  const withId = demo.map((w) => ({ w, wellId: idOf.get(w.name)! }));

  const stations = withId.flatMap(({ w, wellId }) => (w.survey ?? []).map((s, seq) => ({ wellId, seq, ...s })));
  const pressures = withId.flatMap(({ w, wellId }) => w.pressures.map((p) => ({ wellId, ...p })));
  const tops = withId.flatMap(({ w, wellId }) => w.tops.map((t) => ({ wellId, ...t })));
  const curves = withId.flatMap(({ w, wellId }) =>
    w.logs.map((c) => ({
      wellId,
      mnemonic: c.mnemonic,
      unit: c.unit,
      description: c.description,
      role: c.role,
      mdM: Array.from(c.mdM),
      values: Array.from(c.values, (v) => (Number.isNaN(v) ? (null as unknown as number) : v)),
      topMdM: c.mdM[0],
      baseMdM: c.mdM[c.mdM.length - 1],
    })),
  );
  await inChunks(stations, ROWS_PER_INSERT, (chunk) => tx.insert(surveyStations).values(chunk));
  await inChunks(pressures, ROWS_PER_INSERT, (chunk) => tx.insert(pressureObservations).values(chunk));
  await inChunks(tops, ROWS_PER_INSERT, (chunk) => tx.insert(formationTops).values(chunk));
  await inChunks(curves, CURVES_PER_INSERT, (chunk) => tx.insert(logCurves).values(chunk));
  await writeDemoInterpretations(tx, demo, idOf);
  return { wells: ids.length, pressures: pressures.length, surveyStations: stations.length, tops: tops.length, logCurves: curves.length };
}

/**
 * Seeds the synthetic demo basin into a team, in one transaction. Idempotent: when the team already has
 * any of the demo wells (by name) nothing is written, so a user's edits and deletions survive a restart.
 * With `regenerate`, the team's wells are deleted first (their observations, surveys, tops and logs go
 * with them by cascade) and the basin is written anew from the seed.
 * @example
 * const teamId = await seedDemoAccounts(db);
 * await seedDemoBasin(db, teamId);                       // first start: writes 60 wells
 * await seedDemoBasin(db, teamId);                       // later starts: { written: false }
 * await seedDemoBasin(db, teamId, { regenerate: true }); // `npm run seed:demo`
 */
export async function seedDemoBasin(db: Db, teamId: string, options: SeedDemoBasinOptions = {}): Promise<SeedDemoBasinResult> {
  const started = performance.now();
  const seed = options.seed ?? DEFAULT_DEMO_SEED;
  // The names come from the layout alone, so a start with the basin already present costs no physics.
  const names = demoWellSpecs(seed).map((s) => s.name);
  const counts = await db.transaction(async (tx) => {
    // Two set-up runs at once (say, two terminals) must not both write the basin.
    await tx.execute(sql`SELECT pg_advisory_xact_lock(hashtext('porelith-demo-basin'), hashtext(${teamId}))`);
    if (options.regenerate) {
      await tx.delete(wells).where(eq(wells.teamId, teamId));
    } else {
      const present = await tx
        .select({ id: wells.id })
        .from(wells)
        .where(and(eq(wells.teamId, teamId), inArray(wells.name, names)))
        .limit(1);
      if (present.length > 0) return null;
    }
    const written = await writeBasin(tx, teamId, generateDemoBasin(seed).wells);
    await writeDemoProspects(tx, teamId);
    return written;
  });
  const ms = Math.round(performance.now() - started);
  if (!counts) return { written: false, wells: 0, pressures: 0, surveyStations: 0, tops: 0, logCurves: 0, ms };
  return { written: true, ...counts, ms };
}
