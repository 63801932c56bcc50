import { eq } from 'drizzle-orm';
import type { SurveySource } from '../../../shared/trajectory';
import { tvdAt } from '../../../shared/trajectory';
import type { Db } from '../../db/client';
import { wells } from '../../db/schema';

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

/** TVD below the rig datum at `mdM` along the well's survey; MD itself for a vertical well. */
export function tvdFromSurvey(source: SurveySource | null | undefined, mdM: number): number {
  if (!source || ('length' in source && source.length === 0)) return mdM;
  return tvdAt(source, mdM);
}
