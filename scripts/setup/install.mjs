// Installs what the project needs and the machine lacks: npm packages, PostgreSQL + PostGIS, Chromium.
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { ROOT, say, mustRun, runSync, isRoot } from './proc.mjs';

export const PG_BIN = '/usr/lib/postgresql/15/bin';
const POSTGIS_CONTROL = '/usr/share/postgresql/15/extension/postgis.control';
export const CHROMIUM = '/usr/bin/chromium';

/** `npm ci` when node_modules is missing or older than the lock file (compared by hash). */
export function ensureNodeModules() {
  const lock = join(ROOT, 'package-lock.json');
  const marker = join(ROOT, 'node_modules', '.porelith-lock-sha256');
  const hash = createHash('sha256').update(readFileSync(lock)).digest('hex');
  if (existsSync(marker) && readFileSync(marker, 'utf8') === hash) return;
  say('installing npm dependencies (npm ci)…');
  mustRun('npm', ['ci', '--no-audit', '--no-fund'], { cwd: ROOT, stdio: 'inherit' });
  writeFileSync(marker, hash);
}

let aptUpdated = false;
function aptInstall(packages, why) {
  if (!isRoot()) {
    throw new Error(
      `${why} is missing and this is not root, so it cannot be installed here.\n` +
        `Install it with: sudo apt-get install -y ${packages.join(' ')}\n` +
        `or point Porelith at an existing PostgreSQL 15+ with PostGIS through DATABASE_URL.`,
    );
  }
  if (runSync('sh', ['-c', 'command -v apt-get']).status !== 0) {
    throw new Error(`${why} is missing and apt-get is not available. Install ${packages.join(', ')} by hand.`);
  }
  say(`installing ${packages.join(', ')} from Debian (${why})…`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  if (!aptUpdated) {
    mustRun('apt-get', ['update', '-q'], { env, stdio: 'inherit' });
    aptUpdated = true;
  }
  mustRun('apt-get', ['install', '-y', '-q', '--no-install-recommends', ...packages], { env, stdio: 'inherit' });
}

/** PostgreSQL 15 server binaries and the PostGIS 3 extension from Debian. */
export function ensureDebianPackages({ postgres }) {
  if (!postgres) return;
  const missing = [];
  if (!existsSync(join(PG_BIN, 'initdb'))) missing.push('postgresql-15');
  if (!existsSync(POSTGIS_CONTROL)) missing.push('postgresql-15-postgis-3');
  if (missing.length) aptInstall(missing, 'PostgreSQL 15 with PostGIS');
}

/** Debian's Chromium for the browser tests (never a browser download of a test tool). */
export function ensureChromium() {
  if (!existsSync(CHROMIUM)) aptInstall(['chromium'], 'Chromium for the browser tests');
}
