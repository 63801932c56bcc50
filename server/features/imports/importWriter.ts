import { and, eq, inArray } from 'drizzle-orm';
import type { LasFile } from '../../../shared/formats/las';
import { computeSurvey } from '../../../shared/trajectory';
import type { Db } from '../../db/client';
import { formationTops, logCurves, pressureObservations, surveyStations, wells } from '../../db/schema';
import { bulkInsert, bulkUpdate, type BulkColumn } from '../../lib/bulkInsert';
import { ewktPoint } from '../../db/schema/geometry';
import type { PressurePlanRow, SurveyPlan, TopPlanRow, WellPlanRow } from './csvPlans';
import type { Progress } from '../../lib/jobs';
import type { LasPlan } from './lasPlan';
import { tvdFromSurvey } from './wellLookup';
import { fillTdTvdFromSurvey } from '../wells/tdTvd';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

const WELL_COLUMNS: BulkColumn[] = [
  ['name', 'text'],
  ['uwi', 'text'],
  ['operator', 'text'],
  // PostGIS separates geometry array elements with ':', so EWKT travels as text and is cast per row.
  ['location', 'text', '$value::geometry'],
  ['surface_x', 'float8'],
  ['surface_y', 'float8'],
  ['surface_epsg', 'int'],
  ['datum_elevation_m', 'float8'],
  ['datum_kind', 'text'],
  ['ground_elevation_m', 'float8'],
  ['water_depth_m', 'float8'],
  ['air_gap_m', 'float8'],
  ['offshore', 'boolean'],
  ['spud_date', 'date'],
  ['td_md_m', 'float8'],
  ['td_tvd_m', 'float8'],
  ['status', 'well_status'],
  ['note', 'text'],
  ['updated_by', 'uuid'],
  ['updated_upload_id', 'uuid'],
];
// A re-import may leave these blank: keep what the well had rather than wiping it.
const KEEP_WHEN_BLANK = new Set(['datum_elevation_m', 'datum_kind', 'offshore', 'status']);

function wellValues(r: WellPlanRow, userId: string, uploadId: string, defaults: boolean): unknown[] {
  return [
    r.name,
    r.uwi,
    r.operator,
    ewktPoint(r.lon, r.lat),
    r.surfaceX,
    r.surfaceY,
    r.surfaceEpsg,
    r.datumElevationM ?? (defaults ? 0 : null),
    r.datumKind?.toUpperCase() ?? (defaults ? 'RT' : null),
    r.groundElevationM,
    r.waterDepthM,
    r.airGapM,
    r.offshore ?? (defaults ? false : null),
    r.spudDate,
    r.tdMdM,
    r.tdTvdM,
    r.status ?? (defaults ? 'drilled' : null),
    r.note,
    userId,
    uploadId,
  ];
}

export async function writeWells(tx: Tx, teamId: string, userId: string, uploadId: string, rows: WellPlanRow[], progress: Progress) {
  const toInsert = rows.filter((r) => !r.existingId);
  const toUpdate = rows.filter((r) => r.existingId);
  await bulkInsert(
    tx,
    'wells',
    [['team_id', 'uuid'], ['created_by', 'uuid'], ['created_upload_id', 'uuid'], ...WELL_COLUMNS],
    toInsert.map((r) => [teamId, userId, uploadId, ...wellValues(r, userId, uploadId, true)]),
    (done, total) => progress('writing new wells', done, total),
  );
  await bulkUpdate(
    tx,
    'wells',
    ['id', 'uuid'],
    [
      ...WELL_COLUMNS.map(
        ([name, type, expression]) => [name, type, KEEP_WHEN_BLANK.has(name) ? `COALESCE($value, t.${name})` : expression] as const,
      ),
      ['version', 'int', 't.version + 1'],
      ['updated_at', 'timestamptz', 'now()'],
    ],
    toUpdate.map((r) => [r.existingId, ...wellValues(r, userId, uploadId, false), null, null]),
  );
  progress('updating wells', toUpdate.length, toUpdate.length);
  // A new TD on a surveyed well with no TD TVD gets one from the survey (new wells have no survey yet).
  // Its own WHERE keeps to wells with a TD (MD) and no TD TVD.
  await fillTdTvdFromSurvey(
    tx,
    toUpdate.map((r) => r.existingId!),
  );
  return { created: toInsert.length, updated: toUpdate.length };
}

