import { and, eq, inArray, sql, type SQL } from 'drizzle-orm';
import { OFFSET_SCORE_WEIGHTS as W, type OffsetCandidate, type OffsetSetBody, type OffsetSetEntry } from '../../../shared/schemas/planning';
import type { Db } from '../../db/client';
import { offsetPicks, users, wells } from '../../db/schema';
import { badRequest } from '../../lib/httpError';
import { currentInterpretationOf } from '../interpretations/currentInterpretation';
import { getProspect } from '../prospects/prospects.service';
import { getPlannedWell } from './plannedWells.service';

/**
 * Rank score, 0 to 1, with the weights of OFFSET_SCORE_WEIGHTS (common practice, no source): nearness matters most,
 * then a similar water depth, then whether the offset reached the planned depth, then how much pressure data it holds.
 */
export function offsetScore(c: {
  distanceKm: number;
  radiusKm: number;
  waterDepthDiffM: number | null;
  tdCoverage: number | null;
  pressureCount: number;
  hasLot: boolean;
  logCount: number;
}): number {
  const near = 1 - Math.min(1, c.distanceKm / Math.max(c.radiusKm, 1e-9));
  const water = c.waterDepthDiffM === null ? 0.5 : Math.exp(-Math.abs(c.waterDepthDiffM) / 200);
  const depth = c.tdCoverage === null ? 0 : Math.min(1, c.tdCoverage);
  const data = Math.min(1, c.pressureCount / 10) * 0.6 + (c.hasLot ? 0.25 : 0) + (c.logCount > 0 ? 0.15 : 0);
  return Math.round((W.near * near + W.water * water + W.depth * depth + W.data * data) * 1000) / 1000;
}

/**
 * Offset wells around a planned well, on the geography type so distances are metres on the spheroid:
 * within `radiusKm`, or within the planned well's prospect outline plus `prospectBufferKm`.
 */
export async function offsetCandidates(
  db: Db,
  teamId: string,
  plannedWellId: string,
  opts: { radiusKm: number; prospectBufferKm?: number },
): Promise<OffsetCandidate[]> {
  const planned = await getPlannedWell(db, teamId, plannedWellId);
  const [lon, lat] = planned.location.coordinates;
  const here = sql`ST_SetSRID(ST_MakePoint(${lon}, ${lat}), 4326)`;
  // A lon/lat box around the circle lets the GiST index on wells.location pick the rows; the exact test
  // on the spheroid follows. 110.5 km per degree of latitude is a floor (it is 110.57–111.69 km).
  const dLat = opts.radiusKm / 110.5;
  const dLon = Math.min(180, dLat / Math.max(Math.cos(((Math.abs(lat) + dLat) * Math.PI) / 180), 1e-6));
  const box = sql`w.location && ST_MakeEnvelope(${lon - dLon}, ${lat - dLat}, ${lon + dLon}, ${lat + dLat}, 4326)`;
  let area = sql`${box} AND ST_DWithin(w.location::geography, ${here}::geography, ${opts.radiusKm * 1000})`;
  let radiusKm = opts.radiusKm;
  if (opts.prospectBufferKm !== undefined) {
    if (!planned.prospectId) throw badRequest('no_prospect', 'This planned well belongs to no prospect; search by radius instead.');
    area = sql`ST_DWithin(w.location::geography, (SELECT outline FROM prospects WHERE id = ${planned.prospectId} AND team_id = ${teamId})::geography, ${opts.prospectBufferKm * 1000})`;
    // The ranking's "near" scale: the farthest outline vertex from the planned well, plus the buffer.
    const r = await db.execute<{ km: number }>(
      sql`SELECT (SELECT max(ST_Distance(${here}::geography, (dp).geom::geography)) FROM ST_DumpPoints(outline) dp) / 1000 AS km FROM prospects WHERE id = ${planned.prospectId}`,
    );
    radiusKm = Number(r.rows[0]?.km ?? 0) + opts.prospectBufferKm;
  }
  const rows = await candidateRows(db, teamId, here, area, plannedWellId);
  return rows
    .map((r) => {
      const waterDepthDiffM = r.water_depth_m !== null && planned.waterDepthM !== null ? r.water_depth_m - planned.waterDepthM : null;
      const tdTvdM = r.td_tvd_m ?? r.td_md_m;
      // Both depths are TVD below their own rig floor; rig heights differ by metres, TDs by kilometres.
      const tdCoverage = tdTvdM === null ? null : tdTvdM / planned.plannedTdM;
      return toCandidate(r, { distanceKm: Number(r.distance_m) / 1000, waterDepthDiffM, tdCoverage, radiusKm });
    })
    .sort(byScore);
}

