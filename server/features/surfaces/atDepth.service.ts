import { sql } from 'drizzle-orm';
import {
  alignLogs,
  buildProfile,
  poreIntervalTvdM,
  pressureAtDepth,
  profileWellFromHeader,
  type LogCurveInput,
  type ProfileLogRole,
  type ProfileWell,
} from '../../../shared/profile';
import type { InterpretationContent } from '../../../shared/schemas/interpretations';
import type { SurfaceExcludedWell, SurfaceQuantity } from '../../../shared/schemas/surfaces';
import type { StationInput } from '../../../shared/trajectory';
import type { Db } from '../../db/client';
import type { Progress } from '../../lib/jobs';
import type { SurfaceInputPoint } from '../../../shared/interpolation/surface';

/** A candidate well as the surfaces service reads it: location, datums and its newest accepted interpretation. */
export type WellRow = {
  id: string;
  name: string;
  lon: number;
  lat: number;
  datum_elevation_m: number;
  water_depth_m: number | null;
  air_gap_m: number | null;
  ground_elevation_m: number | null;
  offshore: boolean;
  version: number | null;
  content: InterpretationContent | null;
};

const ROLES: readonly ProfileLogRole[] = ['sonic', 'resistivity', 'density', 'gamma'];
/** Wells whose curves are read in one query: bounds the memory of one batch (a few MB of samples). */
const BATCH = 20;

/**
 * A well's datums for the profile builder from its row, by the rule the profile page uses (`profileWellFromHeader`).
 * @example profileWellOf({ datum_elevation_m: 310, water_depth_m: null, air_gap_m: null, ground_elevation_m: 302, offshore: false, … }) // airGapM 8
 */
export function profileWellOf(
  w: Pick<WellRow, 'datum_elevation_m' | 'water_depth_m' | 'air_gap_m' | 'ground_elevation_m' | 'offshore'>,
): ProfileWell {
  const num = (v: number | string | null) => (v === null ? null : Number(v));
  return profileWellFromHeader({
    datumElevationM: Number(w.datum_elevation_m),
    waterDepthM: num(w.water_depth_m),
    airGapM: num(w.air_gap_m),
    groundElevationM: num(w.ground_elevation_m),
    offshore: w.offshore,
  });
}

async function loadLogs(db: Db, ids: string[]) {
  const idList = sql.join(
    ids.map((i) => sql`${i}::uuid`),
    sql`, `,
  );
  // The curve with most samples per role, as the profile page picks them (a well may hold a re-logged copy).
  const curves = (
    await db.execute<{ well_id: string; role: ProfileLogRole; unit: string; md_m: number[]; values: (number | null)[] }>(sql`
      SELECT DISTINCT ON (well_id, role) well_id, role::text AS role, unit, md_m, values
      FROM log_curves WHERE well_id IN (${idList}) AND role::text IN ('sonic', 'resistivity', 'density', 'gamma')
      ORDER BY well_id, role, cardinality(values) DESC`)
  ).rows;
  const stations = (
    await db.execute<{ well_id: string; md_m: number; inc_deg: number; azi_deg: number }>(sql`
      SELECT well_id, md_m, inc_deg, azi_deg FROM survey_stations WHERE well_id IN (${idList}) ORDER BY well_id, seq`)
  ).rows;
  const byWell = new Map<string, { curves: LogCurveInput[]; stations: StationInput[] }>(ids.map((i) => [i, { curves: [], stations: [] }]));
  for (const c of curves) {
    if (!ROLES.includes(c.role)) continue;
    byWell
      .get(c.well_id)!
      .curves.push({ role: c.role, unit: c.unit, mdM: c.md_m.map(Number), values: c.values.map((v) => (v === null ? null : Number(v))) });
  }
  for (const s of stations)
    byWell.get(s.well_id)!.stations.push({ mdM: Number(s.md_m), incDeg: Number(s.inc_deg), aziDeg: Number(s.azi_deg) });
  return byWell;
}

/** Deepest reach of any well's pore-pressure curve, to name in the error when no well reaches the depth. */
export interface Reach {
  name: string;
  baseTvdssM: number;
}

/**
 * The value of `emw_at_depth` (kg/m³) or `overpressure_at_depth` (Pa) for each well with an accepted interpretation:
 * its profile rebuilt from the stored logs, survey and datums with the shared builder (as the profile page does), read
 * at the depth. Wells without a value are returned in `excluded` with the reason. Runs on the request's thread but
 * yields after each well, so a run over many wells does not hold up other requests.
 * @example const { points, excluded } = await valuesAtDepth(db, rows, 'emw_at_depth', 3000, progress);
 */
export async function valuesAtDepth(db: Db, rows: WellRow[], quantity: SurfaceQuantity, depthTvdssM: number, progress: Progress) {
  const points: SurfaceInputPoint[] = [];
  const excluded: SurfaceExcludedWell[] = [];
  let reach: Reach | null = null;
  const interpreted = rows.filter((r) => {
    if (r.version !== null && r.content) return true;
    excluded.push({ wellId: r.id, name: r.name, reason: 'no accepted interpretation' });
    return false;
  });
  for (let start = 0; start < interpreted.length; start += BATCH) {
    const batch = interpreted.slice(start, start + BATCH);
    const logs = await loadLogs(
      db,
      batch.map((r) => r.id),
    );
    for (const r of batch) {
      const leaveOut = (reason: string) => excluded.push({ wellId: r.id, name: r.name, reason });
      const { curves, stations } = logs.get(r.id)!;
      try {
        const well = profileWellOf(r);
        const tvdM = depthTvdssM + well.datumElevationM;
        if (curves.length === 0) leaveOut('no sonic, resistivity, density or gamma-ray log');
        else if (!(tvdM > 0)) leaveOut('the depth lies above its rig datum');
        else {
          const aligned = alignLogs(curves, stations);
          const content = r.content!;
          const profile = buildProfile({
            well,
            tvdM: aligned.tvdM,
            mdM: aligned.mdM,
            logs: aligned.logs,
            interpretation: content,
            top: content.top ? { marginKgM3: content.top.marginKgM3, minThicknessM: content.top.minThicknessM } : undefined,
          });
          const interval = poreIntervalTvdM(profile);
          if (interval && (!reach || interval[1] - well.datumElevationM > reach.baseTvdssM))
            reach = { name: r.name, baseTvdssM: interval[1] - well.datumElevationM };
          const at = pressureAtDepth(profile, tvdM);
          if (!at.ok) leaveOut(at.reason);
          else {
            const value = quantity === 'emw_at_depth' ? at.value.poreEmwKgM3 : at.value.overpressurePa;
            points.push({
              wellId: r.id,
              name: r.name,
              lon: Number(r.lon),
              lat: Number(r.lat),
              value,
              interpretationVersion: r.version,
              atDepth: at.value,
            });
          }
        }
      } catch (err) {
        // A stored curve the builder refuses (unknown unit, MD not increasing) costs this well, not the run.
        leaveOut(`its profile could not be built: ${(err as Error).message}`);
      }
      progress('building well profiles', points.length + excluded.length, rows.length);
      await new Promise((resolve) => setImmediate(resolve));
    }
  }
  return { points, excluded, reach: reach as Reach | null };
}
