import type { CookieOptions, Request, RequestHandler, Response } from 'express';
import type { Db } from '../db/client';
import type { Env } from '../env';
import { endSession, loadActiveSession } from '../features/auth/auth.service';
import { SESSION_COOKIE, needsRenewal, signSession, verifySession, type SessionGrant } from '../features/auth/sessionToken';

export function cookieOptions(env: Env): CookieOptions {
  return {
    httpOnly: true,
    sameSite: 'lax',
    secure: env.APP_URL.startsWith('https://'),
    path: '/',
    maxAge: env.SESSION_MINUTES * 60_000,
  };
}

export async function issueSessionCookie(res: Response, env: Env, grant: SessionGrant): Promise<void> {
  res.cookie(SESSION_COOKIE, await signSession(grant, env.JWT_SECRET, env.SESSION_MINUTES), cookieOptions(env));
}

export function clearSessionCookie(res: Response, env: Env): void {
  const { maxAge: _unused, ...opts } = cookieOptions(env);
  res.clearCookie(SESSION_COOKIE, opts);
}

/** Sign-out: ends the session the cookie names on the server (a copied cookie dies too), then clears it. */
export async function endRequestSession(req: Request, res: Response, db: Db, env: Env): Promise<void> {
  const token: unknown = req.cookies?.[SESSION_COOKIE];
  const claims = typeof token === 'string' && token !== '' ? await verifySession(token, env.JWT_SECRET) : null;
  if (claims) await endSession(db, claims, env.SESSION_MINUTES);
  clearSessionCookie(res, env);
}

/**
 * Reads the session cookie; a valid one puts the user and memberships on `req.session` and is renewed
 * silently past half its life (same session id and version). An invalid, tampered or ended one (signed out,
 * or older than the last password reset) is cleared and the request goes on anonymous.
 */
export function sessionMiddleware(db: Db, env: Env): RequestHandler {
  return async (req, res, next) => {
    const token: unknown = req.cookies?.[SESSION_COOKIE];
    if (typeof token !== 'string' || token === '') return next();
    try {
      const claims = await verifySession(token, env.JWT_SECRET);
      const session = claims && (await loadActiveSession(db, claims));
      if (!claims || !session) {
        clearSessionCookie(res, env);
        return next();
      }
      req.session = session;
      if (needsRenewal(claims)) await issueSessionCookie(res, env, claims);
      next();
    } catch (err) {
      next(err);
    }
  };
}
