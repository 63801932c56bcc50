// `npm run admin:create -- --email … --name … --team …`: the first admin of an install run without the demo
// accounts (PORELITH_DEMO=0). Prints a one-time password once; nothing else shows it again.
import { parseArgs } from 'node:util';
import { createDb } from '../db/client';
import { applyMigrations } from '../db/migrate';
import { loadEnvOrExit } from '../env';
import { firstAdminInput, createFirstAdmin } from '../features/teams/firstAdmin.service';

const { values } = parseArgs({
  options: { email: { type: 'string' }, name: { type: 'string' }, team: { type: 'string' } },
  allowPositionals: false,
});
const parsed = firstAdminInput.safeParse(values);
if (!parsed.success) {
  for (const issue of parsed.error.issues) console.error(`[porelith] --${issue.path.join('.')}: ${issue.message}`);
  console.error('[porelith] usage: npm run admin:create -- --email ops@example.org --name "Ops Lead" --team "North Shelf"');
  process.exit(2);
}
const env = loadEnvOrExit();
const db = createDb(env.DATABASE_URL, 1);
try {
  await applyMigrations(db);
  const made = await createFirstAdmin(db, parsed.data);
  console.log(`[porelith] ${parsed.data.email} is an admin of "${parsed.data.team}".`);
  console.log(
    made.password
      ? `[porelith] one-time password: ${made.password}\n[porelith] pass it on privately; the admin should replace it at once with "Forgot password" on the sign-in page.`
      : '[porelith] the account already existed; its password is unchanged.',
  );
} catch (err) {
  console.error(`[porelith] could not create the admin: ${(err as Error).message}`);
  process.exitCode = 1;
} finally {
  await db.$client.end();
}
