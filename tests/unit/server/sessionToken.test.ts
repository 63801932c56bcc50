import { SignJWT } from 'jose';
import { describe, expect, it } from 'vitest';
import { needsRenewal, signSession, verifySession } from '../../../server/features/auth/sessionToken';

const secret = 'k'.repeat(40);
const t0 = Date.UTC(2026, 0, 1, 12, 0, 0);
const grant = { userId: 'user-1', sessionId: '6f1c2d3e-0000-4000-8000-000000000001', sessionVersion: 3 };

describe('session tokens', () => {
  it('round-trips the user, session id, version and times', async () => {
    const token = await signSession(grant, secret, 30, t0);
    const claims = await verifySession(token, secret, t0 + 60_000);
    expect(claims).toEqual({ ...grant, issuedAt: t0 / 1000, expiresAt: t0 / 1000 + 1800 });
  });

  it('rejects a token after its expiry and one signed with another secret', async () => {
    const token = await signSession(grant, secret, 30, t0);
    expect(await verifySession(token, secret, t0 + 31 * 60_000)).toBeNull();
    expect(await verifySession(token, 'z'.repeat(40), t0)).toBeNull();
    expect(await verifySession('not.a.token', secret, t0)).toBeNull();
  });

  it('rejects a correctly signed token that names no session id or version (it could never be ended)', async () => {
    const iat = t0 / 1000;
    const bare = new SignJWT({})
      .setProtectedHeader({ alg: 'HS256' })
      .setSubject('user-1')
      .setIssuer('porelith')
      .setIssuedAt(iat)
      .setExpirationTime(iat + 600);
    expect(await verifySession(await bare.sign(new TextEncoder().encode(secret)), secret, t0)).toBeNull();
    const noVersion = new SignJWT({})
      .setProtectedHeader({ alg: 'HS256' })
      .setSubject('user-1')
      .setJti(grant.sessionId)
      .setIssuer('porelith')
      .setIssuedAt(iat)
      .setExpirationTime(iat + 600);
    expect(await verifySession(await noVersion.sign(new TextEncoder().encode(secret)), secret, t0)).toBeNull();
  });

  it('asks for renewal only past half the lifetime', async () => {
    const claims = (await verifySession(await signSession(grant, secret, 30, t0), secret, t0))!;
    expect(needsRenewal(claims, t0 + 14 * 60_000)).toBe(false);
    expect(needsRenewal(claims, t0 + 16 * 60_000)).toBe(true);
  });
});
