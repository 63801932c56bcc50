// Process helpers for the bootstrap (plain Node: runs before dependencies exist).
import { spawn, spawnSync } from 'node:child_process';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

export const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..');

export function say(message) {
  process.stdout.write(`[porelith] ${message}\n`);
}

export function fail(message) {
  process.stderr.write(`[porelith] ${message}\n`);
  process.exit(1);
}

/** Runs a command to completion with inherited output; rejects on a non-zero exit unless allowed. */
export function run(cmd, args, { env = process.env, label = cmd, allowFailure = false, cwd = ROOT } = {}) {
  say(`${label}…`);
  return new Promise((resolvePromise, reject) => {
    const child = spawn(cmd, args, { cwd, env, stdio: 'inherit' });
    child.on('error', (err) => reject(new Error(`${label}: could not run ${cmd}: ${err.message}`)));
    child.on('exit', (code, signal) => {
      const status = code ?? (signal ? 1 : 0);
      if (status !== 0 && !allowFailure) reject(new Error(`${label} failed (exit ${signal ?? code}).`));
      else resolvePromise(status);
    });
  });
}

/** Runs a short command synchronously; returns { status, stdout, stderr }. */
export function runSync(cmd, args, opts = {}) {
  const r = spawnSync(cmd, args, { encoding: 'utf8', ...opts });
  return { status: r.status ?? 1, stdout: r.stdout ?? '', stderr: r.stderr ?? '', error: r.error };
}

/** Like runSync but throws with the command's own output when it fails. */
export function mustRun(cmd, args, opts = {}) {
  const r = runSync(cmd, args, opts);
  if (r.status !== 0) {
    throw new Error(`${cmd} ${args.join(' ')} failed:\n${r.stderr || r.stdout || r.error?.message || ''}`.trim());
  }
  return r.stdout;
}

export const isRoot = () => typeof process.getuid === 'function' && process.getuid() === 0;
