import { and, eq, sql } from 'drizzle-orm';
import type { ReferenceLayer } from '../../../shared/schemas/planning';
import type { Db } from '../../db/client';
import { referenceLayers } from '../../db/schema';
import { bulkInsert } from '../../lib/bulkInsert';
import { badRequest, notFound } from '../../lib/httpError';
import { readLayerFile } from './readLayerFile';
import { invalidGeometryMessage } from './layerMessages';

export interface NewLayer {
  teamId: string;
  userId: string;
  name: string;
  kind: ReferenceLayer['kind'];
  color: string;
  fileName: string;
  bytes: Buffer;
}

/** Reads, checks every geometry in PostGIS, and stores the layer with its features in one transaction. */
export async function createLayer(db: Db, layer: NewLayer): Promise<ReferenceLayer> {
  const features = readLayerFile(layer.fileName, layer.bytes);
  const id = await db.transaction(async (tx) => {
    const [row] = await tx
      .insert(referenceLayers)
      .values({
        teamId: layer.teamId,
        name: layer.name,
        kind: layer.kind,
        color: layer.color,
        fileName: layer.fileName,
        createdBy: layer.userId,
      })
      .returning({ id: referenceLayers.id });
    await bulkInsert(
      tx,
      'reference_features',
      [
        ['layer_id', 'uuid'],
        ['geom', 'text', 'ST_Force2D(ST_SetSRID(ST_GeomFromGeoJSON($value), 4326))'],
        ['properties', 'jsonb'],
      ],
      features.map((f) => [row.id, JSON.stringify(f.geometry), JSON.stringify(f.properties)]),
    );
    const bad = await tx.execute<{ n: number; reason: string }>(sql`
      SELECT n, ST_IsValidReason(geom) AS reason FROM (
        SELECT row_number() OVER (ORDER BY ctid) AS n, geom FROM reference_features WHERE layer_id = ${row.id}) f
      WHERE NOT ST_IsValid(geom) ORDER BY n LIMIT 1`);
    if (bad.rows.length) {
      // Throwing rolls the whole layer back: nothing is stored.
      const n = Number(bad.rows[0].n);
      throw badRequest('invalid_layer', invalidGeometryMessage(n, features[n - 1]?.properties, bad.rows[0].reason), { feature: n });
    }
    return row.id;
  });
  return getLayer(db, layer.teamId, id);
}

const summary = sql`
  SELECT l.id, l.name, l.kind::text, l.color, l.created_at,
    (SELECT count(*)::int FROM reference_features f WHERE f.layer_id = l.id) AS feature_count,
    (SELECT array_agg(DISTINCT GeometryType(f.geom)) FROM reference_features f WHERE f.layer_id = l.id) AS types,
    (SELECT ST_Extent(f.geom)::geometry FROM reference_features f WHERE f.layer_id = l.id) AS extent
  FROM reference_layers l`;

type SummaryRow = {
  id: string;
  name: string;
  kind: ReferenceLayer['kind'];
  color: string;
  created_at: Date;
  feature_count: number;
  types: string[] | null;
  xmin: number | null;
  ymin: number | null;
  xmax: number | null;
  ymax: number | null;
};

function toLayer(r: SummaryRow): ReferenceLayer {
  return {
    id: r.id,
    name: r.name,
    kind: r.kind,
    color: r.color,
    featureCount: r.feature_count,
    geometryTypes: r.types ?? [],
    bbox: r.xmin === null ? null : [Number(r.xmin), Number(r.ymin), Number(r.xmax), Number(r.ymax)],
    createdAt: new Date(r.created_at).toISOString(),
  };
}

async function query(db: Db, where: ReturnType<typeof sql>) {
  const r = await db.execute<SummaryRow>(
    sql`SELECT s.*, ST_XMin(extent) AS xmin, ST_YMin(extent) AS ymin, ST_XMax(extent) AS xmax, ST_YMax(extent) AS ymax FROM (${summary} WHERE ${where}) s ORDER BY s.name`,
  );
  return r.rows.map(toLayer);
}

export const listLayers = (db: Db, teamId: string) => query(db, sql`l.team_id = ${teamId}`);

export async function getLayer(db: Db, teamId: string, id: string): Promise<ReferenceLayer> {
  const [layer] = await query(db, sql`l.team_id = ${teamId} AND l.id = ${id}`);
  if (!layer) throw notFound('That layer');
  return layer;
}

export async function deleteLayer(db: Db, teamId: string, id: string): Promise<void> {
  const gone = await db
    .delete(referenceLayers)
    .where(and(eq(referenceLayers.teamId, teamId), eq(referenceLayers.id, id)))
    .returning({ id: referenceLayers.id });
  if (!gone.length) throw notFound('That layer');
}
