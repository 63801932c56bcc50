// Entry point: the local mail fake that `npm start` runs beside the app.
import { createDb } from '../db/client';
import { loadEnvOrExit } from '../env';
import { startMailFake } from '../features/mail/mailFake';

const env = loadEnvOrExit();
const db = createDb(env.DATABASE_URL, 2);
const fake = await startMailFake(db, { host: '127.0.0.1', port: env.SMTP_PORT });
console.log(`[porelith] mail fake listening on smtp://127.0.0.1:${fake.port} (messages appear in the Outbox)`);

const stop = async () => {
  await fake.close();
  await db.$client.end();
  process.exit(0);
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
