import { and, eq, sql } from 'drizzle-orm';
import type { Prospect, ProspectBody } from '../../../shared/schemas/planning';
import type { Db } from '../../db/client';
import { prospects } from '../../db/schema';
import { conflict, notFound } from '../../lib/httpError';
import { checkPolygon } from './geometryChecks';

const columns = {
  id: prospects.id,
  name: prospects.name,
  geometry: sql<string>`ST_AsGeoJSON(${prospects.outline}, 9)`,
  areaKm2: sql<number>`ST_Area(${prospects.outline}::geography) / 1e6`,
  targetTopM: prospects.targetTopM,
  targetBaseM: prospects.targetBaseM,
  notes: prospects.notes,
  version: prospects.version,
  createdBy: prospects.createdBy,
  updatedAt: prospects.updatedAt,
};

const selectProspects = (db: Db) => db.select(columns).from(prospects);
type Row = Awaited<ReturnType<typeof selectProspects>>[number];
const toProspect = ({ geometry, updatedAt, ...r }: Row): Prospect => ({
  ...r,
  geometry: JSON.parse(geometry) as Prospect['geometry'],
  updatedAt: updatedAt.toISOString(),
});

const outline = (body: ProspectBody) => sql`ST_SetSRID(ST_GeomFromGeoJSON(${JSON.stringify(body.geometry)}), 4326)`;

export async function listProspects(db: Db, teamId: string): Promise<Prospect[]> {
  return (await selectProspects(db).where(eq(prospects.teamId, teamId)).orderBy(prospects.name)).map(toProspect);
}

export async function getProspect(db: Db, teamId: string, id: string): Promise<Prospect> {
  const [row] = await selectProspects(db).where(and(eq(prospects.teamId, teamId), eq(prospects.id, id)));
  if (!row) throw notFound('That prospect');
  return toProspect(row);
}

export async function createProspect(db: Db, teamId: string, userId: string, body: ProspectBody): Promise<Prospect> {
  await checkPolygon(db, body.geometry);
  const [row] = await db
    .insert(prospects)
    .values({
      teamId,
      name: body.name,
      outline: outline(body),
      targetTopM: body.targetTopM ?? null,
      targetBaseM: body.targetBaseM ?? null,
      notes: body.notes ?? null,
      createdBy: userId,
      updatedBy: userId,
    })
    .returning({ id: prospects.id });
  return getProspect(db, teamId, row.id);
}

export async function updateProspect(
  db: Db,
  teamId: string,
  userId: string,
  id: string,
  body: ProspectBody & { version: number },
): Promise<Prospect> {
  await checkPolygon(db, body.geometry);
  const updated = await db
    .update(prospects)
    .set({
      name: body.name,
      outline: outline(body),
      targetTopM: body.targetTopM ?? null,
      targetBaseM: body.targetBaseM ?? null,
      notes: body.notes ?? null,
      updatedBy: userId,
      updatedAt: sql`now()`,
      version: sql`${prospects.version} + 1`,
    })
    .where(and(eq(prospects.teamId, teamId), eq(prospects.id, id), eq(prospects.version, body.version)))
    .returning({ id: prospects.id });
  if (!updated.length) {
    const current = await getProspect(db, teamId, id);
    throw conflict('This prospect was changed by someone else since you opened it; reload to see their changes.', {
      currentVersion: current.version,
    });
  }
  return getProspect(db, teamId, id);
}

export async function deleteProspect(db: Db, teamId: string, id: string): Promise<void> {
  const gone = await db
    .delete(prospects)
    .where(and(eq(prospects.teamId, teamId), eq(prospects.id, id)))
    .returning({ id: prospects.id });
  if (!gone.length) throw notFound('That prospect');
}
