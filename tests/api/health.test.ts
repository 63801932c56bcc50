import supertest from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { createDb } from '../../server/db/client';
import { startTestApp, type TestContext } from './support/testApp';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await startTestApp();
});
afterAll(() => ctx.close());

describe('GET /api/health', () => {
  it('reports the database up and the PostGIS version it runs', async () => {
    const res = await supertest(ctx.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body.ok).toBe(true);
    expect(res.body.db).toBe('up');
    expect(res.body.postgis).toMatch(/^3\.\d+/);
  });

  it('answers 503 with ok:false when the database cannot be reached', async () => {
    // A port nothing listens on: the pool fails to connect.
    const deadDb = createDb('postgres://postgres:x@127.0.0.1:1/none', 1);
    const app = createApp({ db: deadDb, env: ctx.env, mailer: ctx.mailer, serveClient: false });
    const res = await supertest(app).get('/api/health');
    expect(res.status).toBe(503);
    expect(res.body).toMatchObject({ ok: false, db: 'down' });
    await deadDb.$client.end();
  });
});

describe('request hygiene', () => {
  it('rejects malformed JSON with a clear 400', async () => {
    const res = await supertest(ctx.app).post('/api/auth/sign-in').set('content-type', 'application/json').send('{"email":');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_json');
  });

  it('rejects an oversized body with 413', async () => {
    const res = await supertest(ctx.app)
      .post('/api/auth/sign-in')
      .send({ email: 'a@b.example', password: 'x'.repeat(1_100_000) });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('payload_too_large');
  });

  it('answers unknown API routes with a JSON 404', async () => {
    const res = await supertest(ctx.app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error.message).toContain('GET /api/no-such-thing');
  });

  it('sends a content security policy that only allows our own origin', async () => {
    const res = await supertest(ctx.app).get('/api/health');
    const csp = res.headers['content-security-policy'];
    expect(csp).toContain("default-src 'self'");
    expect(csp).not.toMatch(/https?:/);
  });
});
