import { FT_M } from '../../../shared/units';
import { and, desc, eq, sql, type SQL } from 'drizzle-orm';
import type { z } from 'zod';
import {
  AT_DEPTH_QUANTITIES,
  SURFACE_QUANTITY_LABELS,
  surfaceRequestBody,
  surfaceSiUnit,
  type Surface,
  type SurfaceExcludedWell,
  type SurfaceQuantity,
  type SurfaceSummary,
} from '../../../shared/schemas/surfaces';
import type { Db } from '../../db/client';
import { surfaces, users } from '../../db/schema';
import { badRequest, notFound } from '../../lib/httpError';
import type { Progress } from '../../lib/jobs';
import { currentInterpretationOf } from '../interpretations/currentInterpretation';
import { getPlannedWell } from '../planning/plannedWells.service';
import { getProspect } from '../prospects/prospects.service';
import { profileWellOf, valuesAtDepth, type WellRow } from './atDepth.service';
import type { SurfaceInputPoint } from '../../../shared/interpolation/surface';
import { runSurfaceInWorker } from './runInWorker';

type Params = z.output<typeof surfaceRequestBody>;

type Candidate = WellRow & { top_tvd_m: number | null };

/** Each well with its current interpretation (its TOP, if any, and the whole content for profiles). */
const withTop = (db: Db, where: SQL) => {
  const i = currentInterpretationOf(db, sql`w.id`);
  return sql`
  SELECT w.id, w.name, ST_X(w.location) AS lon, ST_Y(w.location) AS lat, w.datum_elevation_m, w.water_depth_m,
    w.air_gap_m, w.ground_elevation_m, w.offshore, ${i.version} AS version, ${i.content} AS content, ${i.topTvdM} AS top_tvd_m
  FROM wells w
  LEFT JOIN LATERAL ${i} ON true
  WHERE ${where}
  ORDER BY w.name`;
};

const listNames = (wells: { name: string }[]) =>
  `${wells
    .slice(0, 10)
    .map((w) => w.name)
    .join(', ')}${wells.length > 10 ? ', …' : ''}`;

async function candidates(db: Db, teamId: string, prospectId: string, params: Params): Promise<Candidate[]> {
  const src = params.wells;
  if (src.from === 'prospect') {
    const rows = (
      await db.execute<Candidate>(
        withTop(
          db,
          sql`w.team_id = ${teamId} AND ST_DWithin(w.location::geography, (SELECT outline FROM prospects WHERE id = ${prospectId})::geography, ${src.bufferKm * 1000})`,
        ),
      )
    ).rows;
    if (rows.length === 0)
      throw badRequest('no_wells', `No wells lie within ${src.bufferKm} km of this prospect; widen the buffer or list the wells.`);
    return rows;
  }
  if (src.from === 'offset-set') {
    await getPlannedWell(db, teamId, src.plannedWellId);
    const rows = (
      await db.execute<Candidate>(
        withTop(db, sql`w.team_id = ${teamId} AND w.id IN (SELECT well_id FROM offset_picks WHERE planned_well_id = ${src.plannedWellId})`),
      )
    ).rows;
    if (rows.length === 0) throw badRequest('no_wells', 'That planned well has no offset wells picked yet.');
    return rows;
  }
  const rows = (
    await db.execute<Candidate>(
      withTop(
        db,
        sql`w.team_id = ${teamId} AND w.id IN (${sql.join(
          src.wellIds.map((i) => sql`${i}::uuid`),
          sql`, `,
        )})`,
      ),
    )
  ).rows;
  if (rows.length < src.wellIds.length)
    throw badRequest('validation_failed', `${src.wellIds.length - rows.length} of the listed wells are not wells of this team.`);
  return rows;
}

