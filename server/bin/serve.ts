// Entry point of the API server (`npm start` runs it): parse the environment, connect, listen. Everything else is in createApp().
import { createApp } from '../app';
import { createDb } from '../db/client';
import { demoAccountsExist } from '../db/seed/demoAccounts';
import { loadEnvOrExit } from '../env';
import { createMailer } from '../features/mail/mailer';
import { createLogger } from '../lib/logger';

const env = loadEnvOrExit();
const logger = createLogger(env.LOG_LEVEL);
const db = createDb(env.DATABASE_URL);
const mailer = createMailer(env);
const app = createApp({ db, env, mailer, logger });

if (env.NODE_ENV === 'production' && (await demoAccountsExist(db).catch(() => false))) {
  logger.warn('Demo accounts with the published password "porelith-demo" exist. Remove them before real use.');
}

const server = app.listen(env.PORT, env.HOST, () => {
  console.log(`\n  Porelith is running at ${env.APP_URL}\n  (synthetic demo data; sign in as planner@porelith.example / porelith-demo)\n`);
});
server.on('error', (err) => {
  console.error(`[porelith] cannot listen on ${env.HOST}:${env.PORT}: ${err.message}`);
  process.exit(1);
});

const stop = () => {
  server.close(() => void db.$client.end().then(() => process.exit(0)));
  setTimeout(() => process.exit(0), 3000).unref();
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
