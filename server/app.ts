import cookieParser from 'cookie-parser';
import express, { type Express } from 'express';
import helmet from 'helmet';
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { pinoHttp } from 'pino-http';
import type { Logger } from 'pino';
import type { Db } from './db/client';
import type { Env } from './env';
import { authRouter } from './features/auth/auth.router';
import { healthRouter } from './features/health/health.router';
import type { Mailer } from './features/mail/mailer';
import { teamsRouter } from './features/teams/teams.router';
import { wellsRouter } from './features/wells/wells.router';
import { importsRouter } from './features/imports/imports.router';
import { jobsRouter } from './features/jobs/jobs.router';
import { basemapRouter } from './features/tiles/basemap.router';
import { teamTilesRouter } from './features/tiles/teamTiles.router';
import { planningRouter } from './features/planning/planning.router';
import { JobRegistry } from './lib/jobs';
import { TeamChanges } from './lib/teamChanges';
import { layersRouter } from './features/layers/layers.router';
import { interpretationsRouter } from './features/interpretations/interpretations.router';
import { surfacesRouter } from './features/surfaces/surfaces.router';
import { createLogger } from './lib/logger';
import { errorHandler, notFoundApi } from './middleware/errors';
import { requireSession } from './middleware/guards';
import { sessionMiddleware } from './middleware/session';

export interface AppDeps {
  db: Db;
  env: Env;
  mailer: Mailer;
  logger?: Logger;
  /** Serve the built client from this folder when it exists (off in API tests). */
  serveClient?: boolean;
  /** Keep recent team tiles in memory (off in the tile benchmark, which must time PostGIS each time). */
  tileCache?: boolean;
}

const JSON_LIMIT = '1mb';

/** Builds the whole HTTP app without listening, so tests drive it with supertest. */
export function createApp({ db, env, mailer, logger, serveClient = true, tileCache = true }: AppDeps): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(
    helmet({
      // Everything the page loads is ours: no CDN, no external font, no tile server.
      contentSecurityPolicy: {
        useDefaults: false,
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'", "'unsafe-inline'"], // Naive UI injects its styles at run time
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'", 'data:'],
          connectSrc: ["'self'"],
          workerSrc: ["'self'", 'blob:'],
          childSrc: ["'self'", 'blob:'],
          objectSrc: ["'none'"],
          baseUri: ["'self'"],
          frameAncestors: ["'none'"],
          formAction: ["'self'"],
        },
      },
      hsts: env.APP_URL.startsWith('https://'),
      crossOriginEmbedderPolicy: false,
    }),
  );
  app.use(
    pinoHttp({
      logger: logger ?? createLogger(env.LOG_LEVEL),
      autoLogging: { ignore: (req) => req.url === '/api/health' || (req.url ?? '').startsWith('/tiles/') },
    }),
  );
  app.use(express.json({ limit: JSON_LIMIT }));
  app.use(cookieParser());
  app.use('/api', sessionMiddleware(db, env));

  app.use('/api/health', healthRouter(db));
  app.use('/api/auth', authRouter(db, env, mailer));
  const changes = new TeamChanges();
  const jobs = new JobRegistry();
  app.use(
    '/api/teams',
    requireSession,
    teamsRouter(db, env, mailer),
    wellsRouter(db, changes),
    importsRouter(db, changes, jobs),
    planningRouter(db, changes),
    layersRouter(db, changes),
    interpretationsRouter(db, changes),
    surfacesRouter(db, jobs),
    jobsRouter(jobs),
    teamTilesRouter(db, changes, { cache: tileCache }),
  );
  app.use('/api', notFoundApi);
  app.use('/tiles', basemapRouter());

  const dist = resolve(env.PORELITH_DIST);
  if (serveClient && existsSync(resolve(dist, 'index.html'))) {
    app.use(express.static(dist, { index: false, maxAge: '1h', setHeaders: immutableAssets }));
    app.get('/{*splat}', (_req, res) => res.sendFile(resolve(dist, 'index.html'), { maxAge: 0 }));
  }
  app.use(errorHandler);
  return app;
}

/** Vite fingerprints everything under /assets, so those can be cached for good. */
function immutableAssets(res: express.Response, path: string) {
  if (path.includes(`${'/'}assets${'/'}`)) res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
}
