/** The PostgreSQL SQLSTATE of an error, looking through drizzle's wrapper (it keeps the driver error as `cause`). */
export function pgErrorCode(err: unknown): string | undefined {
  let e = err as { code?: unknown; cause?: unknown } | undefined;
  for (let depth = 0; e && depth < 4; depth++) {
    if (typeof e.code === 'string' && /^[0-9A-Z]{5}$/.test(e.code)) return e.code;
    e = e.cause as typeof e;
  }
  return undefined;
}

export const UNIQUE_VIOLATION = '23505';
