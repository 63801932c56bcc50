import { and, eq, sql } from 'drizzle-orm';
import type { Role } from '../../../shared/auth/permissions';
import type { InviteBody, Member } from '../../../shared/schemas/auth';
import type { Db } from '../../db/client';
import { invitations, memberships, teams, users } from '../../db/schema';
import { conflict, HttpError, notFound } from '../../lib/httpError';
import { newLinkToken } from '../auth/linkTokens';
import type { Mailer } from '../mail/mailer';

export const INVITE_DAYS = 7;

export async function listMembers(db: Db, teamId: string): Promise<Member[]> {
  const rows = await db
    .select({ userId: users.id, email: users.email, name: users.name, role: memberships.role, joinedAt: memberships.createdAt })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.teamId, teamId))
    .orderBy(users.name);
  return rows.map((r) => ({ ...r, joinedAt: r.joinedAt.toISOString() }));
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
  const [team] = await db.select({ name: teams.name }).from(teams).where(eq(teams.id, teamId));
  const [inviter] = await db.select({ name: users.name }).from(users).where(eq(users.id, invitedBy));
  const { token, hash } = newLinkToken();
  const expiresAt = new Date(Date.now() + INVITE_DAYS * 86_400_000);
  // The invitation is kept only if its mail went out: an invitation nobody received would block a retry.
  const inv = await db.transaction(async (tx) => {
    const [row] = await tx
      .insert(invitations)
      .values({ teamId, email: body.email, name: body.name, role: body.role, tokenHash: hash, invitedBy, expiresAt })
      .returning({ id: invitations.id });
    // An existing account joins with its current password (which the link never changes); `existing=1`
    // only picks the matching form in the client, the server decides from the account itself.
    const link = `${appUrl}/accept-invite?token=${token}${existing ? '&existing=1' : ''}`;
    const what = existing
      ? `You already have a Porelith account: open this link within ${INVITE_DAYS} days and confirm with your current password to join; it works once:`
      : `Open this link within ${INVITE_DAYS} days to set your password; it works once:`;
    try {
      await mailer.send({
        to: body.email,
        teamId,
        subject: `You are invited to the team "${team.name}" on Porelith`,
        text: `Hello ${body.name},\n\n${inviter?.name ?? 'A team admin'} invited you to join "${team.name}" on Porelith as ${body.role}.\n${what}\n\n${link}\n`,
      });
    } catch (err) {
      throw new HttpError(502, 'mail_failed', `The invitation to ${body.email} could not be e-mailed (${(err as Error).message}); nothing was saved. Check the mail settings and try again.`);
    }
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
  await db.update(memberships).set({ role }).where(and(eq(memberships.teamId, teamId), eq(memberships.userId, userId)));
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
