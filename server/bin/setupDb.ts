// Entry point run by the bootstrap before the app starts: `tsx server/bin/setupDb.ts [--demo] [--regenerate]`.
// The demo seed runs when PORELITH_DEMO is on or with --demo; --regenerate writes the demo basin anew.
import { createDb } from '../db/client';
import { prepareDatabase } from '../db/prepare';
import { loadEnvOrExit } from '../env';

const env = loadEnvOrExit();
const db = createDb(env.DATABASE_URL, 2);
try {
  const demo = env.PORELITH_DEMO || process.argv.includes('--demo');
  const { basin } = await prepareDatabase(db, { demo, regenerate: process.argv.includes('--regenerate') });
  if (basin) {
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
