import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';

/** A random secret generated once and kept (mode 600) so sessions survive restarts. */
export function readOrCreateSecret(path, bytes = 48) {
  if (existsSync(path)) return readFileSync(path, 'utf8').trim();
  mkdirSync(dirname(path), { recursive: true });
  const secret = randomBytes(bytes).toString('hex');
  writeFileSync(path, secret + '\n', { mode: 0o600 });
  return secret;
}
