import { and, asc, eq, sql, type SQL } from 'drizzle-orm';
import type {
  LogCurveData,
  LogCurveSummary,
  PressureObservation,
  SurveyStation,
  WellDetail,
  WellList,
  WellPatchBody,
  WellSummary,
  wellListQuery,
} from '../../../shared/schemas/wells';
import type { z } from 'zod';
import type { Db } from '../../db/client';
import { formationTops, logCurves, pressureObservations, surveyStations, wells } from '../../db/schema';
import { conflict, notFound } from '../../lib/httpError';
import { UNIQUE_VIOLATION, pgErrorCode } from '../../lib/pgError';

type ListQuery = z.output<typeof wellListQuery>;

// Counts per well come from correlated sub-queries so the list stays one round trip. The outer id is
// spelled in full: drizzle renders a column of the selected table unqualified, and inside the sub-query
// a bare "id" would be the sub-query's own.
const outerId = sql.raw('"wells"."id"');
const summaryColumns = {
  id: wells.id,
  name: wells.name,
  uwi: wells.uwi,
  operator: wells.operator,
  lon: sql<number>`ST_X(${wells.location})`,
  lat: sql<number>`ST_Y(${wells.location})`,
  status: wells.status,
  offshore: wells.offshore,
  waterDepthM: wells.waterDepthM,
  tdMdM: wells.tdMdM,
  tdTvdM: wells.tdTvdM,
  spudDate: wells.spudDate,
  pressureCount: sql<number>`(SELECT count(*)::int FROM ${pressureObservations} p WHERE p.well_id = ${outerId})`,
  logCount: sql<number>`(SELECT count(*)::int FROM ${logCurves} l WHERE l.well_id = ${outerId})`,
  hasSurvey: sql<boolean>`EXISTS (SELECT 1 FROM ${surveyStations} s WHERE s.well_id = ${outerId})`,
  hasLot: sql<boolean>`EXISTS (SELECT 1 FROM ${pressureObservations} p WHERE p.well_id = ${outerId} AND p.kind IN ('lot','fit'))`,
  updatedAt: wells.updatedAt,
};

type SummaryRow = { [K in keyof typeof summaryColumns]: unknown };

function toSummary(r: SummaryRow): WellSummary {
  return {
    ...(r as unknown as WellSummary),
    updatedAt: (r.updatedAt as Date).toISOString(),
  };
}

export async function listWells(db: Db, teamId: string, q: ListQuery): Promise<WellList> {
  const where: SQL[] = [eq(wells.teamId, teamId)];
  if (q.q)
    where.push(
      sql`(${wells.name} ILIKE ${'%' + q.q + '%'} OR ${wells.uwi} ILIKE ${'%' + q.q + '%'} OR ${wells.operator} ILIKE ${'%' + q.q + '%'})`,
    );
  if (q.status?.length)
    where.push(
      sql`${wells.status} IN (${sql.join(
        q.status.map((s) => sql`${s}`),
        sql`, `,
      )})`,
    );
  if (q.hasPressures !== undefined) {
    where.push(sql`${q.hasPressures ? sql`` : sql`NOT`} EXISTS (SELECT 1 FROM ${pressureObservations} p WHERE p.well_id = ${outerId})`);
  }
  if (q.bbox) {
    const [w, s, e, n] = q.bbox;
    where.push(sql`${wells.location} && ST_MakeEnvelope(${w}, ${s}, ${e}, ${n}, 4326)`);
  }
  const sortColumn = summaryColumns[q.sort];
  const direction = q.order === 'desc' ? sql`DESC NULLS LAST` : sql`ASC NULLS LAST`;
  const [rows, [{ total }]] = await Promise.all([
    db
      .select(summaryColumns)
      .from(wells)
      .where(and(...where))
      .orderBy(sql`${sortColumn} ${direction}`, asc(wells.name))
      .limit(q.limit)
      .offset(q.offset),
    db
      .select({ total: sql<number>`count(*)::int` })
      .from(wells)
      .where(and(...where)),
  ]);
  return { total, items: rows.map(toSummary) };
}