/** TOP depths below sea level, or below the mudline (offshore) or the ground (onshore). */
function topPoints(rows: Candidate[], params: Params) {
  const points: SurfaceInputPoint[] = [];
  const excluded: SurfaceExcludedWell[] = [];
  for (const r of rows) {
    if (r.top_tvd_m === null) {
      excluded.push({ wellId: r.id, name: r.name, reason: 'no accepted TOP pick' });
      continue;
    }
    const tvdss = Number(r.top_tvd_m) - Number(r.datum_elevation_m);
    let value = tvdss;
    if (params.quantity === 'top_below_mudline') {
      if (r.water_depth_m !== null) value = tvdss - Number(r.water_depth_m);
      else if (r.offshore) {
        excluded.push({ wellId: r.id, name: r.name, reason: 'offshore well without a water depth' });
        continue;
      } else {
        // On land the "mudline" is the ground: TOP TVD below the rig datum less the rig's height above the ground.
        value = Number(r.top_tvd_m) - profileWellOf(r).airGapM;
      }
    }
    points.push({ wellId: r.id, name: r.name, lon: Number(r.lon), lat: Number(r.lat), value, interpretationVersion: r.version });
  }
  const noTop = excluded.filter((e) => e.reason === 'no accepted TOP pick');
  const noWater = excluded.filter((e) => e.reason !== 'no accepted TOP pick');
  const warnings: string[] = [];
  if (noTop.length) warnings.push(`${noTop.length} well(s) have no accepted TOP pick and were left out: ${listNames(noTop)}.`);
  if (noWater.length) warnings.push(`${noWater.length} offshore well(s) have no water depth and were left out: ${listNames(noWater)}.`);
  if (points.length < 3) {
    throw badRequest(
      'too_few_wells',
      `A surface needs at least 3 wells with an accepted TOP pick; ${points.length} of the ${rows.length} wells found have one.`,
      { warnings, excluded },
    );
  }
  return { points, excluded, warnings };
}

async function atDepthPoints(db: Db, rows: Candidate[], params: Params, progress: Progress) {
  const depth = params.depthTvdssM!;
  const { points, excluded, reach } = await valuesAtDepth(db, rows, params.quantity, depth, progress);
  if (points.length === 0 && reach && reach.baseTvdssM < depth) {
    throw badRequest(
      'depth_beyond_logs',
      `depthTvdssM: no well's pore-pressure curve reaches ${depthText(depth, params.depthUnit)} TVDSS (the deepest ends at ${depthText(reach.baseTvdssM, params.depthUnit, 0)} TVDSS in ${reach.name}); choose a shallower depth.`,
      { excluded },
    );
  }
  const warnings = excluded.length
    ? [
        `${excluded.length} of the ${rows.length} wells have no pore pressure at ${depthText(depth, params.depthUnit)} TVDSS and were left out (see the list of wells left out).`,
      ]
    : [];
  if (points.length < 3) {
    throw badRequest(
      'too_few_wells',
      `A surface needs at least 3 wells with a pore pressure at ${depthText(depth, params.depthUnit)} TVDSS; ${points.length} of the ${rows.length} wells found have one.`,
      { warnings, excluded },
    );
  }
  return { points, excluded, warnings };
}

/**
 * A depth in the unit it was entered in, rounded to what was typed (10,000 ft, not 3048 m).
 * @example depthText(3048, 'ft') // '10,000 ft'
 */
export function depthText(depthM: number, unit: 'm' | 'ft' = 'm', digits = 1): string {
  const shown = unit === 'ft' ? depthM / FT_M : depthM;
  return `${shown.toLocaleString('en-US', { maximumFractionDigits: digits })} ${unit}`;
}

/** Gathers the wells, computes off the main thread, and stores the run. */
export async function createSurface(
  db: Db,
  teamId: string,
  userId: string,
  prospectId: string,
  params: Params,
  progress: Progress = () => {},
): Promise<Surface> {
  const prospect = await getProspect(db, teamId, prospectId);
  progress('gathering wells', 0, 1);
  const rows = await candidates(db, teamId, prospectId, params);
  const { points, excluded, warnings } = AT_DEPTH_QUANTITIES.includes(params.quantity)
    ? await atDepthPoints(db, rows, params, progress)
    : topPoints(rows, params);
  const result = await runSurfaceInWorker({ points, outline: prospect.geometry, params }, progress);
  progress('saving', 0, 1);
  const method =
    params.method.kind === 'kriging'
      ? `ordinary kriging (${result.variogram?.model.model})`
      : `inverse distance (power ${params.method.power})`;
  const at =
    params.depthTvdssM !== undefined && AT_DEPTH_QUANTITIES.includes(params.quantity)
      ? ` at ${depthText(params.depthTvdssM, params.depthUnit)} TVDSS`
      : '';
  // "EMW at a depth" + " at 3,000 m TVDSS" would say "at" twice: the depth replaces the words.
  const label = at ? SURFACE_QUANTITY_LABELS[params.quantity].replace(/ at a depth$/, '') : SURFACE_QUANTITY_LABELS[params.quantity];
  const name = params.name ?? `${label}${at} — ${method}`;
  const { grid, ...rest } = result;
  const [row] = await db
    .insert(surfaces)
    .values({
      teamId,
      prospectId,
      name,
      quantity: params.quantity,
      method,
      params: params as unknown as Record<string, unknown>,
      nx: grid.nx,
      ny: grid.ny,
      cellSizeM: grid.cellSizeM,
      projection: grid.projection,
      x0: grid.x0,
      y0: grid.y0,
      values: grid.values as number[],
      stdDev: grid.stdDev as number[] | null,
      extent: sql`ST_SetSRID(ST_GeomFromGeoJSON(${JSON.stringify(result.extent)}), 4326)` as unknown as string,
      result: {
        ...rest,
        excluded,
        warnings: [...warnings, ...rest.warnings],
        cornersLonLat: grid.cornersLonLat,
        min: grid.min,
        max: grid.max,
      },
      rmseM: result.crossValidation.rmse,
      wellCount: result.wells.length,
      createdBy: userId,
    })
    .returning({ id: surfaces.id });
  return getSurface(db, teamId, row.id);
}

