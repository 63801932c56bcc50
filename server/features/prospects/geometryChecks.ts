import { sql } from 'drizzle-orm';
import type { PolygonGeometry } from '../../../shared/schemas/planning';
import type { Db } from '../../db/client';
import { badRequest } from '../../lib/httpError';

/**
 * A prospect outline must be a closed, simple ring with an area: PostGIS says why when it is not
 * (e.g. "Self-intersection[-101.1 -32.4]").
 */
export async function checkPolygon(db: Db, geometry: PolygonGeometry): Promise<void> {
  const ring = geometry.coordinates[0];
  const [first, last] = [ring[0], ring[ring.length - 1]];
  if (first[0] !== last[0] || first[1] !== last[1]) {
    throw badRequest('invalid_geometry', 'The outline is not closed: its last position must equal its first.', [
      { path: 'geometry', message: 'ring is not closed' },
    ]);
  }
  const r = await db.execute<{ valid: boolean; reason: string; area: number }>(
    sql`SELECT ST_IsValid(g) AS valid, ST_IsValidReason(g) AS reason, ST_Area(g::geography) AS area
        FROM (SELECT ST_SetSRID(ST_GeomFromGeoJSON(${JSON.stringify(geometry)}), 4326) AS g) s`,
  );
  const { valid, reason, area } = r.rows[0];
  if (!valid)
    throw badRequest('invalid_geometry', `The outline is not a valid polygon: ${reason}.`, [{ path: 'geometry', message: reason }]);
  if (!(area > 0)) throw badRequest('invalid_geometry', 'The outline has no area.', [{ path: 'geometry', message: 'empty polygon' }]);
}
