import { and, eq, inArray, isNotNull, isNull } from 'drizzle-orm';
import { tvdAt } from '../../../shared/trajectory';
import type { Db } from '../../db/client';
import { surveyStations, wells } from '../../db/schema';

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
  const rows = await db
    .select({ wellId: surveyStations.wellId, mdM: surveyStations.mdM, incDeg: surveyStations.incDeg, aziDeg: surveyStations.aziDeg })
    .from(surveyStations)
    .where(inArray(surveyStations.wellId, targets.map((t) => t.id)))
    .orderBy(surveyStations.wellId, surveyStations.seq);
  const byWell = new Map<string, { mdM: number; incDeg: number; aziDeg: number }[]>();
  for (const r of rows) {
    const list = byWell.get(r.wellId) ?? [];
    list.push({ mdM: r.mdM, incDeg: r.incDeg, aziDeg: r.aziDeg });
    byWell.set(r.wellId, list);
  }
  let filled = 0;
  for (const t of targets) {
    const stations = byWell.get(t.id);
    if (!stations?.length || t.tdMdM === null) continue;
    await db.update(wells).set({ tdTvdM: tvdAt(stations, t.tdMdM) }).where(eq(wells.id, t.id));
    filled++;
  }
  return filled;
}
