import { and, eq, gt, isNull, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import type { Role } from '../../../shared/auth/permissions';
import { ROLE_LABELS } from '../../../shared/auth/roleLabels';
import type { InviteBody, Member, PendingInvitation } from '../../../shared/schemas/auth';
import type { Db } from '../../db/client';
import { invitations, memberships, teams, users } from '../../db/schema';
import { conflict, HttpError, notFound } from '../../lib/httpError';
import { INVITE_DAYS, newLinkToken } from '../../lib/linkTokens';
import type { Mailer } from '../mail/mailer';

export async function listMembers(db: Db, teamId: string): Promise<Member[]> {
  const rows = await db
    .select({ userId: users.id, email: users.email, name: users.name, role: memberships.role, joinedAt: memberships.createdAt })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.teamId, teamId))
    .orderBy(users.name);
  return rows.map((r) => ({ ...r, joinedAt: r.joinedAt.toISOString() }));
}

/** Sends the invitation mail; throws 502 `mail_failed` (so the caller's transaction writes nothing) when it cannot. */
async function mailInvitation(
  db: Db,
  mailer: Mailer,
  appUrl: string,
  inv: { teamId: string; invitedBy: string; email: string; name: string; role: Role },
  token: string,
  existingAccount: boolean,
): Promise<void> {
  const [team] = await db.select({ name: teams.name }).from(teams).where(eq(teams.id, inv.teamId));
  const [inviter] = await db.select({ name: users.name }).from(users).where(eq(users.id, inv.invitedBy));
  // An existing account joins with its current password (which the link never changes); `existing=1`
  // only picks the matching form in the client, the server decides from the account itself.
  const link = `${appUrl}/accept-invite?token=${token}${existingAccount ? '&existing=1' : ''}`;
  const what = existingAccount
    ? `You already have a Porelith account: open this link within ${INVITE_DAYS} days and confirm with your current password to join; it works once:`
    : `Open this link within ${INVITE_DAYS} days to set your password; it works once:`;
  try {
    await mailer.send({
      to: inv.email,
      teamId: inv.teamId,
      subject: `You are invited to the team "${team.name}" on Porelith`,
      text: `Hello ${inv.name},\n\n${inviter?.name ?? 'A team admin'} invited you to join "${team.name}" on Porelith as ${ROLE_LABELS[inv.role]}.\n${what}\n\n${link}\n`,
    });
  } catch (err) {
    throw new HttpError(
      502,
      'mail_failed',
      `The invitation to ${inv.email} could not be e-mailed (${(err as Error).message}); nothing was saved. Check the mail settings and try again.`,
    );
  }
}

export async function inviteMember(
  db: Db,
  mailer: Mailer,
  appUrl: string,
  teamId: string,
  invitedBy: string,
  body: InviteBody,
): Promise<{ id: string; email: string; role: Role; expiresAt: string }> {
  const [existing] = await db.select({ id: users.id }).from(users).where(eq(users.email, body.email));
  if (existing) {
    const [member] = await db
      .select({ role: memberships.role })
      .from(memberships)
      .where(and(eq(memberships.userId, existing.id), eq(memberships.teamId, teamId)));
    if (member) throw conflict(`${body.email} is already a member of this team.`);
  }
  const { token, hash } = newLinkToken();
  const expiresAt = new Date(Date.now() + INVITE_DAYS * 86_400_000);
  // The invitation is kept only if its mail went out: an invitation nobody received would block a retry.
  const inv = await db.transaction(async (tx) => {
    const [row] = await tx
      .insert(invitations)
      .values({ teamId, email: body.email, name: body.name, role: body.role, tokenHash: hash, invitedBy, expiresAt })
      .returning({ id: invitations.id });
    await mailInvitation(
      db,
      mailer,
      appUrl,
      { teamId, invitedBy, email: body.email, name: body.name, role: body.role },
      token,
      Boolean(existing),
    );
    return row;
  });
  return { id: inv.id, email: body.email, role: body.role, expiresAt: expiresAt.toISOString() };
}

