import { Router, type RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { z } from 'zod';
import { acceptTokenBody, resetRequestBody, signInBody, type AuthOptions } from '../../../shared/schemas/auth';
import type { Db } from '../../db/client';
import type { Env } from '../../env';
import { unauthenticated } from '../../lib/httpError';
import { INVITE_DAYS } from '../../lib/linkTokens';
import { parse } from '../../lib/parse';
import { endRequestSession, issueSessionCookie } from '../../middleware/session';
import { isLocalMailFake, type Mailer } from '../mail/mailer';
import {
  acceptInvitation,
  inspectInvitation,
  inspectResetToken,
  loadSession,
  requestPasswordReset,
  resetPassword,
  RESET_MINUTES,
  signIn,
  startSession,
} from './auth.service';

// Any length up to the cap: a short made-up token is simply not found (404), like any other.
const tokenParams = z.object({ token: z.string().min(1).max(200, 'is not a valid link token') });

interface LimitOptions {
  /** What the message calls the attempts. */
  what: string;
  /** Count per address and e-mail (so one office behind one address does not lock itself out), or per address. */
  perAccount: boolean;
  /** Attempts allowed in the window, as a multiple of SIGNIN_RATE_MAX. */
  factor?: number;
  /** Successful attempts do not count (sign-in): only failures are guessing. */
  skipSuccessful?: boolean;
}

function limiter(env: Env, o: LimitOptions): RequestHandler {
  return rateLimit({
    windowMs: env.SIGNIN_RATE_WINDOW_MIN * 60_000,
    limit: env.SIGNIN_RATE_MAX * (o.factor ?? 1),
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    skipSuccessfulRequests: o.skipSuccessful ?? false,
    keyGenerator: (req) => {
      const address = ipKeyGenerator(req.ip ?? 'unknown');
      if (!o.perAccount) return address;
      const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : '';
      return `${address}|${email}`;
    },
    handler: (req, res, _next, options) => {
      const resetAt = (req as typeof req & { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
      const msLeft = resetAt ? resetAt.getTime() - Date.now() : options.windowMs;
      const minutes = Math.max(1, Math.ceil(msLeft / 60_000));
      const whose = o.perAccount ? 'for this account from this address' : 'from this address';
      res.status(429).json({
        error: {
          code: 'rate_limited',
          message: `Too many ${o.what} attempts ${whose}; try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`,
        },
      });
    },
  });
}

export function authRouter(db: Db, env: Env, mailer: Mailer): Router {
  const r = Router();
  // Failed sign-ins per account and address, plus a looser cap per address against trying many accounts.
  const signInLimit = limiter(env, { what: 'failed sign-in', perAccount: true, skipSuccessful: true });
  const signInSpray = limiter(env, { what: 'failed sign-in', perAccount: false, skipSuccessful: true, factor: 5 });
  const linkLimit = limiter(env, { what: 'password-reset', perAccount: false });
  // Opening a link is looser than using one: the page checks it once on load, and tokens are 256-bit random.
  const linkCheckLimit = limiter(env, { what: 'link check', perAccount: false, factor: 5 });
  const options: AuthOptions = { mailFake: isLocalMailFake(env), resetLinkMinutes: RESET_MINUTES, invitationDays: INVITE_DAYS };

  r.get('/options', (_req, res) => {
    res.json(options);
  });
  r.get('/invitations/:token', linkCheckLimit, async (req, res) => {
    res.json(await inspectInvitation(db, parse(tokenParams, req.params).token));
  });
  r.get('/resets/:token', linkCheckLimit, async (req, res) => {
    res.json(await inspectResetToken(db, parse(tokenParams, req.params).token));
  });

  r.post('/sign-in', signInSpray, signInLimit, async (req, res) => {
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
