#!/usr/bin/env node
// Plain Node on purpose: this runs before `npm ci`, so it may use nothing but Node's own modules.
// `npm start` → start, `npm run dev` → dev, `npm test` → test, `npm run seed:demo` → seed,
// `npm run mail:last -- --to x@example.org` → mail (the newest message the local mail fake kept for x).
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { ensureNodeModules, ensureDebianPackages, ensureChromium } from './setup/install.mjs';
import { startPrivateCluster, stopCluster, freePort } from './setup/cluster.mjs';
import { readOrCreateSecret } from './setup/secrets.mjs';
import { run, say, fail, ROOT } from './setup/proc.mjs';

const mode = process.argv[2] ?? 'start';
if (!['start', 'dev', 'test', 'seed', 'bench', 'admin', 'mail'].includes(mode))
  fail(`Unknown mode "${mode}" (start, dev, test, seed, bench, admin, mail).`);

const tsx = join(ROOT, 'node_modules', '.bin', 'tsx');

// What must be undone if set-up is interrupted (Ctrl-C) or fails: stopping the private cluster and
// removing a throwaway folder. Run last-in first-out, each at most once.
const cleanups = [];
function cleanUp() {
  while (cleanups.length) {
    try {
      cleanups.pop()();
    } catch (err) {
      process.stderr.write(`[porelith] clean-up: ${err instanceof Error ? err.message : err}\n`);
    }
  }
}
// Replaced by the app's own shutdown once everything runs; until then a signal undoes the set-up.
let onSignal = (signal) => {
  say(`${signal} during set-up: stopping what was started.`);
  cleanUp();
  process.exit(130);
};
process.on('SIGINT', () => onSignal('SIGINT'));
process.on('SIGTERM', () => onSignal('SIGTERM'));

async function main() {
  ensureNodeModules();
  if (mode === 'test') await runTests();
  else if (mode === 'bench') await runBench();
  else await runApp();
}

/** The app on its persistent private cluster (or on DATABASE_URL when given). */
async function runApp() {
  const dataDir = resolve(ROOT, process.env.PORELITH_DATA ?? '.data');
  const pgPort = Number(process.env.PORELITH_PG_PORT ?? 54329);
  // Decided before NODE_ENV gets its default below: a plain `npm start` keeps the demo accounts, an
  // install that says NODE_ENV=production gets them only with PORELITH_DEMO=1, so removed ones stay removed.
  const demo = process.env.PORELITH_DEMO ?? (process.env.NODE_ENV === 'production' ? '0' : '1');
  if (demo !== '0' && demo !== '1') fail(`PORELITH_DEMO must be 0 or 1 (it is "${demo}").`);
  // A real SMTP host replaces the local mail fake, which then is not started at all.
  const mailFake = !process.env.SMTP_HOST;
  let cluster = null;
  let databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl) {
    ensureDebianPackages({ postgres: true });
    const dir = join(dataDir, 'pg');
    // A one-shot command (reading mail, the first admin, re-seeding) while `npm start` runs must not stop the
    // cluster the app is using.
    const alreadyRunning = ['mail', 'admin', 'seed'].includes(mode) && existsSync(join(dir, 'postmaster.pid'));
    if (!alreadyRunning) cleanups.push(() => stopCluster(cluster ?? { dir })); // also when interrupted while it starts
    cluster = await startPrivateCluster({ dir, port: pgPort, throwaway: false });
    databaseUrl = cluster.databaseUrl;
  }
  const env = {
    ...process.env,
    DATABASE_URL: databaseUrl,
    JWT_SECRET: process.env.JWT_SECRET ?? readOrCreateSecret(join(dataDir, 'jwt-secret')),
    ...(mailFake ? { SMTP_PORT: process.env.SMTP_PORT ?? String(Number(process.env.PORELITH_SMTP_PORT ?? pgPort + 1)) } : {}),
    NODE_ENV: process.env.NODE_ENV ?? (mode === 'dev' ? 'development' : 'production'),
    PORELITH_DEMO: demo,
  };
  if (mode === 'mail') {
    await run(tsx, ['server/bin/mailLast.ts', ...process.argv.slice(3)], { env, label: 'mail' });
    cleanUp();
    return;
  }
  const setupArgs = mode === 'seed' ? ['--demo', '--regenerate'] : [];
  await run(tsx, ['server/bin/setupDb.ts', ...setupArgs], { env, label: 'database' });
  if (mode === 'admin') await run(tsx, ['server/bin/createAdmin.ts', ...process.argv.slice(3)], { env, label: 'first admin' });
  if (mode === 'seed' || mode === 'admin') {
    cleanUp();
    return;
  }
  if (mode === 'start')
    await run(join(ROOT, 'node_modules', '.bin', 'vite'), ['build', '--logLevel', 'warn'], { env, label: 'client build' });

  const children = [];
  const launch = (args, label, extraEnv = {}) => {
    const child = spawn(args[0], args.slice(1), { cwd: ROOT, env: { ...env, ...extraEnv }, stdio: 'inherit' });
    child.on('exit', (code, signal) => {
      if (!stopping) {
        say(`${label} stopped (${signal ?? code}); shutting down.`);
        shutdown(code ?? 1);
      }
    });
    children.push(child);
  };
  let stopping = false;
  const shutdown = (code = 0) => {
    if (stopping) return;
    stopping = true;
    for (const c of children) c.kill('SIGTERM');
    setTimeout(() => {
      cleanUp();
      process.exit(code);
    }, 800);
  };
  onSignal = () => shutdown(0);

  if (mailFake) launch([tsx, 'server/bin/mailFake.ts'], 'mail fake');
  else say(`sending mail through ${process.env.SMTP_HOST}; the local mail fake is not started`);
  launch([tsx, 'server/bin/serve.ts'], 'server');
  if (mode === 'dev') {
    launch([join(ROOT, 'node_modules', '.bin', 'vite')], 'vite dev server');
  }
}

