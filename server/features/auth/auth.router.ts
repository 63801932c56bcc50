import { Router, type RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import { acceptTokenBody, resetRequestBody, signInBody } from '../../../shared/schemas/auth';
import type { Db } from '../../db/client';
import type { Env } from '../../env';
import { unauthenticated } from '../../lib/httpError';
import { parse } from '../../lib/parse';
import { endRequestSession, issueSessionCookie } from '../../middleware/session';
import type { Mailer } from '../mail/mailer';
import { acceptInvitation, loadSession, requestPasswordReset, resetPassword, signIn, startSession } from './auth.service';

function limiter(env: Env, what: string): RequestHandler {
  return rateLimit({
    windowMs: env.SIGNIN_RATE_WINDOW_MIN * 60_000,
    limit: env.SIGNIN_RATE_MAX,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, res, _next, options) => {
      const minutes = Math.ceil(options.windowMs / 60_000);
      res.status(429).json({
        error: { code: 'rate_limited', message: `Too many ${what} attempts from this address; try again in ${minutes} minutes.` },
      });
    },
  });
}

export function authRouter(db: Db, env: Env, mailer: Mailer): Router {
  const r = Router();
  const signInLimit = limiter(env, 'sign-in');
  const linkLimit = limiter(env, 'password-reset');

  r.post('/sign-in', signInLimit, async (req, res) => {
    const { email, password } = parse(signInBody, req.body);
    const session = await signIn(db, email, password);
    await issueSessionCookie(res, env, await startSession(db, session.user.id));
    res.json(session);
  });
  r.post('/sign-out', async (req, res) => {
    await endRequestSession(req, res, db, env);
    res.status(204).end();
  });
  r.get('/me', (req, res) => {
    if (!req.session) throw unauthenticated('You are not signed in, or your session has expired.');
    res.json(req.session);
  });
  r.post('/reset-request', linkLimit, async (req, res) => {
    const { email } = parse(resetRequestBody, req.body);
    await requestPasswordReset(db, mailer, env.APP_URL, email);
    res.status(202).json({ ok: true });
  });
  r.post('/reset', linkLimit, async (req, res) => {
    const { token, password } = parse(acceptTokenBody, req.body);
    const userId = await resetPassword(db, token, password);
    await issueSessionCookie(res, env, await startSession(db, userId));
    res.json(await loadSession(db, userId));
  });
  r.post('/accept-invite', linkLimit, async (req, res) => {
    const { token, password } = parse(acceptTokenBody, req.body);
    const userId = await acceptInvitation(db, token, password);
    await issueSessionCookie(res, env, await startSession(db, userId));
    res.json(await loadSession(db, userId));
  });
  return r;
}
