import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import pg from 'pg';
import * as schema from './schema';

export type Db = NodePgDatabase<typeof schema> & { $client: pg.Pool };

/** One pool per process; `casing` maps camelCase fields to snake_case columns. */
export function createDb(databaseUrl: string, max = 10): Db {
  const pool = new pg.Pool({ connectionString: databaseUrl, max });
  // An idle client that loses its server must not crash the process; health reports it instead.
  pool.on('error', () => {});
  return drizzle(pool, { schema, casing: 'snake_case' }) as Db;
}
