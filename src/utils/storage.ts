/** Keys this app keeps in localStorage, in one place so they never collide. */
export const STORAGE_KEYS = {
  theme: 'porelith.theme',
  teamId: 'porelith.teamId',
} as const;

/**
 * Reads a remembered value; storage can be missing or blocked (private windows, tests), so failures read as null.
 * @example readStored(STORAGE_KEYS.theme) // 'dark' | null
 */
export function readStored(key: string): string | null {
  try {
    return globalThis.localStorage?.getItem(key) ?? null;
  } catch {
    return null;
  }
}

/**
 * Remembers a value (null forgets it); a blocked storage only costs the memory, never the action.
 * @example writeStored(STORAGE_KEYS.teamId, teamId)
 */
export function writeStored(key: string, value: string | null): void {
  try {
    if (value === null) globalThis.localStorage?.removeItem(key);
    else globalThis.localStorage?.setItem(key, value);
  } catch {
    // Remembering is a convenience; the app works without it.
  }
}
