import { migrate } from 'drizzle-orm/node-postgres/migrator';
import { fileURLToPath } from 'node:url';
import type { Db } from './client';

const migrationsFolder = fileURLToPath(new URL('./migrations', import.meta.url));

/** Applies the committed drizzle-kit migrations in order (PostGIS first). */
export async function applyMigrations(db: Db): Promise<void> {
  await migrate(db, { migrationsFolder });
}
