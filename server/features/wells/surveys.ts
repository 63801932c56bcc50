import { inArray } from 'drizzle-orm';
import type { StationInput } from '../../../shared/trajectory';
import type { Db } from '../../db/client';
import { surveyStations } from '../../db/schema';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

/** Survey stations of the given wells, for TVD from MD (a well without a survey is vertical). */
export async function loadSurveys(db: Db | Tx, wellIds: string[]): Promise<Map<string, StationInput[]>> {
  const out = new Map<string, StationInput[]>();
  if (wellIds.length === 0) return out;
  const rows = await db
    .select({ wellId: surveyStations.wellId, mdM: surveyStations.mdM, incDeg: surveyStations.incDeg, aziDeg: surveyStations.aziDeg })
    .from(surveyStations)
    .where(inArray(surveyStations.wellId, wellIds))
    .orderBy(surveyStations.wellId, surveyStations.seq);
  for (const r of rows) {
    const list = out.get(r.wellId) ?? [];
    list.push({ mdM: r.mdM, incDeg: r.incDeg, aziDeg: r.aziDeg });
    out.set(r.wellId, list);
  }
  return out;
}
