import supertest from 'supertest';
import { SignJWT, decodeJwt } from 'jose';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/db/seed/demoAccounts';
import { SESSION_COOKIE } from '../../server/features/auth/sessionToken';
import { freshTeamAgent, linkToken, signedInAgent, startTestApp, waitForMail, type TestContext } from './support/testApp';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await startTestApp();
});
afterAll(() => ctx.close());

function sessionCookie(res: supertest.Response): string | undefined {
  const raw = res.headers['set-cookie'] as unknown as string[] | undefined;
  return raw?.find((c) => c.startsWith(`${SESSION_COOKIE}=`));
}

/** The `name=value` part of the session cookie a response set, as a browser would send it back. */
function cookiePair(res: supertest.Response): string {
  const c = sessionCookie(res);
  if (!c) throw new Error(`no session cookie in the reply (${res.status})`);
  return c.split(';')[0];
}

const me = (cookie: string) => supertest(ctx.app).get('/api/auth/me').set('Cookie', cookie);

describe('sign-in', () => {
  it('signs the planner in with an httpOnly, SameSite=Lax cookie and returns memberships', async () => {
    const res = await supertest(ctx.app).post('/api/auth/sign-in').send({ email: 'Planner@Porelith.example', password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user.email).toBe('planner@porelith.example');
    expect(res.body.memberships).toEqual([{ teamId: ctx.demoTeamId, teamName: 'Synthetic demo', role: 'planner' }]);
    const cookie = sessionCookie(res)!;
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(JSON.stringify(res.body)).not.toMatch(/password|hash/i);
  });

  it('refuses a wrong password and an unknown user with the same 401', async () => {
    const wrong = await supertest(ctx.app)
      .post('/api/auth/sign-in')
      .send({ email: 'planner@porelith.example', password: 'nope-nope-nope' });
    const unknown = await supertest(ctx.app)
      .post('/api/auth/sign-in')
      .send({ email: 'nobody@porelith.example', password: 'nope-nope-nope' });
    for (const res of [wrong, unknown]) {
      expect(res.status).toBe(401);
      expect(res.body.error).toEqual({ code: 'invalid_credentials', message: 'The e-mail or password is not right.' });
      expect(sessionCookie(res)).toBeUndefined();
    }
  });

  it('names the bad field when the body is invalid', async () => {
    const res = await supertest(ctx.app).post('/api/auth/sign-in').send({ email: 'not-an-email', password: '' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.details).toEqual(
      expect.arrayContaining([
        { path: 'email', message: 'must be a valid e-mail address' },
        { path: 'password', message: 'is required' },
      ]),
    );
  });

  it('rate-limits repeated failed sign-ins to one account with a clear 429, not successful ones or other accounts', async () => {
    const limited = await startTestApp({ SIGNIN_RATE_MAX: '3' });
    try {
      const post = (email: string, password: string) => supertest(limited.app).post('/api/auth/sign-in').send({ email, password });
      // Successful sign-ins never count: a team behind one address signs in all day.
      for (let i = 0; i < 5; i++) expect((await post('planner@porelith.example', 'porelith-demo')).status).toBe(200);
      const codes: number[] = [];
      for (let i = 0; i < 5; i++) {
        const res = await post('viewer@porelith.example', 'wrong-password');
        codes.push(res.status);
        if (res.status === 429)
          expect(res.body.error.message).toMatch(
            /^Too many failed sign-in attempts for this account from this address; try again in (15 minutes|14 minutes)\.$/,
          );
      }
      expect(codes).toEqual([401, 401, 401, 429, 429]);
      // The limit is per account: a colleague at the same address still signs in.
      expect((await post('geoscientist@porelith.example', 'porelith-demo')).status).toBe(200);
      // Trying many accounts from one address meets the looser per-address cap (5 × 3 failures).
      const spray: number[] = [];
      for (let i = 0; i < 14; i++) spray.push((await post(`nobody-${i}@example.org`, 'guess')).status);
      expect(spray.slice(0, 10).every((c) => c === 401)).toBe(true);
      expect(spray.slice(-2)).toEqual([429, 429]);
    } finally {
      await limited.close();
    }
  });
});

describe('session', () => {
  it('me returns the session; sign-out clears it', async () => {
    const agent = await signedInAgent(ctx, 'geoscientist@porelith.example');
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.memberships[0].role).toBe('geoscientist');
    const out = await agent.post('/api/auth/sign-out');
    expect(out.status).toBe(204);
    expect(sessionCookie(out)).toMatch(/Expires=Thu, 01 Jan 1970/);
    const after = await agent.get('/api/auth/me');
    expect(after.status).toBe(401);
    expect(after.body.error.code).toBe('unauthenticated');
  });

  it('rejects a tampered cookie and one signed with another secret', async () => {
    const signIn = await supertest(ctx.app).post('/api/auth/sign-in').send({ email: 'viewer@porelith.example', password: DEMO_PASSWORD });
    const token = sessionCookie(signIn)!.split(';')[0].split('=')[1];
    const [h, p, s] = token.split('.');
    const flipped = s.slice(0, -2) + (s.at(-2) === 'A' ? 'B' : 'A') + s.at(-1);
    const forged = await new SignJWT({})
      .setProtectedHeader({ alg: 'HS256' })
      .setSubject(signIn.body.user.id)
      .setIssuer('porelith')
      .setIssuedAt()
      .setExpirationTime('10m')
      .sign(new TextEncoder().encode('another-secret-that-is-long-enough-000'));
    const unsigned = `${Buffer.from('{"alg":"none"}').toString('base64url')}.${p}.`;
    for (const bad of [`${h}.${p}.${flipped}`, forged, unsigned]) {
      const res = await supertest(ctx.app).get('/api/auth/me').set('Cookie', `${SESSION_COOKIE}=${bad}`);
      expect(res.status).toBe(401);
    }
  });

  it('rejects an expired token', async () => {
    const signIn = await supertest(ctx.app).post('/api/auth/sign-in').send({ email: 'viewer@porelith.example', password: DEMO_PASSWORD });
    const expired = await new SignJWT({})
      .setProtectedHeader({ alg: 'HS256' })
      .setSubject(signIn.body.user.id)
      .setIssuer('porelith')
      .setIssuedAt(Math.floor(Date.now() / 1000) - 3600)
      .setExpirationTime(Math.floor(Date.now() / 1000) - 60)
      .sign(new TextEncoder().encode(ctx.env.JWT_SECRET));
    const res = await supertest(ctx.app).get('/api/auth/me').set('Cookie', `${SESSION_COOKIE}=${expired}`);
    expect(res.status).toBe(401);
  });

  it('renews a session past half its life without the user noticing', async () => {
    const signIn = await supertest(ctx.app).post('/api/auth/sign-in').send({ email: 'viewer@porelith.example', password: DEMO_PASSWORD });
    const now = Math.floor(Date.now() / 1000);
    const { jti, sv } = decodeJwt(cookiePair(signIn).split('=')[1]);
    const old = await new SignJWT({ sv })
      .setProtectedHeader({ alg: 'HS256' })
      .setSubject(signIn.body.user.id)
      .setJti(jti!)
      .setIssuer('porelith')
      .setIssuedAt(now - 20 * 60)
      .setExpirationTime(now + 10 * 60)
      .sign(new TextEncoder().encode(ctx.env.JWT_SECRET));
    const res = await supertest(ctx.app).get('/api/auth/me').set('Cookie', `${SESSION_COOKIE}=${old}`);
    expect(res.status).toBe(200);
    const renewed = sessionCookie(res);
    expect(renewed).toBeDefined();
    expect(renewed).not.toContain(old);
  });
});

describe('ending sessions on the server', () => {
  it('refuses a cookie captured before sign-out, and its silently renewed successor, after it', async () => {
    const first = await supertest(ctx.app).post('/api/auth/sign-in').send({ email: 'viewer@porelith.example', password: DEMO_PASSWORD });
    const captured = cookiePair(first);
    const other = cookiePair(
      await supertest(ctx.app).post('/api/auth/sign-in').send({ email: 'viewer@porelith.example', password: DEMO_PASSWORD }),
    );
    // A renewed token of the same session, as the browser would hold it past half the lifetime.
    const { jti, sv } = decodeJwt(captured.split('=')[1]);
    const now = Math.floor(Date.now() / 1000);
    const renewed = await new SignJWT({ sv })
      .setProtectedHeader({ alg: 'HS256' })
      .setSubject(first.body.user.id)
      .setJti(jti!)
      .setIssuer('porelith')
      .setIssuedAt(now)
      .setExpirationTime(now + 30 * 60)
      .sign(new TextEncoder().encode(ctx.env.JWT_SECRET));
    expect((await me(captured)).status).toBe(200);

    const out = await supertest(ctx.app).post('/api/auth/sign-out').set('Cookie', captured);
    expect(out.status).toBe(204);

    const replay = await me(captured);
    expect(replay.status).toBe(401);
    expect(replay.body.error.code).toBe('unauthenticated');
    expect(sessionCookie(replay)).toMatch(/Expires=Thu, 01 Jan 1970/);
    expect((await me(`${SESSION_COOKIE}=${renewed}`)).status).toBe(401);
    // Only that session ended: the same user's session elsewhere goes on.
    expect((await me(other)).status).toBe(200);
  });

  it('a password reset ends every earlier session of that user; the session it starts works', async () => {
    const user = await freshTeamAgent(ctx, 'Reset sessions team', 'viewer');
    const before = cookiePair(await supertest(ctx.app).post('/api/auth/sign-in').send({ email: user.email, password: user.password }));
    expect((await me(before)).status).toBe(200);

    const since = new Date(Date.now() - 1000);
    await supertest(ctx.app).post('/api/auth/reset-request').send({ email: user.email });
    const mail = await waitForMail(ctx.db, user.email, since);
    const reset = await supertest(ctx.app)
      .post('/api/auth/reset')
      .send({ token: linkToken(mail.textBody, '/reset-password'), password: 'after-reset-password' });
    expect(reset.status).toBe(200);

    expect((await me(before)).status).toBe(401);
    expect((await user.agent.get('/api/auth/me')).status).toBe(401);
    expect((await user.agent.get(`/api/teams/${user.teamId}/members`)).status).toBe(401);
    const fresh = await me(cookiePair(reset));
    expect(fresh.status).toBe(200);
    expect(fresh.body.user.email).toBe(user.email);
  });
});