async function wellRow(db: Db, teamId: string, wellId: string) {
  const [row] = await db
    .select({
      ...summaryColumns,
      surfaceX: wells.surfaceX,
      surfaceY: wells.surfaceY,
      surfaceEpsg: wells.surfaceEpsg,
      datumKind: wells.datumKind,
      datumElevationM: wells.datumElevationM,
      groundElevationM: wells.groundElevationM,
      airGapM: wells.airGapM,
      note: wells.note,
      version: wells.version,
      createdAt: wells.createdAt,
    })
    .from(wells)
    .where(and(eq(wells.teamId, teamId), eq(wells.id, wellId)));
  if (!row) throw notFound('That well');
  return row;
}

export async function getWell(db: Db, teamId: string, wellId: string): Promise<WellDetail> {
  const row = await wellRow(db, teamId, wellId);
  const tops = await db
    .select({
      id: formationTops.id,
      name: formationTops.name,
      mdM: formationTops.mdM,
      tvdM: formationTops.tvdM,
      lithology: formationTops.lithology,
    })
    .from(formationTops)
    .where(eq(formationTops.wellId, wellId))
    .orderBy(formationTops.mdM);
  const [survey] = await db
    .select({
      stations: sql<number>`count(*)::int`,
      maxIncDeg: sql<number>`max(${surveyStations.incDeg})`,
      maxDoglegDegPer30m: sql<number>`max(${surveyStations.doglegDegPer30m})`,
      tdTvdM: sql<number>`max(${surveyStations.tvdM})`,
    })
    .from(surveyStations)
    .where(eq(surveyStations.wellId, wellId));
  return {
    ...toSummary(row),
    surfaceX: row.surfaceX,
    surfaceY: row.surfaceY,
    surfaceEpsg: row.surfaceEpsg,
    datumKind: row.datumKind,
    datumElevationM: row.datumElevationM,
    groundElevationM: row.groundElevationM,
    airGapM: row.airGapM,
    note: row.note,
    version: row.version,
    createdAt: row.createdAt.toISOString(),
    tops,
    survey: survey.stations > 0 ? survey : null,
  };
}

/** Ensures the well belongs to the team before its children are read. */
async function assertWell(db: Db, teamId: string, wellId: string): Promise<void> {
  const [row] = await db
    .select({ id: wells.id })
    .from(wells)
    .where(and(eq(wells.teamId, teamId), eq(wells.id, wellId)));
  if (!row) throw notFound('That well');
}

export async function listPressures(db: Db, teamId: string, wellId: string): Promise<PressureObservation[]> {
  await assertWell(db, teamId, wellId);
  const rows = await db
    .select()
    .from(pressureObservations)
    .where(eq(pressureObservations.wellId, wellId))
    .orderBy(pressureObservations.tvdM);
  return rows.map((r) => ({
    id: r.id,
    kind: r.kind,
    mdM: r.mdM,
    tvdM: r.tvdM,
    valueEntered: r.valueEntered,
    unitEntered: r.unitEntered,
    valueSi: r.pressurePa,
    emwKgM3: r.emwKgM3,
    quality: r.quality,
    fluid: r.fluid,
    observedOn: r.observedOn,
    source: r.source,
  }));
}

export async function listSurvey(db: Db, teamId: string, wellId: string): Promise<SurveyStation[]> {
  await assertWell(db, teamId, wellId);
  return db
    .select({
      mdM: surveyStations.mdM,
      incDeg: surveyStations.incDeg,
      aziDeg: surveyStations.aziDeg,
      tvdM: surveyStations.tvdM,
      northM: surveyStations.northM,
      eastM: surveyStations.eastM,
      doglegDegPer30m: surveyStations.doglegDegPer30m,
    })
    .from(surveyStations)
    .where(eq(surveyStations.wellId, wellId))
    .orderBy(surveyStations.seq);
}

