import { sql, type SQL } from 'drizzle-orm';
import type { Db } from '../../db/client';

/** Below this zoom wells are aggregated into grid clusters, so 100,000 wells stay a light tile. */
export const CLUSTER_BELOW_ZOOM = 9;
/** Cluster grid cells per tile side: 4096-unit tiles split 48 ways ≈ 85 units, ~5 px at 512 px tiles. */
const CLUSTER_CELLS = 48;
const EXTENT = 4096;
const BUFFER = 64;

const envelope = (z: number, x: number, y: number) => sql`ST_TileEnvelope(${z}, ${x}, ${y})`;

function wellsQuery(teamId: string, z: number, x: number, y: number): SQL {
  const env = envelope(z, x, y);
  const inTile = sql`w.team_id = ${teamId} AND w.location && ST_Transform(${env}, 4326)`;
  if (z >= CLUSTER_BELOW_ZOOM) {
    return sql`
      WITH f AS (
        SELECT ST_AsMVTGeom(ST_Transform(w.location, 3857), ${env}, ${EXTENT}, ${BUFFER}, true) AS geom,
          w.id::text AS id, w.name, w.uwi, w.status::text AS status,
          (SELECT count(*)::int FROM pressure_observations p WHERE p.well_id = w.id) AS pressures,
          (SELECT count(*)::int FROM log_curves l WHERE l.well_id = w.id) AS logs,
          EXISTS (SELECT 1 FROM pressure_observations p WHERE p.well_id = w.id AND p.kind IN ('lot', 'fit')) AS has_lot,
          EXISTS (SELECT 1 FROM survey_stations s WHERE s.well_id = w.id) AS has_survey
        FROM wells w WHERE ${inTile})
      SELECT ST_AsMVT(f, 'wells', ${EXTENT}, 'geom') AS tile FROM f WHERE geom IS NOT NULL`;
  }
  // Grid cells computed from lon/lat with the web-mercator formulas (OpenStreetMap slippy-map tile
  // numbering scaled by the cells per tile): arithmetic per row instead of ST_Transform, and only the
  // cluster centres are turned into geometry.
  const n = 2 ** z * CLUSTER_CELLS;
  return sql`
    WITH p AS (
      SELECT w.id, w.name, w.status::text AS status, ST_X(w.location) AS lon, ST_Y(w.location) AS lat FROM wells w WHERE ${inTile}),
    c AS (
      SELECT count(*)::int AS count, avg(lon) AS lon, avg(lat) AS lat, min(id::text) AS id, min(name) AS name, min(status) AS status
      FROM p
      GROUP BY floor((lon + 180) / 360 * ${n}), floor((1 - ln(tan(radians(lat)) + 1 / cos(radians(lat))) / pi()) / 2 * ${n})),
    f AS (
      SELECT ST_AsMVTGeom(ST_Transform(ST_SetSRID(ST_MakePoint(lon, lat), 4326), 3857), ${env}, ${EXTENT}, ${BUFFER}, true) AS geom,
        count, count > 1 AS cluster,
        CASE WHEN count = 1 THEN id END AS id, CASE WHEN count = 1 THEN name END AS name, CASE WHEN count = 1 THEN status END AS status
      FROM c)
    SELECT ST_AsMVT(f, 'wells', ${EXTENT}, 'geom') AS tile FROM f WHERE geom IS NOT NULL`;
}

function prospectsQuery(teamId: string, z: number, x: number, y: number): SQL {
  const env = envelope(z, x, y);
  return sql`
    WITH f AS (
      SELECT ST_AsMVTGeom(ST_Transform(p.outline, 3857), ${env}, ${EXTENT}, ${BUFFER}, true) AS geom, p.id::text AS id, p.name
      FROM prospects p WHERE p.team_id = ${teamId} AND p.outline && ST_Transform(${env}, 4326))
    SELECT ST_AsMVT(f, 'prospects', ${EXTENT}, 'geom') AS tile FROM f WHERE geom IS NOT NULL`;
}

function plannedQuery(teamId: string, z: number, x: number, y: number): SQL {
  const env = envelope(z, x, y);
  return sql`
    WITH f AS (
      SELECT ST_AsMVTGeom(ST_Transform(p.location, 3857), ${env}, ${EXTENT}, ${BUFFER}, true) AS geom, p.id::text AS id, p.name, p.planned_td_m
      FROM planned_wells p WHERE p.team_id = ${teamId} AND p.location && ST_Transform(${env}, 4326))
    SELECT ST_AsMVT(f, 'planned-wells', ${EXTENT}, 'geom') AS tile FROM f WHERE geom IS NOT NULL`;
}

/**
 * A reference layer's features (`reference`) and, in a second tile layer (`reference-labels`), one point
 * inside each named polygon. Labelling the polygons themselves would repeat the name in every tile the
 * polygon crosses; the point falls in one tile only.
 */
function referenceQuery(teamId: string, layerId: string, z: number, x: number, y: number): SQL {
  const env = envelope(z, x, y);
  const inTile = sql`l.team_id = ${teamId} AND l.id = ${layerId} AND r.geom && ST_Transform(${env}, 4326)`;
  return sql`
    WITH f AS (
      SELECT ST_AsMVTGeom(ST_Transform(r.geom, 3857), ${env}, ${EXTENT}, ${BUFFER}, true) AS geom, r.properties->>'name' AS name, r.properties::text AS props
      FROM reference_features r JOIN reference_layers l ON l.id = r.layer_id
      WHERE ${inTile}),
    p AS (
      SELECT ST_AsMVTGeom(ST_Transform(ST_PointOnSurface(r.geom), 3857), ${env}, ${EXTENT}, ${BUFFER}, true) AS geom, r.properties->>'name' AS name
      FROM reference_features r JOIN reference_layers l ON l.id = r.layer_id
      WHERE ${inTile} AND GeometryType(r.geom) IN ('POLYGON', 'MULTIPOLYGON') AND coalesce(r.properties->>'name', '') <> '')
    SELECT coalesce((SELECT ST_AsMVT(f, 'reference', ${EXTENT}, 'geom') FROM f WHERE geom IS NOT NULL), ''::bytea)
      || coalesce((SELECT ST_AsMVT(p, 'reference-labels', ${EXTENT}, 'geom') FROM p WHERE geom IS NOT NULL), ''::bytea) AS tile`;
}

export type TeamLayer = { kind: 'wells' | 'prospects' | 'planned-wells' } | { kind: 'reference'; layerId: string };

/** The SQL for one team tile; exported so the bench can time the raw query beside the endpoint. */
export function teamTileQuery(teamId: string, layer: TeamLayer, z: number, x: number, y: number): SQL {
  switch (layer.kind) {
    case 'wells':
      return wellsQuery(teamId, z, x, y);
    case 'prospects':
      return prospectsQuery(teamId, z, x, y);
    case 'planned-wells':
      return plannedQuery(teamId, z, x, y);
    case 'reference':
      return referenceQuery(teamId, layer.layerId, z, x, y);
  }
}

/** One Mapbox Vector Tile (possibly empty: 0 bytes) straight from PostGIS. */
export async function teamTile(db: Db, teamId: string, layer: TeamLayer, z: number, x: number, y: number): Promise<Buffer> {
  const r = await db.execute<{ tile: Buffer | null }>(teamTileQuery(teamId, layer, z, x, y));
  return r.rows[0]?.tile ?? Buffer.alloc(0);
}
