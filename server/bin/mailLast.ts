// `npm run mail:last -- --to someone@example.org`: prints the newest message the local mail fake kept for
// that address (a password-reset or invitation link), for whoever runs Porelith on this machine.
import { parseArgs } from 'node:util';
import { emailSchema } from '../../shared/schemas/auth';
import { createDb } from '../db/client';
import { loadEnvOrExit } from '../env';
import { formatMail, newestMailTo } from '../features/mail/lastMail';

const { values } = parseArgs({ options: { to: { type: 'string' } }, allowPositionals: false });
const to = emailSchema.safeParse(values.to ?? '');
if (!to.success) {
  console.error('[porelith] --to must be an e-mail address');
  console.error('[porelith] usage: npm run mail:last -- --to someone@example.org');
  process.exit(2);
}
const env = loadEnvOrExit();
const db = createDb(env.DATABASE_URL, 1);
try {
  const mail = await newestMailTo(db, to.data);
  if (mail) console.log(formatMail(mail));
  else {
    console.error(`[porelith] no mail stored for ${to.data}. (Only the local mail fake keeps mail; with SMTP_HOST set, mail went out.)`);
    process.exitCode = 1;
  }
} catch (err) {
  console.error(`[porelith] could not read the stored mail: ${(err as Error).message}`);
  process.exitCode = 1;
} finally {
  await db.$client.end();
}
