import { Router } from 'express';
import { sql } from 'drizzle-orm';
import type { Db } from '../../db/client';

/** Liveness with the database and PostGIS behind it: 503 when either is unreachable. */
export function healthRouter(db: Db): Router {
  const r = Router();
  r.get('/', async (_req, res) => {
    try {
      const result = await db.execute<{ v: string }>(sql`SELECT postgis_lib_version() AS v`);
      res.json({ ok: true, db: 'up', postgis: result.rows[0].v });
    } catch {
      res.status(503).json({ ok: false, db: 'down', error: { code: 'db_down', message: 'The database is not reachable.' } });
    }
  });
  return r;
}