/** Replaces each well's survey, then recomputes the TVD of its observations and tops that came from it. */
export async function writeSurveys(tx: Tx, uploadId: string, plans: SurveyPlan[], progress: Progress) {
  const wellIds = plans.map((p) => p.wellId);
  await tx.delete(surveyStations).where(inArray(surveyStations.wellId, wellIds));
  const rows = plans.flatMap((p) =>
    p.stations.map((s, seq) => [p.wellId, seq, s.mdM, s.incDeg, s.aziDeg, s.tvdM, s.northM, s.eastM, s.doglegDegPer30m, uploadId]),
  );
  await bulkInsert(
    tx,
    'survey_stations',
    [
      ['well_id', 'uuid'],
      ['seq', 'int'],
      ['md_m', 'float8'],
      ['inc_deg', 'float8'],
      ['azi_deg', 'float8'],
      ['tvd_m', 'float8'],
      ['north_m', 'float8'],
      ['east_m', 'float8'],
      ['dogleg_deg_per30m', 'float8'],
      ['upload_id', 'uuid'],
    ],
    rows,
    (done, total) => progress('writing survey stations', done, total),
  );
  const surveys = new Map(plans.map((p) => [p.wellId, computeSurvey(p.stations)]));
  let retvd = 0;
  for (const table of [pressureObservations, formationTops] as const) {
    const dependent = await tx
      .select({ id: table.id, wellId: table.wellId, mdM: table.mdM })
      .from(table)
      .where(and(inArray(table.wellId, wellIds), eq(table.tvdFromSurvey, true)));
    const updates = dependent.map((d) => [d.id, tvdFromSurvey(surveys.get(d.wellId), d.mdM)]);
    // The pressure stays as measured; its EMW follows the new TVD.
    const extra = table === pressureObservations ? ([['emw_kg_m_3', 'float8', `t.pressure_pa / (9.80665 * u.c1)`]] as const) : [];
    await bulkUpdate(
      tx,
      table === pressureObservations ? 'pressure_observations' : 'formation_tops',
      ['id', 'uuid'],
      [['tvd_m', 'float8'], ...extra],
      updates.map((u) => (extra.length ? [...u, null] : u)),
    );
    retvd += updates.length;
  }
  await fillTdTvdFromSurvey(tx, wellIds);
  return { created: rows.length, wells: plans.length, tvdRecomputed: retvd };
}

export async function writePressures(tx: Tx, uploadId: string, rows: PressurePlanRow[], progress: Progress) {
  await bulkInsert(
    tx,
    'pressure_observations',
    [
      ['well_id', 'uuid'],
      ['kind', 'pressure_kind'],
      ['md_m', 'float8'],
      ['tvd_m', 'float8'],
      ['tvd_from_survey', 'boolean'],
      ['value_entered', 'float8'],
      ['unit_entered', 'text'],
      ['pressure_pa', 'float8'],
      ['emw_kg_m_3', 'float8'],
      ['quality', 'pressure_quality'],
      ['fluid', 'text'],
      ['observed_on', 'date'],
      ['source', 'text'],
      ['upload_id', 'uuid'],
    ],
    rows.map((r) => [
      r.wellId,
      r.kind,
      r.mdM,
      r.tvdM,
      r.tvdFromSurvey,
      r.valueEntered,
      r.unitEntered,
      r.pressurePa,
      r.emwKgM3,
      r.quality,
      r.fluid,
      r.observedOn,
      r.source,
      uploadId,
    ]),
    (done, total) => progress('writing pressure observations', done, total),
  );
  return { created: rows.length };
}

