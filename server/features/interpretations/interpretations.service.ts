import { and, desc, eq, getTableColumns, sql } from 'drizzle-orm';
import { interpretationContentSchema, type Interpretation, type InterpretationContent } from '../../../shared/schemas/interpretations';
import type { Db } from '../../db/client';
import { interpretations, users, wells } from '../../db/schema';
import { conflict, notFound } from '../../lib/httpError';
import { UNIQUE_VIOLATION, pgErrorCode } from '../../lib/pgError';
import { currentInterpretationOf } from './currentInterpretation';

const columns = { ...getTableColumns(interpretations), createdByName: users.name };
type Row = typeof interpretations.$inferSelect & { createdByName: string | null };
const toInterpretation = ({ content, createdAt, createdByName, ...r }: Row): Interpretation => ({
  ...content,
  ...r,
  createdByName,
  createdAt: createdAt.toISOString(),
});

async function assertWell(db: Db, teamId: string, wellId: string) {
  const [w] = await db
    .select({ id: wells.id })
    .from(wells)
    .where(and(eq(wells.teamId, teamId), eq(wells.id, wellId)));
  if (!w) throw notFound('That well');
}

export async function listInterpretations(db: Db, teamId: string, wellId: string): Promise<Interpretation[]> {
  await assertWell(db, teamId, wellId);
  const rows = await db
    .select(columns)
    .from(interpretations)
    .leftJoin(users, eq(users.id, interpretations.createdBy))
    .where(eq(interpretations.wellId, wellId))
    .orderBy(desc(interpretations.version));
  return rows.map(toInterpretation);
}

/** The newest accepted version (the rule of `currentInterpretationOf`): what maps, surfaces and exports use. */
export async function currentInterpretation(db: Db, teamId: string, wellId: string): Promise<Interpretation> {
  await assertWell(db, teamId, wellId);
  const current = currentInterpretationOf(db, wellId);
  const { topTvdM: _top, ...fields } = current._.selectedFields;
  const [row] = await db
    .select({ ...fields, createdByName: users.name })
    .from(current)
    .leftJoin(users, eq(users.id, current.createdBy));
  if (!row) throw notFound('An accepted interpretation of this well');
  return toInterpretation(row);
}

async function latestVersion(db: Db, wellId: string): Promise<number | null> {
  const [r] = await db
    .select({ v: sql<number | null>`max(${interpretations.version})` })
    .from(interpretations)
    .where(eq(interpretations.wellId, wellId));
  return r.v === null ? null : Number(r.v);
}

const stale = (currentVersion: number | null) =>
  conflict('Someone saved a newer interpretation of this well since you opened it; reload to see it before saving.', { currentVersion });

/** Adds version n + 1 when `baseVersion` is the newest; otherwise a 409 that names the newest. */
export async function saveInterpretation(
  db: Db,
  teamId: string,
  wellId: string,
  userId: string,
  body: {
    baseVersion: number | null;
    status: 'draft' | 'accepted';
    note?: string | null;
    restoredFrom?: number | null;
  } & InterpretationContent,
): Promise<Interpretation> {
  await assertWell(db, teamId, wellId);
  const latest = await latestVersion(db, wellId);
  if (latest !== body.baseVersion) throw stale(latest);
  const { baseVersion: _b, status, note, restoredFrom, ...content } = body;
  try {
    const [row] = await db
      .insert(interpretations)
      .values({
        wellId,
        version: (latest ?? 0) + 1,
        status,
        content: interpretationContentSchema.parse(content),
        note: note ?? null,
        restoredFrom: restoredFrom ?? null,
        createdBy: userId,
      })
      .returning({ version: interpretations.version });
    return (await listInterpretations(db, teamId, wellId)).find((i) => i.version === row.version)!;
  } catch (err) {
    // Two saves of the same base at once: the unique index lets one through, the other is stale.
    if (pgErrorCode(err) === UNIQUE_VIOLATION) throw stale(await latestVersion(db, wellId));
    throw err;
  }
}

export async function restoreInterpretation(
  db: Db,
  teamId: string,
  wellId: string,
  userId: string,
  version: number,
  baseVersion: number | null,
): Promise<Interpretation> {
  const all = await listInterpretations(db, teamId, wellId);
  const old = all.find((i) => i.version === version);
  if (!old) throw notFound(`Version ${version} of this interpretation`);
  const content = interpretationContentSchema.parse(old);
  return saveInterpretation(db, teamId, wellId, userId, {
    ...content,
    baseVersion,
    status: 'accepted',
    note: `Restored version ${version}`,
    restoredFrom: version,
  });
}
