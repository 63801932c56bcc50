// Entry point run by the bootstrap: migrations, then (when PORELITH_DEMO is on, or with --demo) the
// idempotent demo seed: the demo accounts and the synthetic demo basin in the demo team.
// --regenerate writes the basin anew. With the demo off nothing demo is created, so accounts an admin
// removed stay removed.
import { loadEnvOrExit } from '../env';
import { createDb } from './client';
import { applyMigrations } from './migrate';
import { seedDemoAccounts } from './seed/demoAccounts';
import { seedDemoBasin } from './seed/demoBasin/write';

const env = loadEnvOrExit();
const db = createDb(env.DATABASE_URL, 2);
try {
  await applyMigrations(db);
  const demo = env.PORELITH_DEMO || process.argv.includes('--demo');
  if (demo) {
    const teamId = await seedDemoAccounts(db);
    const basin = await seedDemoBasin(db, teamId, { regenerate: process.argv.includes('--regenerate') });
    console.log(
      basin.written
        ? `[porelith] synthetic demo basin written: ${basin.wells} wells, ${basin.pressures} pressure observations, ${basin.logCurves} log curves (${(basin.ms / 1000).toFixed(1)} s)`
        : '[porelith] synthetic demo basin already present (npm run seed:demo rewrites it)',
    );
  }
  console.log(`[porelith] database ready (migrations applied${demo ? ', demo accounts present' : '; demo not seeded, PORELITH_DEMO=0'})`);
} catch (err) {
  console.error(`[porelith] database set-up failed: ${(err as Error).message}`);
  process.exitCode = 1;
} finally {
  await db.$client.end();
}
