import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../../fixtures/', import.meta.url));

/** A fixture file's bytes, as an upload would deliver them. */
export function fixtureBytes(kind: 'las' | 'csv', name: string): Uint8Array {
  return new Uint8Array(readFileSync(`${root}${kind}/${name}`));
}

/** A UTF-8 fixture file as text. */
export function fixtureText(kind: 'las' | 'csv', name: string): string {
  return readFileSync(`${root}${kind}/${name}`, 'utf8');
}
