import { describe, expect, it } from 'vitest';
import { parseEnv } from '../../../server/env';

const base = { DATABASE_URL: 'postgres://postgres@127.0.0.1:54329/porelith', JWT_SECRET: 's'.repeat(32) };

describe('environment parsing', () => {
  it('applies the documented defaults', () => {
    const env = parseEnv(base);
    expect(env.PORT).toBe(8080);
    expect(env.HOST).toBe('127.0.0.1');
    expect(env.APP_URL).toBe('http://127.0.0.1:8080');
    expect(env.SMTP_SECURE).toBe(false);
    expect(env.SESSION_MINUTES).toBe(30);
  });

  it('names every invalid field in one message', () => {
    expect(() => parseEnv({ PORT: 'eighty', JWT_SECRET: 'short' })).toThrow(
      /Invalid environment:\n {2}PORT: .*\n {2}DATABASE_URL: .*\n {2}JWT_SECRET: must be at least 32 characters/,
    );
  });

  it('coerces numbers and booleans from strings', () => {
    const env = parseEnv({ ...base, PORT: '9090', SMTP_SECURE: 'true', SMTP_PORT: '465' });
    expect(env).toMatchObject({ PORT: 9090, SMTP_SECURE: true, SMTP_PORT: 465, APP_URL: 'http://127.0.0.1:9090' });
  });

  it('seeds the demo by default, but not in production unless PORELITH_DEMO=1 asks for it', () => {
    expect(parseEnv(base).PORELITH_DEMO).toBe(true);
    expect(parseEnv({ ...base, NODE_ENV: 'test' }).PORELITH_DEMO).toBe(true);
    expect(parseEnv({ ...base, NODE_ENV: 'production' }).PORELITH_DEMO).toBe(false);
    expect(parseEnv({ ...base, NODE_ENV: 'production', PORELITH_DEMO: '1' }).PORELITH_DEMO).toBe(true);
    expect(parseEnv({ ...base, PORELITH_DEMO: '0' }).PORELITH_DEMO).toBe(false);
    expect(() => parseEnv({ ...base, PORELITH_DEMO: 'yes' })).toThrow(/PORELITH_DEMO: must be 0 or 1/);
  });
});
