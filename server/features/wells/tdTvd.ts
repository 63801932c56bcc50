import { and, inArray, isNotNull, isNull } from 'drizzle-orm';
import { tvdAt } from '../../../shared/trajectory';
import type { Db } from '../../db/client';
import { wells } from '../../db/schema';
import { bulkUpdate } from '../../lib/bulkInsert';
import { loadSurveys } from './surveys';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

/**
 * Stores TD TVD for each given well that has a TD (MD) and a survey but no TD TVD, by minimum curvature
 * along its stations (straight on along the last station's direction when TD lies below it). A TD TVD
 * the user gave is never overwritten. Returns how many wells got one.
 *
 * @example await fillTdTvdFromSurvey(tx, [wellId]); // td_tvd_m = tvdAt(stations, td_md_m)
 */
export async function fillTdTvdFromSurvey(db: Db | Tx, wellIds: string[]): Promise<number> {
  if (wellIds.length === 0) return 0;
  const targets = await db
    .select({ id: wells.id, tdMdM: wells.tdMdM })
    .from(wells)
    .where(and(inArray(wells.id, wellIds), isNull(wells.tdTvdM), isNotNull(wells.tdMdM)));
  if (targets.length === 0) return 0;
  const surveys = await loadSurveys(
    db,
    targets.map((t) => t.id),
  );
  const updates = targets.flatMap((t) => {
    const stations = surveys.get(t.id);
    return stations?.length && t.tdMdM !== null ? [[t.id, tvdAt(stations, t.tdMdM)] as const] : [];
  });
  if (updates.length > 0) await bulkUpdate(db, 'wells', ['id', 'uuid'], [['td_tvd_m', 'float8']], updates);
  return updates.length;
}
