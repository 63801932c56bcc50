#!/usr/bin/env node
// Plain Node on purpose: this runs before `npm ci`, so it may use nothing but Node's own modules.
// `npm start` → start, `npm run dev` → dev, `npm test` → test, `npm run seed:demo` → seed.
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { ensureNodeModules, ensureDebianPackages, ensureChromium } from './setup/install.mjs';
import { startPrivateCluster, stopCluster, freePort } from './setup/cluster.mjs';
import { readOrCreateSecret } from './setup/secrets.mjs';
import { run, say, fail, ROOT } from './setup/proc.mjs';

const mode = process.argv[2] ?? 'start';
if (!['start', 'dev', 'test', 'seed', 'bench'].includes(mode)) fail(`Unknown mode "${mode}" (start, dev, test, seed, bench).`);

const tsx = join(ROOT, 'node_modules', '.bin', 'tsx');

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
  let cluster = null;
  let databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl) {
    ensureDebianPackages({ postgres: true });
    cluster = await startPrivateCluster({ dir: join(dataDir, 'pg'), port: pgPort, throwaway: false });
    databaseUrl = cluster.databaseUrl;
  }
  const env = {
    ...process.env,
    DATABASE_URL: databaseUrl,
    JWT_SECRET: process.env.JWT_SECRET ?? readOrCreateSecret(join(dataDir, 'jwt-secret')),
    SMTP_PORT: process.env.SMTP_PORT ?? String(Number(process.env.PORELITH_SMTP_PORT ?? pgPort + 1)),
    NODE_ENV: process.env.NODE_ENV ?? (mode === 'dev' ? 'development' : 'production'),
  };
  const setupArgs = mode === 'seed' ? ['--demo', '--regenerate'] : ['--demo'];
  await run(tsx, ['server/db/setup.ts', ...setupArgs], { env, label: 'database' });
  if (mode === 'seed') {
    if (cluster) stopCluster(cluster);
    return;
  }
  if (mode === 'start') await run(join(ROOT, 'node_modules', '.bin', 'vite'), ['build', '--logLevel', 'warn'], { env, label: 'client build' });

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
      if (cluster) stopCluster(cluster);
      process.exit(code);
    }, 800);
  };
  process.on('SIGINT', () => shutdown(0));
  process.on('SIGTERM', () => shutdown(0));

  launch([tsx, 'server/mail-fake.ts'], 'mail fake');
  launch([tsx, 'server/index.ts'], 'server');
  if (mode === 'dev') {
    launch([join(ROOT, 'node_modules', '.bin', 'vite')], 'vite dev server');
  }
}

/** A throwaway cluster in a temporary folder on a free port, removed afterwards (or TEST_DATABASE_URL). */
async function withThrowawayDatabase(fn) {
  ensureDebianPackages({ postgres: !process.env.TEST_DATABASE_URL });
  let cluster = null;
  let tmp = null;
  let databaseUrl = process.env.TEST_DATABASE_URL;
  try {
    if (!databaseUrl) {
      tmp = mkdtempSync(join(tmpdir(), 'porelith-test-'));
      cluster = await startPrivateCluster({ dir: join(tmp, 'pg'), port: await freePort(), throwaway: true });
      databaseUrl = cluster.databaseUrl;
    }
    const env = {
      ...process.env,
      NODE_ENV: 'test',
      DATABASE_URL: databaseUrl,
      JWT_SECRET: 'test-secret-' + 'x'.repeat(40),
      LOG_LEVEL: 'silent',
    };
    await run(tsx, ['server/db/setup.ts', '--demo'], { env, label: 'database' });
    return await fn(env);
  } finally {
    if (cluster) stopCluster(cluster);
    if (tmp) rmSync(tmp, { recursive: true, force: true });
  }
}

/** Typecheck, build, then every vitest project on a throwaway database; the exit code is vitest's. */
async function runTests() {
  ensureChromium();
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

main().catch((err) => fail(err instanceof Error ? err.message : String(err)));
