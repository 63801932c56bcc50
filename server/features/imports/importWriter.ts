import { and, eq, inArray, sql } from 'drizzle-orm';
import type { LasFile } from '../../../shared/formats/las';
import { computeSurvey } from '../../../shared/trajectory';
import type { Db } from '../../db/client';
import { formationTops, logCurves, pressureObservations, surveyStations, wells } from '../../db/schema';
import { ewktPoint } from '../../db/schema/geometry';
import type { PressurePlanRow, SurveyPlan, TopPlanRow, WellPlanRow } from './csvPlans';
import type { Progress } from './importJobs';
import type { LasPlan } from './lasPlan';
import { tvdFromSurvey } from './wellLookup';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

/** Rows per INSERT: well under PostgreSQL's 65,535 bind parameters for our widest table. */
const CHUNK = 2000;

async function inChunks<T>(rows: T[], phase: string, progress: Progress, write: (chunk: T[]) => Promise<unknown>) {
  for (let i = 0; i < rows.length; i += CHUNK) {
    await write(rows.slice(i, i + CHUNK));
    progress(phase, Math.min(rows.length, i + CHUNK), rows.length);
  }
}

export async function writeWells(tx: Tx, teamId: string, userId: string, uploadId: string, rows: WellPlanRow[], progress: Progress) {
  const toInsert = rows.filter((r) => !r.existingId);
  const toUpdate = rows.filter((r) => r.existingId);
  const columns = (r: WellPlanRow) => ({
    name: r.name,
    uwi: r.uwi,
    operator: r.operator,
    location: ewktPoint(r.lon, r.lat),
    surfaceX: r.surfaceX,
    surfaceY: r.surfaceY,
    surfaceEpsg: r.surfaceEpsg,
    ...(r.datumElevationM !== null && { datumElevationM: r.datumElevationM }),
    ...(r.datumKind !== null && { datumKind: r.datumKind.toUpperCase() }),
    groundElevationM: r.groundElevationM,
    waterDepthM: r.waterDepthM,
    airGapM: r.airGapM,
    ...(r.offshore !== null && { offshore: r.offshore }),
    spudDate: r.spudDate,
    tdMdM: r.tdMdM,
    tdTvdM: r.tdTvdM,
    ...(r.status !== null && { status: r.status }),
    note: r.note,
    updatedBy: userId,
    updatedUploadId: uploadId,
  });
  await inChunks(toInsert, 'writing new wells', progress, (chunk) =>
    tx.insert(wells).values(chunk.map((r) => ({ ...columns(r), teamId, createdBy: userId, createdUploadId: uploadId }))),
  );
  let done = 0;
  for (const r of toUpdate) {
    await tx
      .update(wells)
      .set({ ...columns(r), updatedAt: sql`now()`, version: sql`${wells.version} + 1` })
      .where(and(eq(wells.teamId, teamId), eq(wells.id, r.existingId!)));
    if (++done % 200 === 0) progress('updating wells', done, toUpdate.length);
  }
  return { created: toInsert.length, updated: toUpdate.length };
}

/** Replaces each well's survey, then recomputes the TVD of its observations and tops that came from it. */
export async function writeSurveys(tx: Tx, uploadId: string, plans: SurveyPlan[], progress: Progress) {
  const wellIds = plans.map((p) => p.wellId);
  await tx.delete(surveyStations).where(inArray(surveyStations.wellId, wellIds));
  const rows = plans.flatMap((p) => p.stations.map((s, seq) => ({ wellId: p.wellId, seq, uploadId, ...s })));
  await inChunks(rows, 'writing survey stations', progress, (chunk) => tx.insert(surveyStations).values(chunk));
  let retvd = 0;
  for (const p of plans) {
    const survey = computeSurvey(p.stations);
    for (const table of [pressureObservations, formationTops] as const) {
      const dependent = await tx
        .select({ id: table.id, mdM: table.mdM })
        .from(table)
        .where(and(eq(table.wellId, p.wellId), eq(table.tvdFromSurvey, true)));
      for (const d of dependent) {
        const tvdM = tvdFromSurvey(survey, d.mdM);
        if (table === pressureObservations) {
          // The pressure stays as measured; its EMW follows the new TVD.
          await tx
            .update(pressureObservations)
            .set({ tvdM, emwKgM3: sql`${pressureObservations.pressurePa} / (9.80665 * ${tvdM})` })
            .where(eq(pressureObservations.id, d.id));
        } else {
          await tx.update(formationTops).set({ tvdM }).where(eq(formationTops.id, d.id));
        }
        retvd++;
      }
    }
  }
  return { created: rows.length, wells: plans.length, tvdRecomputed: retvd };
}

export async function writePressures(tx: Tx, uploadId: string, rows: PressurePlanRow[], progress: Progress) {
  await inChunks(rows, 'writing pressure observations', progress, (chunk) =>
    tx.insert(pressureObservations).values(
      chunk.map(({ line: _line, wellName: _name, ...r }) => ({ ...r, uploadId })),
    ),
  );
  return { created: rows.length };
}

export async function writeTops(tx: Tx, uploadId: string, rows: TopPlanRow[], progress: Progress) {
  await inChunks(rows, 'writing formation tops', progress, (chunk) =>
    tx.insert(formationTops).values(chunk.map(({ line: _line, wellName: _name, ...r }) => ({ ...r, uploadId }))),
  );
  return { created: rows.length };
}

/** Each curve becomes one row with its MD index; NULL samples are stored as SQL NULL. */
export async function writeLasCurves(tx: Tx, uploadId: string, las: LasFile, plan: LasPlan, progress: Progress) {
  const md = Array.from(las.index.valuesM);
  const header = {
    version: las.version,
    wrap: las.wrap,
    well: las.well.items,
    curves: [las.index, ...las.curves].map((c) => ({ mnemonic: c.mnemonic, unit: 'rawUnit' in c ? c.rawUnit : c.unit, apiCode: c.apiCode, description: c.description })),
    parameters: las.parameters,
    other: las.other,
  };
  let done = 0;
  for (const c of las.curves) {
    const p = plan.curves.find((x) => x.mnemonic === c.mnemonic)!;
    const values = Array.from(c.values, (v) => (Number.isNaN(v) ? null : v)) as number[];
    await tx.insert(logCurves).values({
      wellId: plan.well!.id,
      mnemonic: c.mnemonic,
      unit: c.unit,
      description: c.description,
      role: p.role,
      mdM: md,
      values,
      topMdM: plan.topMdM,
      baseMdM: plan.baseMdM,
      lasHeader: header,
      uploadId,
    });
    progress('writing log curves', ++done, las.curves.length);
  }
  return { created: las.curves.length };
}
