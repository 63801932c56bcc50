import { SignJWT, jwtVerify, errors } from 'jose';

export const SESSION_COOKIE = 'porelith_session';

/** What a session token stands for: one sign-in (`sessionId`) of a user at one `sessionVersion`. */
export interface SessionGrant {
  userId: string;
  /** Survives silent renewal, so signing out ends the renewed tokens too. */
  sessionId: string;
  /** Must equal the user's current version; a password reset bumps it. */
  sessionVersion: number;
}

export interface SessionClaims extends SessionGrant {
  issuedAt: number; // seconds since epoch
  expiresAt: number;
}

const encoder = new TextEncoder();

/**
 * Signs a short-lived HS256 session token.
 * @example await signSession({ userId: 'user-uuid', sessionId: 'sid-uuid', sessionVersion: 0 }, secret, 30) // 'eyJhbGciOiJIUzI1NiJ9…'
 */
export async function signSession(grant: SessionGrant, secret: string, minutes: number, now = Date.now()): Promise<string> {
  const iat = Math.floor(now / 1000);
  return new SignJWT({ sv: grant.sessionVersion })
    .setProtectedHeader({ alg: 'HS256' })
    .setSubject(grant.userId)
    .setJti(grant.sessionId)
    .setIssuedAt(iat)
    .setExpirationTime(iat + minutes * 60)
    .setIssuer('porelith')
    .sign(encoder.encode(secret));
}

/**
 * Verifies signature, algorithm, issuer and expiry; returns null for any invalid token (never throws).
 * Tokens without a session id or version (signed before sessions could be ended) are refused too.
 */
export async function verifySession(token: string, secret: string, now = Date.now()): Promise<SessionClaims | null> {
  try {
    const { payload } = await jwtVerify(token, encoder.encode(secret), {
      algorithms: ['HS256'],
      issuer: 'porelith',
      currentDate: new Date(now),
    });
    const { sub, jti, sv, iat, exp } = payload;
    if (typeof sub !== 'string' || typeof jti !== 'string' || !Number.isInteger(sv) || iat === undefined || exp === undefined) return null;
    return { userId: sub, sessionId: jti, sessionVersion: sv as number, issuedAt: iat, expiresAt: exp };
  } catch (err) {
    if (err instanceof errors.JOSEError) return null;
    throw err;
  }
}

/** Renew once half the lifetime has passed, so an active user never meets the expiry. */
export function needsRenewal(claims: SessionClaims, now = Date.now()): boolean {
  const nowS = now / 1000;
  return nowS - claims.issuedAt > (claims.expiresAt - claims.issuedAt) / 2;
}
