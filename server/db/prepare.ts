import type { Db } from './client';
import { applyMigrations } from './migrate';
import { seedDemoAccounts } from './seed/demoAccounts';
import { seedDemoBasin, type SeedDemoBasinResult } from './seed/demoBasin/write';

/**
 * Brings a database up to date: the committed migrations, then with `demo` the idempotent demo seed (the demo
 * accounts and the synthetic demo basin in the demo team; `regenerate` writes the basin anew). Without `demo`
 * nothing demo is created, so accounts an admin removed stay removed. `basin` is null when the demo is off.
 */
export async function prepareDatabase(
  db: Db,
  opts: { demo: boolean; regenerate: boolean },
): Promise<{ basin: SeedDemoBasinResult | null }> {
  await applyMigrations(db);
  if (!opts.demo) return { basin: null };
  const teamId = await seedDemoAccounts(db);
  return { basin: await seedDemoBasin(db, teamId, { regenerate: opts.regenerate }) };
}
