import { and, eq, sql } from 'drizzle-orm';
import type { PlannedWell, PlannedWellBody } from '../../../shared/schemas/planning';
import type { Db } from '../../db/client';
import { plannedWells, prospects } from '../../db/schema';
import { ewktPoint } from '../../db/schema/geometry';
import { badRequest, conflict, notFound } from '../../lib/httpError';

const columns = {
  id: plannedWells.id,
  name: plannedWells.name,
  location: sql<string>`ST_AsGeoJSON(${plannedWells.location}, 9)`,
  prospectId: plannedWells.prospectId,
  datumElevationM: plannedWells.datumElevationM,
  waterDepthM: plannedWells.waterDepthM,
  waterDepthSource: plannedWells.waterDepthSource,
  plannedTdM: plannedWells.plannedTdM,
  notes: plannedWells.notes,
  version: plannedWells.version,
  updatedAt: plannedWells.updatedAt,
};
const selectPlannedWells = (db: Db) => db.select(columns).from(plannedWells);
type Row = Awaited<ReturnType<typeof selectPlannedWells>>[number];
const toPlanned = ({ location, updatedAt, ...r }: Row): PlannedWell => ({
  ...r,
  location: JSON.parse(location) as PlannedWell['location'],
  updatedAt: updatedAt.toISOString(),
});

const NEAREST = 5;
const NEAREST_WITHIN_M = 50_000;

/**
 * Water depth where none was entered: inverse-distance-squared mean (Shepard 1968) of the nearest
 * offshore wells within 50 km; unknown when there are none.
 */
export async function estimateWaterDepth(db: Db, teamId: string, lon: number, lat: number): Promise<number | null> {
  const r = await db.execute<{ depth: number | null }>(sql`
    SELECT sum(water_depth_m / greatest(d * d, 1)) / sum(1 / greatest(d * d, 1)) AS depth FROM (
      SELECT water_depth_m, ST_Distance(location::geography, ST_SetSRID(ST_MakePoint(${lon}, ${lat}), 4326)::geography) AS d
      FROM wells
      WHERE team_id = ${teamId} AND water_depth_m IS NOT NULL
        AND ST_DWithin(location::geography, ST_SetSRID(ST_MakePoint(${lon}, ${lat}), 4326)::geography, ${NEAREST_WITHIN_M})
      ORDER BY location <-> ST_SetSRID(ST_MakePoint(${lon}, ${lat}), 4326)
      LIMIT ${NEAREST}) n`);
  const v = r.rows[0]?.depth;
  return v === null || v === undefined ? null : Number(v);
}

async function assertProspect(db: Db, teamId: string, prospectId: string | null | undefined) {
  if (!prospectId) return;
  const [p] = await db
    .select({ id: prospects.id })
    .from(prospects)
    .where(and(eq(prospects.teamId, teamId), eq(prospects.id, prospectId)));
  if (!p)
    throw badRequest('validation_failed', 'That prospect is not in this team.', [
      { path: 'prospectId', message: 'is not a prospect of this team' },
    ]);
}

async function values(db: Db, teamId: string, body: PlannedWellBody): Promise<Omit<typeof plannedWells.$inferInsert, 'teamId'>> {
  await assertProspect(db, teamId, body.prospectId);
  const [lon, lat] = body.location.coordinates;
  const entered = body.waterDepthM ?? null;
  const estimated = entered === null ? await estimateWaterDepth(db, teamId, lon, lat) : null;
  return {
    name: body.name,
    location: ewktPoint(lon, lat),
    prospectId: body.prospectId ?? null,
    datumElevationM: body.datumElevationM,
    waterDepthM: entered ?? estimated,
    waterDepthSource: entered !== null ? 'entered' : estimated !== null ? 'nearest-wells' : 'unknown',
    plannedTdM: body.plannedTdM,
    notes: body.notes ?? null,
  };
}

export async function listPlannedWells(db: Db, teamId: string): Promise<PlannedWell[]> {
  return (await selectPlannedWells(db).where(eq(plannedWells.teamId, teamId)).orderBy(plannedWells.name)).map(toPlanned);
}

export async function getPlannedWell(db: Db, teamId: string, id: string): Promise<PlannedWell> {
  const [row] = await selectPlannedWells(db).where(and(eq(plannedWells.teamId, teamId), eq(plannedWells.id, id)));
  if (!row) throw notFound('That planned well');
  return toPlanned(row);
}

export async function createPlannedWell(db: Db, teamId: string, userId: string, body: PlannedWellBody): Promise<PlannedWell> {
  const [row] = await db
    .insert(plannedWells)
    .values({ teamId, ...(await values(db, teamId, body)), createdBy: userId, updatedBy: userId })
    .returning({ id: plannedWells.id });
  return getPlannedWell(db, teamId, row.id);
}

export async function updatePlannedWell(
  db: Db,
  teamId: string,
  userId: string,
  id: string,
  body: PlannedWellBody & { version: number },
): Promise<PlannedWell> {
  const updated = await db
    .update(plannedWells)
    .set({ ...(await values(db, teamId, body)), updatedBy: userId, updatedAt: sql`now()`, version: sql`${plannedWells.version} + 1` })
    .where(and(eq(plannedWells.teamId, teamId), eq(plannedWells.id, id), eq(plannedWells.version, body.version)))
    .returning({ id: plannedWells.id });
  if (!updated.length) {
    const current = await getPlannedWell(db, teamId, id);
    throw conflict('This planned well was changed by someone else since you opened it; reload to see their changes.', {
      currentVersion: current.version,
    });
  }
  return getPlannedWell(db, teamId, id);
}

export async function deletePlannedWell(db: Db, teamId: string, id: string): Promise<void> {
  const gone = await db
    .delete(plannedWells)
    .where(and(eq(plannedWells.teamId, teamId), eq(plannedWells.id, id)))
    .returning({ id: plannedWells.id });
  if (!gone.length) throw notFound('That planned well');
}
