import { describe, expect, it } from 'vitest';
import { needsRenewal, signSession, verifySession } from '../../../server/features/auth/sessionToken';

const secret = 'k'.repeat(40);
const t0 = Date.UTC(2026, 0, 1, 12, 0, 0);

describe('session tokens', () => {
  it('round-trips the user id and times', async () => {
    const token = await signSession('user-1', secret, 30, t0);
    const claims = await verifySession(token, secret, t0 + 60_000);
    expect(claims).toEqual({ userId: 'user-1', issuedAt: t0 / 1000, expiresAt: t0 / 1000 + 1800 });
  });

  it('rejects a token after its expiry and one signed with another secret', async () => {
    const token = await signSession('user-1', secret, 30, t0);
    expect(await verifySession(token, secret, t0 + 31 * 60_000)).toBeNull();
    expect(await verifySession(token, 'z'.repeat(40), t0)).toBeNull();
    expect(await verifySession('not.a.token', secret, t0)).toBeNull();
  });

  it('asks for renewal only past half the lifetime', async () => {
    const claims = (await verifySession(await signSession('u', secret, 30, t0), secret, t0))!;
    expect(needsRenewal(claims, t0 + 14 * 60_000)).toBe(false);
    expect(needsRenewal(claims, t0 + 16 * 60_000)).toBe(true);
  });
});