/** A throwaway cluster in a temporary folder on a free port, removed afterwards (or TEST_DATABASE_URL). */
async function withThrowawayDatabase(fn) {
  ensureDebianPackages({ postgres: !process.env.TEST_DATABASE_URL });
  let databaseUrl = process.env.TEST_DATABASE_URL;
  try {
    if (!databaseUrl) {
      const tmp = mkdtempSync(join(tmpdir(), 'porelith-test-'));
      cleanups.push(() => rmSync(tmp, { recursive: true, force: true }));
      const dir = join(tmp, 'pg');
      cleanups.push(() => stopCluster({ dir }));
      databaseUrl = (await startPrivateCluster({ dir, port: await freePort(), throwaway: true })).databaseUrl;
    }
    const env = {
      ...process.env,
      NODE_ENV: 'test',
      DATABASE_URL: databaseUrl,
      JWT_SECRET: 'test-secret-' + 'x'.repeat(40),
      LOG_LEVEL: 'silent',
    };
    await run(tsx, ['server/bin/setupDb.ts', '--demo'], { env, label: 'database' });
    return await fn(env);
  } finally {
    cleanUp();
  }
}

/** Lint, typecheck, build, then every vitest project on a throwaway database; the exit code is vitest's. */
async function runTests() {
  ensureChromium();
  await run('npm', ['run', '--silent', 'lint'], { label: 'lint' });
  await run('npm', ['run', '--silent', 'typecheck'], { label: 'typecheck' });
  process.exitCode = await withThrowawayDatabase(async (env) => {
    await run(join(ROOT, 'node_modules', '.bin', 'vite'), ['build', '--logLevel', 'warn'], { env, label: 'client build' });
    const extra = process.argv.slice(3);
    return run(join(ROOT, 'node_modules', '.bin', 'vitest'), ['run', ...extra], { env, label: 'tests', allowFailure: true });
  });
}

/** Speed figures against reference runs, on a throwaway database for the sections that need one. */
async function runBench() {
  process.exitCode = await withThrowawayDatabase((env) =>
    run(tsx, ['tests/bench/run.ts', ...process.argv.slice(3)], { env, label: 'bench', allowFailure: true }),
  );
}

main().catch((err) => {
  cleanUp();
  fail(err instanceof Error ? err.message : String(err));
});
