import { Router } from 'express';
import { z } from 'zod';
import { changeRoleBody, inviteBody } from '../../../shared/schemas/auth';
import type { Db } from '../../db/client';
import type { Env } from '../../env';
import { parse } from '../../lib/parse';
import { requireTeam, teamIdOf } from '../../middleware/guards';
import type { Mailer } from '../mail/mailer';
import { listTeamOutbox } from '../mail/outbox.service';
import {
  changeRole,
  inviteMember,
  listMembers,
  listPendingInvitations,
  removeMember,
  resendInvitation,
  revokeInvitation,
} from './teams.service';

const invitationParams = z.object({ teamId: z.string().uuid(), invitationId: z.string().uuid('must be an invitation id') });
const memberParams = z.object({ teamId: z.string().uuid(), userId: z.string().uuid('must be a user id') });

export function teamsRouter(db: Db, env: Env, mailer: Mailer): Router {
  const r = Router({ mergeParams: true });
  r.get('/:teamId/members', requireTeam('team.read'), async (req, res) => {
    res.json(await listMembers(db, teamIdOf(req)));
  });
  r.post('/:teamId/invitations', requireTeam('members.manage'), async (req, res) => {
    const body = parse(inviteBody, req.body);
    res.status(201).json(await inviteMember(db, mailer, env.APP_URL, teamIdOf(req), req.session!.user.id, body));
  });
  r.get('/:teamId/invitations', requireTeam('members.manage'), async (req, res) => {
    res.json(await listPendingInvitations(db, teamIdOf(req)));
  });
  r.delete('/:teamId/invitations/:invitationId', requireTeam('members.manage'), async (req, res) => {
    const { teamId, invitationId } = parse(invitationParams, req.params);
    await revokeInvitation(db, teamId, invitationId);
    res.status(204).end();
  });
  r.post('/:teamId/invitations/:invitationId/resend', requireTeam('members.manage'), async (req, res) => {
    const { teamId, invitationId } = parse(invitationParams, req.params);
    res.json(await resendInvitation(db, mailer, env.APP_URL, teamId, invitationId, req.session!.user.id));
  });
  r.patch('/:teamId/members/:userId', requireTeam('members.manage'), async (req, res) => {
    const { teamId, userId } = parse(memberParams, req.params);
    res.json(await changeRole(db, teamId, userId, parse(changeRoleBody, req.body).role));
  });
  r.delete('/:teamId/members/:userId', requireTeam('members.manage'), async (req, res) => {
    const { teamId, userId } = parse(memberParams, req.params);
    await removeMember(db, teamId, userId);
    res.status(204).end();
  });
  r.get('/:teamId/outbox', requireTeam('outbox.read'), async (req, res) => {
    res.json(await listTeamOutbox(db, teamIdOf(req)));
  });
  return r;
}
