import { and, desc, eq, getTableColumns, sql, type SQL } from 'drizzle-orm';
import type { AnyPgColumn } from 'drizzle-orm/pg-core';
import type { Db } from '../../db/client';
import { interpretations } from '../../db/schema';

/**
 * The one owner of "a well's current interpretation": its accepted version with the highest number (drafts never
 * count), with the TOP pick's TVD below the rig datum read out of the content. Profiles, surfaces, offsets and
 * exports all read it through this subquery.
 *
 * `wellId` is a well id, or the outer well's id column when joined per well: `LEFT JOIN LATERAL ${sub} ON true`
 * in SQL text or `.leftJoinLateral(sub, sql\`true\`)` in the query builder. At most one row per well.
 */
export function currentInterpretationOf(db: Db, wellId: string | AnyPgColumn | SQL) {
  return db
    .select({
      ...getTableColumns(interpretations),
      topTvdM: sql<number | null>`(${interpretations.content}->'top'->>'tvdM')::float8`.as('top_tvd_m'),
    })
    .from(interpretations)
    .where(and(eq(interpretations.wellId, wellId), eq(interpretations.status, 'accepted')))
    .orderBy(desc(interpretations.version))
    .limit(1)
    .as('current_interpretation');
}
