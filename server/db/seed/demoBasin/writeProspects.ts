import { eq, sql } from 'drizzle-orm';
import type { Db } from '../../client';
import { plannedWells, prospects } from '../../schema';
import { ewktPoint } from '../../schema/geometry';
import { demoProspects } from './prospects';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

/** Demo rig floor for planned wells: a jack-up's rotary table about 25 m above sea level (common practice, no source). */
const PLANNED_RT_M = 25;

/** The invented prospects and their planned wells, so the map and offset search have something to work on. */
export async function writeDemoProspects(tx: Tx, teamId: string): Promise<{ prospects: number; plannedWells: number }> {
  await tx.delete(plannedWells).where(eq(plannedWells.teamId, teamId));
  await tx.delete(prospects).where(eq(prospects.teamId, teamId));
  let planned = 0;
  for (const p of demoProspects) {
    const geometry = { type: 'Polygon', coordinates: [p.polygon] };
    const [row] = await tx
      .insert(prospects)
      .values({
        teamId,
        name: p.name,
        outline: sql`ST_SetSRID(ST_GeomFromGeoJSON(${JSON.stringify(geometry)}), 4326)` as unknown as string,
        targetTopM: p.targetTvdssM.top,
        targetBaseM: p.targetTvdssM.base,
        notes: 'Synthetic demo prospect (invented).',
      })
      .returning({ id: prospects.id });
    for (const w of p.plannedWells) {
      // Water depth from the nearest demo wells (inverse-distance-squared, as the planner form does).
      const wd = await tx.execute<{ depth: number | null }>(sql`
        SELECT sum(water_depth_m / greatest(d * d, 1)) / sum(1 / greatest(d * d, 1)) AS depth FROM (
          SELECT water_depth_m, ST_Distance(location::geography, ST_SetSRID(ST_MakePoint(${w.lon}, ${w.lat}), 4326)::geography) AS d
          FROM wells WHERE team_id = ${teamId} AND water_depth_m IS NOT NULL
          ORDER BY location <-> ST_SetSRID(ST_MakePoint(${w.lon}, ${w.lat}), 4326) LIMIT 5) n`);
      const depth = wd.rows[0]?.depth;
      await tx.insert(plannedWells).values({
        teamId,
        prospectId: row.id,
        name: w.name,
        location: ewktPoint(w.lon, w.lat),
        datumElevationM: PLANNED_RT_M,
        waterDepthM: depth === null || depth === undefined ? null : Number(depth),
        waterDepthSource: depth === null || depth === undefined ? 'unknown' : 'nearest-wells',
        // Planned TD is MD below the rotary table: a vertical well's TVDSS plus the height of the RT above sea level.
        plannedTdM: w.tdTvdssM + PLANNED_RT_M,
        notes: 'Synthetic demo planned well (invented).',
      });
      planned++;
    }
  }
  return { prospects: demoProspects.length, plannedWells: planned };
}
