import { and, desc, eq, sql } from 'drizzle-orm';
import type { z } from 'zod';
import { SURFACE_QUANTITY_LABELS, type Surface, type SurfaceSummary, surfaceRequestBody } from '../../../shared/schemas/surfaces';
import type { Db } from '../../db/client';
import { surfaces, users } from '../../db/schema';
import { badRequest, notFound } from '../../lib/httpError';
import type { Progress } from '../../lib/jobs';
import { getPlannedWell } from '../planning/plannedWells.service';
import { getProspect } from '../prospects/prospects.service';
import type { SurfaceInputPoint } from './computeSurface';
import { runSurfaceInWorker } from './runInWorker';

type Params = z.output<typeof surfaceRequestBody>;

type Candidate = {
  id: string;
  name: string;
  lon: number;
  lat: number;
  top_tvd_m: number | null;
  datum_elevation_m: number;
  water_depth_m: number | null;
  version: number | null;
};

/** Each well with its newest accepted interpretation's TOP (if any). */
const withTop = (where: ReturnType<typeof sql>) => sql`
  SELECT w.id, w.name, ST_X(w.location) AS lon, ST_Y(w.location) AS lat, w.datum_elevation_m, w.water_depth_m,
    i.version, (i.content->'top'->>'tvdM')::float8 AS top_tvd_m
  FROM wells w
  LEFT JOIN LATERAL (SELECT version, content FROM interpretations WHERE well_id = w.id AND status = 'accepted' ORDER BY version DESC LIMIT 1) i ON true
  WHERE ${where}
  ORDER BY w.name`;

async function gatherPoints(db: Db, teamId: string, prospectId: string, params: Params) {
  const warnings: string[] = [];
  let rows: Candidate[];
  const src = params.wells;
  if (src.from === 'prospect') {
    rows = (await db.execute<Candidate>(withTop(sql`w.team_id = ${teamId} AND ST_DWithin(w.location::geography, (SELECT outline FROM prospects WHERE id = ${prospectId})::geography, ${src.bufferKm * 1000})`))).rows;
    if (rows.length === 0) throw badRequest('no_wells', `No wells lie within ${src.bufferKm} km of this prospect; widen the buffer or list the wells.`);
  } else if (src.from === 'offset-set') {
    await getPlannedWell(db, teamId, src.plannedWellId);
    rows = (await db.execute<Candidate>(withTop(sql`w.team_id = ${teamId} AND w.id IN (SELECT well_id FROM offset_picks WHERE planned_well_id = ${src.plannedWellId})`))).rows;
    if (rows.length === 0) throw badRequest('no_wells', 'That planned well has no offset wells picked yet.');
  } else {
    rows = (await db.execute<Candidate>(withTop(sql`w.team_id = ${teamId} AND w.id IN (${sql.join(src.wellIds.map((i) => sql`${i}::uuid`), sql`, `)})`))).rows;
    if (rows.length < src.wellIds.length) throw badRequest('validation_failed', `${src.wellIds.length - rows.length} of the listed wells are not wells of this team.`);
  }
  const points: SurfaceInputPoint[] = [];
  const noTop: string[] = [];
  const noWater: string[] = [];
  for (const r of rows) {
    if (r.top_tvd_m === null) {
      noTop.push(r.name);
      continue;
    }
    const tvdss = Number(r.top_tvd_m) - Number(r.datum_elevation_m);
    if (params.quantity === 'top_below_mudline' && r.water_depth_m === null) {
      noWater.push(r.name);
      continue;
    }
    const value = params.quantity === 'top_tvdss' ? tvdss : tvdss - Number(r.water_depth_m);
    points.push({ wellId: r.id, name: r.name, lon: Number(r.lon), lat: Number(r.lat), value, interpretationVersion: r.version });
  }
  if (noTop.length) warnings.push(`${noTop.length} well(s) have no accepted TOP pick and were left out: ${noTop.slice(0, 10).join(', ')}${noTop.length > 10 ? ', …' : ''}.`);
  if (noWater.length) warnings.push(`${noWater.length} well(s) have no water depth and were left out: ${noWater.slice(0, 10).join(', ')}.`);
  if (points.length < 3) {
    throw badRequest('too_few_wells', `A surface needs at least 3 wells with an accepted TOP pick; ${points.length} of the ${rows.length} wells found have one.`, { warnings });
  }
  return { points, warnings };
}

