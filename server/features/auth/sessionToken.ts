import { SignJWT, jwtVerify, errors } from 'jose';

export const SESSION_COOKIE = 'porelith_session';

export interface SessionClaims {
  userId: string;
  issuedAt: number; // seconds since epoch
  expiresAt: number;
}

const encoder = new TextEncoder();

/**
 * Signs a short-lived HS256 session token.
 * @example await signSession('user-uuid', secret, 30) // 'eyJhbGciOiJIUzI1NiJ9…'
 */
export async function signSession(userId: string, secret: string, minutes: number, now = Date.now()): Promise<string> {
  const iat = Math.floor(now / 1000);
  return new SignJWT({})
    .setProtectedHeader({ alg: 'HS256' })
    .setSubject(userId)
    .setIssuedAt(iat)
    .setExpirationTime(iat + minutes * 60)
    .setIssuer('porelith')
    .sign(encoder.encode(secret));
}

/** Verifies signature, algorithm, issuer and expiry; returns null for any invalid token (never throws). */
export async function verifySession(token: string, secret: string, now = Date.now()): Promise<SessionClaims | null> {
  try {
    const { payload } = await jwtVerify(token, encoder.encode(secret), {
      algorithms: ['HS256'],
      issuer: 'porelith',
      currentDate: new Date(now),
    });
    if (typeof payload.sub !== 'string' || payload.iat === undefined || payload.exp === undefined) return null;
    return { userId: payload.sub, issuedAt: payload.iat, expiresAt: payload.exp };
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