/**
 * Wells around a prospect before any planned well is placed: inside its outline or within `bufferKm` of it,
 * distances from the outline (0 inside) and azimuths from its centroid. Depth coverage is against the base of
 * the target when the prospect has one (both as TVD below sea level); water depth is not compared.
 */
export async function prospectOffsetWells(db: Db, teamId: string, prospectId: string, bufferKm: number): Promise<OffsetCandidate[]> {
  const prospect = await getProspect(db, teamId, prospectId);
  const outline = sql`(SELECT outline FROM prospects WHERE id = ${prospectId} AND team_id = ${teamId})`;
  const centre = sql`ST_Centroid(${outline})`;
  const area = sql`ST_DWithin(w.location::geography, ${outline}::geography, ${bufferKm * 1000})`;
  const rows = await candidateRows(db, teamId, centre, area, null, sql`ST_Distance(w.location::geography, ${outline}::geography)`);
  return rows
    .map((r) => {
      const tdTvdssM = r.td_tvd_m === null ? null : r.td_tvd_m - r.datum_elevation_m;
      const tdCoverage = tdTvdssM === null || prospect.targetBaseM === null ? null : tdTvdssM / prospect.targetBaseM;
      // "Near" is measured across the buffer: a well inside the outline scores full marks.
      return toCandidate(r, {
        distanceKm: Number(r.distance_m) / 1000,
        waterDepthDiffM: null,
        tdCoverage,
        radiusKm: Math.max(bufferKm, 1e-3),
      });
    })
    .sort(byScore);
}

type CandidateRow = {
  id: string;
  name: string;
  uwi: string | null;
  status: string;
  lon: number;
  lat: number;
  distance_m: number;
  azimuth_rad: number | null;
  water_depth_m: number | null;
  datum_elevation_m: number;
  td_tvd_m: number | null;
  td_md_m: number | null;
  pressures: number;
  logs: number;
  has_lot: boolean;
  has_survey: boolean;
  in_set: boolean;
  top_tvdss_m: number | null;
};

/** The facts the ranking reads for every team well in `area`, nearest first; distance from `here` unless given. */
async function candidateRows(
  db: Db,
  teamId: string,
  here: SQL,
  area: SQL,
  plannedWellId: string | null,
  distance?: SQL,
): Promise<CandidateRow[]> {
  const inSet = plannedWellId
    ? sql`EXISTS (SELECT 1 FROM offset_picks o WHERE o.planned_well_id = ${plannedWellId} AND o.well_id = w.id)`
    : sql`false`;
  const current = currentInterpretationOf(db, sql`w.id`);
  const rows = await db.execute<CandidateRow>(sql`
    SELECT w.id, w.name, w.uwi, w.status::text, ST_X(w.location) AS lon, ST_Y(w.location) AS lat,
      ${distance ?? sql`ST_Distance(w.location::geography, ${here}::geography)`} AS distance_m,
      ST_Azimuth(${here}::geography, w.location::geography) AS azimuth_rad,
      w.water_depth_m, w.datum_elevation_m, w.td_tvd_m, w.td_md_m,
      (SELECT count(*)::int FROM pressure_observations p WHERE p.well_id = w.id) AS pressures,
      (SELECT count(*)::int FROM log_curves l WHERE l.well_id = w.id) AS logs,
      EXISTS (SELECT 1 FROM pressure_observations p WHERE p.well_id = w.id AND p.kind IN ('lot', 'fit')) AS has_lot,
      EXISTS (SELECT 1 FROM survey_stations s WHERE s.well_id = w.id) AS has_survey,
      ${inSet} AS in_set,
      ${current.topTvdM} - w.datum_elevation_m AS top_tvdss_m
    FROM wells w
    LEFT JOIN LATERAL ${current} ON true
    WHERE w.team_id = ${teamId} AND ${area}
    ORDER BY distance_m
    LIMIT 500`);
  return rows.rows;
}