/** Gathers the wells, computes off the main thread, and stores the run. */
export async function createSurface(db: Db, teamId: string, userId: string, prospectId: string, params: Params, progress: Progress = () => {}): Promise<Surface> {
  const prospect = await getProspect(db, teamId, prospectId);
  progress('gathering wells', 0, 1);
  const { points, warnings } = await gatherPoints(db, teamId, prospectId, params);
  const result = await runSurfaceInWorker({ points, outline: prospect.geometry, params }, progress);
  progress('saving', 0, 1);
  const method = params.method.kind === 'kriging' ? `ordinary kriging (${result.variogram?.model.model})` : `inverse distance (power ${params.method.power})`;
  const name = params.name ?? `${SURFACE_QUANTITY_LABELS[params.quantity]} — ${method}`;
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
      result: { ...rest, warnings: [...warnings, ...rest.warnings], cornersLonLat: grid.cornersLonLat, min: grid.min, max: grid.max },
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
  createdBy: surfaces.createdBy,
  createdByName: users.name,
  createdAt: surfaces.createdAt,
};

export async function listSurfaces(db: Db, teamId: string, prospectId: string): Promise<SurfaceSummary[]> {
  await getProspect(db, teamId, prospectId);
  const rows = await db.select(summaryColumns).from(surfaces).leftJoin(users, eq(users.id, surfaces.createdBy)).where(and(eq(surfaces.teamId, teamId), eq(surfaces.prospectId, prospectId))).orderBy(desc(surfaces.createdAt));
  return rows.map((r) => ({ ...r, quantity: r.quantity as SurfaceSummary['quantity'], createdAt: r.createdAt.toISOString() }));
}

export async function getSurface(db: Db, teamId: string, id: string): Promise<Surface> {
  const [row] = await db
    .select({ ...summaryColumns, params: surfaces.params, nx: surfaces.nx, ny: surfaces.ny, projection: surfaces.projection, x0: surfaces.x0, y0: surfaces.y0, values: surfaces.values, stdDev: surfaces.stdDev, result: surfaces.result })
    .from(surfaces)
    .leftJoin(users, eq(users.id, surfaces.createdBy))
    .where(and(eq(surfaces.teamId, teamId), eq(surfaces.id, id)));
  if (!row) throw notFound('That surface');
  const r = row.result as unknown as Omit<Surface, 'grid'> & { cornersLonLat: [number, number][]; min: number; max: number };
  return {
    id: row.id,
    prospectId: row.prospectId,
    name: row.name,
    quantity: row.quantity as Surface['quantity'],
    method: row.method,
    cellSizeM: row.cellSizeM,
    wellCount: row.wellCount,
    rmseM: row.rmseM,
    createdBy: row.createdBy,
    createdByName: row.createdByName,
    createdAt: row.createdAt.toISOString(),
    params: row.params,
    grid: { nx: row.nx, ny: row.ny, cellSizeM: row.cellSizeM, projection: row.projection, x0: row.x0, y0: row.y0, values: row.values, stdDev: row.stdDev, cornersLonLat: r.cornersLonLat, min: r.min, max: r.max },
    contours: r.contours,
    extent: r.extent,
    variogram: r.variogram,
    crossValidation: r.crossValidation,
    wells: r.wells,
    warnings: r.warnings,
  };
}

export async function deleteSurface(db: Db, teamId: string, id: string): Promise<void> {
  const gone = await db.delete(surfaces).where(and(eq(surfaces.teamId, teamId), eq(surfaces.id, id))).returning({ id: surfaces.id });
  if (!gone.length) throw notFound('That surface');
}
