// Entry point run by the bootstrap: migrations, then (with --demo) the idempotent demo seed.
import { loadEnvOrExit } from '../env';
import { createDb } from './client';
import { applyMigrations } from './migrate';
import { seedDemoAccounts } from './seed/demoAccounts';

const env = loadEnvOrExit();
const db = createDb(env.DATABASE_URL, 2);
try {
  await applyMigrations(db);
  if (process.argv.includes('--demo')) await seedDemoAccounts(db);
  console.log('[porelith] database ready (migrations applied, demo accounts present)');
} catch (err) {
  console.error(`[porelith] database set-up failed: ${(err as Error).message}`);
  process.exitCode = 1;
} finally {
  await db.$client.end();
}