const summaryColumns = {
  id: surfaces.id,
  prospectId: surfaces.prospectId,
  name: surfaces.name,
  quantity: surfaces.quantity,
  method: surfaces.method,
  cellSizeM: surfaces.cellSizeM,
  wellCount: surfaces.wellCount,
  rmseM: surfaces.rmseM,
  params: surfaces.params,
  createdBy: surfaces.createdBy,
  createdByName: users.name,
  createdAt: surfaces.createdAt,
};

/** The summary fields of a stored row: the unit follows the quantity; `rmseM` only where the unit is metres. */
type SummaryRow = {
  id: string;
  prospectId: string;
  name: string;
  quantity: string;
  method: string;
  cellSizeM: number;
  wellCount: number;
  rmseM: number | null;
  params: Record<string, unknown>;
  createdBy: string | null;
  createdByName: string | null;
  createdAt: Date;
};

function summaryOf(r: SummaryRow): SurfaceSummary {
  const quantity = r.quantity as SurfaceQuantity;
  const unit = surfaceSiUnit(quantity);
  const depth = (r.params as { depthTvdssM?: number }).depthTvdssM;
  return {
    id: r.id,
    prospectId: r.prospectId,
    name: r.name,
    quantity,
    method: r.method,
    cellSizeM: r.cellSizeM,
    wellCount: r.wellCount,
    unit,
    depthTvdssM: AT_DEPTH_QUANTITIES.includes(quantity) ? (depth ?? null) : null,
    // The rmse_m column holds the RMSE in the quantity's unit; it is only named metres where it is metres.
    rmse: r.rmseM,
    rmseM: unit === 'm' ? r.rmseM : null,
    createdBy: r.createdBy,
    createdByName: r.createdByName,
    createdAt: r.createdAt.toISOString(),
  };
}

export async function listSurfaces(db: Db, teamId: string, prospectId: string): Promise<SurfaceSummary[]> {
  await getProspect(db, teamId, prospectId);
  const rows = await db
    .select(summaryColumns)
    .from(surfaces)
    .leftJoin(users, eq(users.id, surfaces.createdBy))
    .where(and(eq(surfaces.teamId, teamId), eq(surfaces.prospectId, prospectId)))
    .orderBy(desc(surfaces.createdAt));
  return rows.map(summaryOf);
}

export async function getSurface(db: Db, teamId: string, id: string): Promise<Surface> {
  const [row] = await db
    .select({
      ...summaryColumns,
      nx: surfaces.nx,
      ny: surfaces.ny,
      projection: surfaces.projection,
      x0: surfaces.x0,
      y0: surfaces.y0,
      values: surfaces.values,
      stdDev: surfaces.stdDev,
      result: surfaces.result,
    })
    .from(surfaces)
    .leftJoin(users, eq(users.id, surfaces.createdBy))
    .where(and(eq(surfaces.teamId, teamId), eq(surfaces.id, id)));
  if (!row) throw notFound('That surface');
  const r = row.result as unknown as Omit<Surface, 'grid'> & { cornersLonLat: [number, number][]; min: number; max: number };
  return {
    ...summaryOf(row),
    params: row.params,
    grid: {
      nx: row.nx,
      ny: row.ny,
      cellSizeM: row.cellSizeM,
      projection: row.projection,
      x0: row.x0,
      y0: row.y0,
      values: row.values,
      stdDev: row.stdDev,
      cornersLonLat: r.cornersLonLat,
      min: r.min,
      max: r.max,
    },
    contours: r.contours,
    extent: r.extent,
    variogram: r.variogram,
    crossValidation: r.crossValidation,
    wells: r.wells,
    excluded: r.excluded ?? [],
    warnings: r.warnings,
  };
}

export async function deleteSurface(db: Db, teamId: string, id: string): Promise<void> {
  const gone = await db
    .delete(surfaces)
    .where(and(eq(surfaces.teamId, teamId), eq(surfaces.id, id)))
    .returning({ id: surfaces.id });
  if (!gone.length) throw notFound('That surface');
}