async function adminCount(db: Db, teamId: string): Promise<number> {
  const [row] = await db
    .select({ n: sql<number>`count(*)::int` })
    .from(memberships)
    .where(and(eq(memberships.teamId, teamId), eq(memberships.role, 'admin')));
  return row.n;
}

async function currentRole(db: Db, teamId: string, userId: string): Promise<Role> {
  const [m] = await db
    .select({ role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.teamId, teamId), eq(memberships.userId, userId)));
  if (!m) throw notFound('That member');
  return m.role;
}

/** A team always keeps at least one admin, so it can never lock itself out. */
export async function changeRole(db: Db, teamId: string, userId: string, role: Role): Promise<Member> {
  const before = await currentRole(db, teamId, userId);
  if (before === 'admin' && role !== 'admin' && (await adminCount(db, teamId)) <= 1) {
    throw conflict('This is the team’s last admin; make someone else admin first.');
  }
  await db
    .update(memberships)
    .set({ role })
    .where(and(eq(memberships.teamId, teamId), eq(memberships.userId, userId)));
  const member = (await listMembers(db, teamId)).find((m) => m.userId === userId);
  if (!member) throw notFound('That member');
  return member;
}

export async function removeMember(db: Db, teamId: string, userId: string): Promise<void> {
  const role = await currentRole(db, teamId, userId);
  if (role === 'admin' && (await adminCount(db, teamId)) <= 1) {
    throw conflict('This is the team’s last admin; make someone else admin first.');
  }
  await db.delete(memberships).where(and(eq(memberships.teamId, teamId), eq(memberships.userId, userId)));
}

const inviters = alias(users, 'inviters');
const pending = (teamId: string) =>
  and(eq(invitations.teamId, teamId), isNull(invitations.acceptedAt), gt(invitations.expiresAt, sql`now()`));

/** The team's invitations nobody has used yet and that still work, newest first. */
export async function listPendingInvitations(db: Db, teamId: string): Promise<PendingInvitation[]> {
  const rows = await db
    .select({
      id: invitations.id,
      email: invitations.email,
      name: invitations.name,
      role: invitations.role,
      invitedBy: inviters.name,
      createdAt: invitations.createdAt,
      expiresAt: invitations.expiresAt,
    })
    .from(invitations)
    .leftJoin(inviters, eq(inviters.id, invitations.invitedBy))
    .where(pending(teamId))
    .orderBy(sql`${invitations.createdAt} desc`);
  return rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString(), expiresAt: r.expiresAt.toISOString() }));
}

const noPendingInvitation = () => notFound('That pending invitation');

/** Withdraws a pending invitation: the row goes, so its link is refused as not valid. */
export async function revokeInvitation(db: Db, teamId: string, invitationId: string): Promise<void> {
  const gone = await db
    .delete(invitations)
    .where(and(eq(invitations.id, invitationId), pending(teamId)))
    .returning({ id: invitations.id });
  if (gone.length === 0) throw noPendingInvitation();
}

/**
 * Mails a pending invitation again with a new link and a fresh expiry; the old link stops working at once.
 * When the mail cannot be sent nothing changes (the old link keeps working).
 */
export async function resendInvitation(
  db: Db,
  mailer: Mailer,
  appUrl: string,
  teamId: string,
  invitationId: string,
  sentBy: string,
): Promise<PendingInvitation> {
  const { token, hash } = newLinkToken();
  const expiresAt = new Date(Date.now() + INVITE_DAYS * 86_400_000);
  await db.transaction(async (tx) => {
    const [inv] = await tx
      .update(invitations)
      .set({ tokenHash: hash, expiresAt, invitedBy: sentBy })
      .where(and(eq(invitations.id, invitationId), pending(teamId)))
      .returning();
    if (!inv) throw noPendingInvitation();
    const [existing] = await tx.select({ id: users.id }).from(users).where(eq(users.email, inv.email));
    await mailInvitation(
      db,
      mailer,
      appUrl,
      { teamId, invitedBy: sentBy, email: inv.email, name: inv.name, role: inv.role },
      token,
      Boolean(existing),
    );
  });
  const row = (await listPendingInvitations(db, teamId)).find((i) => i.id === invitationId);
  if (!row) throw noPendingInvitation();
  return row;
}