export async function writeTops(tx: Tx, uploadId: string, rows: TopPlanRow[], progress: Progress) {
  await bulkInsert(
    tx,
    'formation_tops',
    [
      ['well_id', 'uuid'],
      ['name', 'text'],
      ['md_m', 'float8'],
      ['tvd_m', 'float8'],
      ['tvd_from_survey', 'boolean'],
      ['lithology', 'text'],
      ['upload_id', 'uuid'],
    ],
    rows.map((r) => [r.wellId, r.name, r.mdM, r.tvdM, r.tvdFromSurvey, r.lithology, uploadId]),
    (done, total) => progress('writing formation tops', done, total),
  );
  return { created: rows.length };
}

/**
 * Deletes the observations, tops and log curves that the given uploads wrote, so a re-import chosen
 * as "update" replaces them. Wells are updated in place by name/UWI and surveys are replaced per well
 * by their own writers, so neither is deleted here (other data of the team may hang on a well).
 */
export async function removeRowsOfUploads(tx: Tx, uploadIds: string[]): Promise<number> {
  if (uploadIds.length === 0) return 0;
  let removed = 0;
  for (const table of [pressureObservations, formationTops, logCurves] as const) {
    removed += (await tx.delete(table).where(inArray(table.uploadId, uploadIds)).returning({ id: table.id })).length;
  }
  return removed;
}

/**
 * Each curve becomes one row with its MD index; NULL samples are stored as SQL NULL. A well the plan
 * creates is inserted first, in the same transaction, with this upload as its provenance.
 */
export async function writeLasCurves(
  tx: Tx,
  teamId: string,
  userId: string,
  uploadId: string,
  las: LasFile,
  plan: LasPlan,
  progress: Progress,
) {
  let wellId = plan.well?.id;
  const nw = plan.createWell;
  if (!wellId && nw) {
    const [created] = await tx
      .insert(wells)
      .values({
        teamId,
        name: nw.name,
        uwi: nw.uwi,
        operator: nw.operator,
        location: ewktPoint(nw.lon, nw.lat),
        surfaceX: nw.surfaceX,
        surfaceY: nw.surfaceY,
        surfaceEpsg: nw.surfaceEpsg,
        ...(nw.datumElevationM !== null && nw.datumKind ? { datumElevationM: nw.datumElevationM, datumKind: nw.datumKind } : {}),
        groundElevationM: nw.groundElevationM,
        waterDepthM: nw.waterDepthM,
        tdMdM: nw.tdMdM,
        // settleOffshore has run in planning; false only guards a plan built without it.
        offshore: nw.offshore ?? false,
        createdUploadId: uploadId,
        updatedUploadId: uploadId,
        createdBy: userId,
        updatedBy: userId,
      })
      .returning({ id: wells.id });
    wellId = created.id;
  }
  if (!wellId) throw new Error('writeLasCurves: the plan has neither a well nor a well to create');
  const md = Array.from(las.index.valuesM);
  const header = {
    version: las.version,
    wrap: las.wrap,
    well: las.well.items,
    curves: [las.index, ...las.curves].map((c) => ({
      mnemonic: c.mnemonic,
      unit: 'rawUnit' in c ? c.rawUnit : c.unit,
      apiCode: c.apiCode,
      description: c.description,
    })),
    parameters: las.parameters,
    other: las.other,
  };
  let done = 0;
  for (const c of las.curves) {
    const p = plan.curves.find((x) => x.mnemonic === c.mnemonic)!;
    const values = Array.from(c.values, (v) => (Number.isNaN(v) ? null : v)) as number[];
    await tx.insert(logCurves).values({
      wellId,
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
  // The upload history names the well: ids mean nothing to a reader of the list.
  return { created: las.curves.length, wellCreated: !plan.well && !!nw, wellId, wellName: plan.well?.name ?? nw?.name ?? null };
}
