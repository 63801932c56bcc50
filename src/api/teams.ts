import { z } from 'zod';
import type { Role } from '@shared/auth/permissions';
import {
  memberSchema,
  outboxMessageSchema,
  pendingInvitationSchema,
  roleSchema,
  type InviteBody,
  type Member,
  type OutboxMessage,
  type PendingInvitation,
} from '@shared/schemas/auth';
import { api, type ApiClient } from './client';

/** Reply to a new invitation. Kept here until the contract gains a shared schema for it. */
export const invitationSchema = z.object({
  id: z.string(),
  email: z.string(),
  role: roleSchema,
  expiresAt: z.string(),
});
export type Invitation = z.infer<typeof invitationSchema>;

const teamPath = (teamId: string) => `/api/teams/${encodeURIComponent(teamId)}`;

/**
 * Members of a team (admins only).
 * @example const members = await listMembers(teamId);
 */
export function listMembers(teamId: string, client: ApiClient = api): Promise<Member[]> {
  return client.get(`${teamPath(teamId)}/members`, z.array(memberSchema));
}

/**
 * Invites a person by e-mail; the invitation mail lands in the team's outbox.
 * @example await inviteMember(teamId, { email: 'lin@example.org', name: 'Lin Okafor', role: 'planner' });
 */
export function inviteMember(teamId: string, body: InviteBody, client: ApiClient = api): Promise<Invitation> {
  return client.post(`${teamPath(teamId)}/invitations`, body, invitationSchema);
}

/**
 * Gives a member another role in this team.
 * @example await changeMemberRole(teamId, userId, 'viewer');
 */
export function changeMemberRole(teamId: string, userId: string, role: Role, client: ApiClient = api): Promise<Member> {
  return client.patch(`${teamPath(teamId)}/members/${encodeURIComponent(userId)}`, { role }, memberSchema);
}

/**
 * Removes a member from this team (their account stays).
 * @example await removeMember(teamId, userId);
 */
export function removeMember(teamId: string, userId: string, client: ApiClient = api): Promise<void> {
  return client.del(`${teamPath(teamId)}/members/${encodeURIComponent(userId)}`);
}

/**
 * Mails the local mail fake received for this team (invitations, resets), admins only.
 * @example const messages = await listOutbox(teamId);
 */
export function listOutbox(teamId: string, client: ApiClient = api): Promise<OutboxMessage[]> {
  return client.get(`${teamPath(teamId)}/outbox`, z.array(outboxMessageSchema));
}

/**
 * The team's invitations nobody has used yet and that still work (admins only).
 * @example const pending = await listInvitations(teamId);
 */
export function listInvitations(teamId: string, client: ApiClient = api): Promise<PendingInvitation[]> {
  return client.get(`${teamPath(teamId)}/invitations`, z.array(pendingInvitationSchema));
}

/**
 * Withdraws a pending invitation; its link stops working.
 * @example await revokeInvitation(teamId, invitationId);
 */
export function revokeInvitation(teamId: string, invitationId: string, client: ApiClient = api): Promise<void> {
  return client.del(`${teamPath(teamId)}/invitations/${encodeURIComponent(invitationId)}`);
}

/**
 * Mails a new link for a pending invitation with a fresh expiry; the old link stops working.
 * @example const renewed = await resendInvitation(teamId, invitationId);
 */
export function resendInvitation(teamId: string, invitationId: string, client: ApiClient = api): Promise<PendingInvitation> {
  return client.post(`${teamPath(teamId)}/invitations/${encodeURIComponent(invitationId)}/resend`, {}, pendingInvitationSchema);
}