const curveSummaryColumns = {
  id: logCurves.id,
  mnemonic: logCurves.mnemonic,
  unit: logCurves.unit,
  description: logCurves.description,
  role: logCurves.role,
  samples: sql<number>`cardinality(${logCurves.values})`,
  topMdM: logCurves.topMdM,
  baseMdM: logCurves.baseMdM,
  uploadId: logCurves.uploadId,
};

export async function listLogs(db: Db, teamId: string, wellId: string): Promise<LogCurveSummary[]> {
  await assertWell(db, teamId, wellId);
  return db.select(curveSummaryColumns).from(logCurves).where(eq(logCurves.wellId, wellId)).orderBy(logCurves.mnemonic);
}

/**
 * One curve's samples; with `maxPoints`, decimated by min/max per bucket so spikes survive plotting.
 */
export async function getLog(db: Db, teamId: string, wellId: string, curveId: string, maxPoints?: number): Promise<LogCurveData> {
  await assertWell(db, teamId, wellId);
  const [row] = await db
    .select({ ...curveSummaryColumns, mdM: logCurves.mdM, values: logCurves.values })
    .from(logCurves)
    .where(and(eq(logCurves.wellId, wellId), eq(logCurves.id, curveId)));
  if (!row) throw notFound('That log curve');
  const { mdM, values } = maxPoints && row.mdM.length > maxPoints ? decimateMinMax(row.mdM, row.values, maxPoints) : row;
  return { ...row, mdM, values: values.map((v) => (v === null || Number.isNaN(v) ? null : v)) };
}

/** Keeps the first, the minimum and the maximum of each bucket (in depth order). */
export function decimateMinMax(md: number[], values: (number | null)[], maxPoints: number) {
  const buckets = Math.max(1, Math.floor(maxPoints / 2));
  const size = md.length / buckets;
  const outMd: number[] = [];
  const outV: (number | null)[] = [];
  for (let b = 0; b < buckets; b++) {
    const start = Math.floor(b * size);
    const end = Math.min(md.length, Math.floor((b + 1) * size));
    let iMin = -1;
    let iMax = -1;
    for (let i = start; i < end; i++) {
      const v = values[i];
      if (v === null || Number.isNaN(v)) continue;
      if (iMin < 0 || v < (values[iMin] as number)) iMin = i;
      if (iMax < 0 || v > (values[iMax] as number)) iMax = i;
    }
    if (iMin < 0) {
      outMd.push(md[start]);
      outV.push(null);
      continue;
    }
    for (const i of iMin <= iMax ? [iMin, iMax] : [iMax, iMin]) {
      if (outMd.length && outMd[outMd.length - 1] === md[i]) continue;
      outMd.push(md[i]);
      outV.push(values[i]);
    }
  }
  return { mdM: outMd, values: outV };
}

/** Optimistic concurrency: the update applies only to the version the client read. */
export async function patchWell(db: Db, teamId: string, wellId: string, userId: string, body: WellPatchBody): Promise<WellDetail> {
  const { version, ...changes } = body;
  const updated = await db
    .update(wells)
    .set({ ...changes, updatedBy: userId, updatedAt: sql`now()`, version: sql`${wells.version} + 1` })
    .where(and(eq(wells.teamId, teamId), eq(wells.id, wellId), eq(wells.version, version)))
    .returning({ id: wells.id })
    .catch((err: unknown) => {
      if (pgErrorCode(err) === UNIQUE_VIOLATION) throw conflict('Another well in this team already has that name or UWI.');
      throw err;
    });
  if (updated.length === 0) {
    const current = await wellRow(db, teamId, wellId); // 404 when it does not exist
    throw conflict('This well was changed by someone else since you opened it; reload to see their changes.', {
      currentVersion: current.version,
    });
  }
  return getWell(db, teamId, wellId);
}
