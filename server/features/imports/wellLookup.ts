import { eq, inArray } from 'drizzle-orm';
import type { StationInput, SurveySource } from '../../../shared/trajectory';
import { tvdAt } from '../../../shared/trajectory';
import type { Db } from '../../db/client';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
import { surveyStations, wells } from '../../db/schema';

export interface KnownWell {
  id: string;
  name: string;
  uwi: string | null;
  /** Total depth (MD), m, when known: an observation below it is worth a warning. */
  tdMdM?: number | null;
}

/** The team's wells by lower-cased name and UWI, so rows can name a well either way. */
export class WellLookup {
  private readonly byKey = new Map<string, KnownWell>();

  constructor(list: KnownWell[]) {
    for (const w of list) {
      this.byKey.set(w.name.toLowerCase(), w);
      if (w.uwi) this.byKey.set(w.uwi.toLowerCase(), w);
    }
  }

  static async load(db: Db, teamId: string): Promise<WellLookup> {
    return new WellLookup(
      await db.select({ id: wells.id, name: wells.name, uwi: wells.uwi, tdMdM: wells.tdMdM }).from(wells).where(eq(wells.teamId, teamId)),
    );
  }

  find(nameOrUwi: string): KnownWell | undefined {
    return this.byKey.get(nameOrUwi.trim().toLowerCase());
  }
}

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

/** TVD below the rig datum at `mdM` along the well's survey; MD itself for a vertical well. */
export function tvdFromSurvey(source: SurveySource | null | undefined, mdM: number): number {
  if (!source || ('length' in source && source.length === 0)) return mdM;
  return tvdAt(source, mdM);
}
