import type { CookieOptions, RequestHandler, Response } from 'express';
import type { Db } from '../db/client';
import type { Env } from '../env';
import { loadSession } from '../features/auth/auth.service';
import { SESSION_COOKIE, needsRenewal, signSession, verifySession } from '../features/auth/sessionToken';

export function cookieOptions(env: Env): CookieOptions {
  return {
    httpOnly: true,
    sameSite: 'lax',
    secure: env.APP_URL.startsWith('https://'),
    path: '/',
    maxAge: env.SESSION_MINUTES * 60_000,
  };
}

export async function issueSessionCookie(res: Response, env: Env, userId: string): Promise<void> {
  res.cookie(SESSION_COOKIE, await signSession(userId, env.JWT_SECRET, env.SESSION_MINUTES), cookieOptions(env));
}

export function clearSessionCookie(res: Response, env: Env): void {
  const { maxAge: _unused, ...opts } = cookieOptions(env);
  res.clearCookie(SESSION_COOKIE, opts);
}

/**
 * Reads the session cookie; a valid one puts the user and memberships on `req.session` and is renewed
 * silently past half its life. An invalid or tampered one is cleared and the request goes on anonymous.
 */
export function sessionMiddleware(db: Db, env: Env): RequestHandler {
  return async (req, res, next) => {
    const token: unknown = req.cookies?.[SESSION_COOKIE];
    if (typeof token !== 'string' || token === '') return next();
    try {
      const claims = await verifySession(token, env.JWT_SECRET);
      const session = claims && (await loadSession(db, claims.userId));
      if (!claims || !session) {
        clearSessionCookie(res, env);
        return next();
      }
      req.session = session;
      if (needsRenewal(claims)) await issueSessionCookie(res, env, claims.userId);
      next();
    } catch (err) {
      next(err);
    }
  };
}