function toCandidate(
  r: CandidateRow,
  m: { distanceKm: number; waterDepthDiffM: number | null; tdCoverage: number | null; radiusKm: number },
): OffsetCandidate {
  const c = {
    wellId: r.id,
    name: r.name,
    uwi: r.uwi,
    status: r.status,
    lon: Number(r.lon),
    lat: Number(r.lat),
    distanceKm: m.distanceKm,
    azimuthDeg: r.azimuth_rad === null ? 0 : (Number(r.azimuth_rad) * 180) / Math.PI,
    waterDepthM: r.water_depth_m,
    waterDepthDiffM: m.waterDepthDiffM,
    tdTvdM: r.td_tvd_m ?? r.td_md_m,
    tdCoverage: m.tdCoverage,
    pressureCount: r.pressures,
    logCount: r.logs,
    hasLot: r.has_lot,
    hasSurvey: r.has_survey,
    topTvdssM: r.top_tvdss_m === null ? null : Number(r.top_tvdss_m),
    inOffsetSet: r.in_set,
    score: 0,
  };
  return { ...c, score: offsetScore({ ...c, radiusKm: m.radiusKm }) };
}

const byScore = (a: OffsetCandidate, b: OffsetCandidate) => b.score - a.score || a.distanceKm - b.distanceKm;

export async function getOffsetSet(db: Db, teamId: string, plannedWellId: string): Promise<OffsetSetEntry[]> {
  await getPlannedWell(db, teamId, plannedWellId);
  const rows = await db
    .select({
      wellId: offsetPicks.wellId,
      name: wells.name,
      reason: offsetPicks.reason,
      addedBy: offsetPicks.addedBy,
      addedByName: users.name,
      addedAt: offsetPicks.addedAt,
    })
    .from(offsetPicks)
    .innerJoin(wells, eq(wells.id, offsetPicks.wellId))
    .leftJoin(users, eq(users.id, offsetPicks.addedBy))
    .where(eq(offsetPicks.plannedWellId, plannedWellId))
    .orderBy(wells.name);
  return rows.map((r) => ({ ...r, addedAt: r.addedAt.toISOString() }));
}

/** Replaces the offset set; wells kept from before keep their original who/when. */
export async function putOffsetSet(
  db: Db,
  teamId: string,
  userId: string,
  plannedWellId: string,
  body: OffsetSetBody,
): Promise<OffsetSetEntry[]> {
  await getPlannedWell(db, teamId, plannedWellId);
  const ids = [...new Set(body.wells.map((w) => w.wellId))];
  if (ids.length) {
    const found = await db
      .select({ id: wells.id })
      .from(wells)
      .where(and(eq(wells.teamId, teamId), inArray(wells.id, ids)));
    const missing = ids.filter((id) => !found.some((f) => f.id === id));
    if (missing.length) {
      throw badRequest(
        'validation_failed',
        `${missing.length} of the wells are not wells of this team.`,
        missing.map((id) => ({ path: 'wells', message: `${id} is not a well of this team` })),
      );
    }
  }
  await db.transaction(async (tx) => {
    await tx.delete(offsetPicks).where(
      and(
        eq(offsetPicks.plannedWellId, plannedWellId),
        ids.length
          ? sql`${offsetPicks.wellId} NOT IN (${sql.join(
              ids.map((i) => sql`${i}::uuid`),
              sql`, `,
            )})`
          : sql`true`,
      ),
    );
    for (const w of body.wells) {
      await tx
        .insert(offsetPicks)
        .values({ plannedWellId, wellId: w.wellId, reason: w.reason ?? null, addedBy: userId })
        .onConflictDoUpdate({ target: [offsetPicks.plannedWellId, offsetPicks.wellId], set: { reason: w.reason ?? null } });
    }
  });
  return getOffsetSet(db, teamId, plannedWellId);
}
