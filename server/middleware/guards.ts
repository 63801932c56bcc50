import type { RequestHandler } from 'express';
import { z } from 'zod';
import { can, type Action } from '../../shared/auth/permissions';
import { forbidden, unauthenticated } from '../lib/httpError';

export const requireSession: RequestHandler = (req, _res, next) => {
  next(req.session ? undefined : unauthenticated());
};

const teamIdSchema = z.string().uuid();

/**
 * Team-scoped guard: the user must be a member of `:teamId` with a role granting `action`.
 * A non-member, an unknown team and a missing grant all get the same 403, so nothing is revealed.
 */
export function requireTeam(action: Action): RequestHandler {
  return (req, _res, next) => {
    if (!req.session) return next(unauthenticated());
    const teamId = req.params.teamId;
    if (typeof teamId !== 'string' || !teamIdSchema.safeParse(teamId).success) return next(forbidden());
    next(can(req.session.memberships, action, teamId) ? undefined : forbidden());
  };
}

/** The `:teamId` of a request that passed `requireTeam` (already validated there). */
export function teamIdOf(req: { params: Record<string, string | string[] | undefined> }): string {
  return String(req.params.teamId);
}
