import bcrypt from 'bcryptjs';
import { randomUUID } from 'node:crypto';
import { and, eq, gt, isNull, lt, sql } from 'drizzle-orm';
import type { InvitationCheck, ResetCheck, Session } from '../../../shared/schemas/auth';
import type { Db } from '../../db/client';
import { invitations, memberships, passwordResets, revokedSessions, teams, users } from '../../db/schema';
import { HttpError, badRequest, conflict } from '../../lib/httpError';
import type { Mailer } from '../mail/mailer';
import { INVITE_DAYS, hashLinkToken, newLinkToken } from '../../lib/linkTokens';
import { BCRYPT_ROUNDS, hashPassword } from '../../lib/passwords';
import type { SessionClaims, SessionGrant } from './sessionToken';

/** How long a password-reset link works; the reset page says so. */
export const RESET_MINUTES = 60;
// Compared against when the user is unknown, so timing does not reveal which e-mails exist.
const DUMMY_HASH = bcrypt.hashSync('porelith-no-such-user', BCRYPT_ROUNDS);

const invalidCredentials = () => new HttpError(401, 'invalid_credentials', 'The e-mail or password is not right.');
const invalidToken = () =>
  badRequest('invalid_token', 'This link is not valid any more: it was used already, has expired, or was mistyped.');
// Same code as any dead link (the client treats them alike), but the message says what to do next. A submit
// with the link is a 400; opening it (nothing sent yet) is a 410, like a used link.
const expiredInvitation = (status: 400 | 410 = 400) =>
  new HttpError(
    status,
    'invalid_token',
    `This invitation link has expired (links last ${INVITE_DAYS} days); ask your team admin to invite you again.`,
    {
      reason: 'expired',
    },
  );
const expiredReset = (status: 400 | 410 = 400) =>
  new HttpError(
    status,
    'invalid_token',
    `This password-reset link has expired (links last ${RESET_MINUTES} minutes); ask for a new one from the sign-in page.`,
    {
      reason: 'expired',
    },
  );
const existingAccountPassword = (email: string) =>
  new HttpError(
    401,
    'existing_account_password',
    `${email} already has a Porelith account: enter that account’s current password to join the team (it is not changed). Forgot it? Reset it from the sign-in page first.`,
  );

/** The user with every team membership, as the API returns it. */
export async function loadSession(db: Db, userId: string): Promise<Session | null> {
  const [user] = await db.select({ id: users.id, email: users.email, name: users.name }).from(users).where(eq(users.id, userId));
  return user ? withMemberships(db, user) : null;
}

async function withMemberships(db: Db, user: Session['user']): Promise<Session> {
  const rows = await db
    .select({ teamId: memberships.teamId, teamName: teams.name, role: memberships.role })
    .from(memberships)
    .innerJoin(teams, eq(teams.id, memberships.teamId))
    .where(eq(memberships.userId, user.id))
    .orderBy(teams.name);
  return { user, memberships: rows };
}

/** A new session for the user at their current session version (what the cookie will carry). */
export async function startSession(db: Db, userId: string): Promise<SessionGrant> {
  const [row] = await db.select({ version: users.sessionVersion }).from(users).where(eq(users.id, userId));
  if (!row) throw invalidCredentials();
  return { userId, sessionId: randomUUID(), sessionVersion: row.version };
}

/**
 * The session a verified token stands for, or null when it was ended: signed out (its id is revoked),
 * or issued before the user's last password reset (an older version), or the user is gone.
 */
export async function loadActiveSession(db: Db, claims: SessionClaims): Promise<Session | null> {
  // One read of the user row serves both the session check and the session itself (this runs on every request).
  const [row] = await db
    .select({
      id: users.id,
      email: users.email,
      name: users.name,
      version: users.sessionVersion,
      revoked: sql<boolean>`exists (select 1 from ${revokedSessions} where ${revokedSessions.sessionId} = ${claims.sessionId})`,
    })
    .from(users)
    .where(eq(users.id, claims.userId));
  if (!row || row.revoked || row.version !== claims.sessionVersion) return null;
  return withMemberships(db, { id: row.id, email: row.email, name: row.name });
}

/**
 * Ends one session (sign-out). The row must outlive every token that may carry this id: renewal keeps the
 * id, and no token issued up to now lives past now + `sessionMinutes`. Expired rows are pruned on the way.
 */
export async function endSession(db: Db, claims: SessionClaims, sessionMinutes: number): Promise<void> {
  await db.transaction(async (tx) => {
    await tx.delete(revokedSessions).where(lt(revokedSessions.expiresAt, sql`now()`));
    await tx
      .insert(revokedSessions)
      .values({ sessionId: claims.sessionId, userId: claims.userId, expiresAt: sql`now() + make_interval(mins => ${sessionMinutes})` })
      .onConflictDoNothing();
  });
}

export async function signIn(db: Db, email: string, password: string): Promise<Session> {
  const [user] = await db.select({ id: users.id, hash: users.passwordHash }).from(users).where(eq(users.email, email));
  const ok = await bcrypt.compare(password, user?.hash ?? DUMMY_HASH);
  if (!user || !user.hash || !ok) throw invalidCredentials();
  const session = await loadSession(db, user.id);
  if (!session) throw invalidCredentials();
  return session;
}

/** Always succeeds from the caller's view; a mail goes out only when the account exists. */
export async function requestPasswordReset(db: Db, mailer: Mailer, appUrl: string, email: string): Promise<void> {
  const [user] = await db.select({ id: users.id, name: users.name }).from(users).where(eq(users.email, email));
  if (!user) return;
  const { token, hash } = newLinkToken();
  await db.insert(passwordResets).values({
    userId: user.id,
    tokenHash: hash,
    expiresAt: new Date(Date.now() + RESET_MINUTES * 60_000),
  });
  await mailer.send({
    to: email,
    subject: 'Reset your Porelith password',
    text:
      `Hello ${user.name},\n\nSomeone (hopefully you) asked to reset the password of your Porelith account.\n` +
      `Open this link within ${RESET_MINUTES} minutes to choose a new one; it works once:\n\n` +
      `${appUrl}/reset-password?token=${token}\n\nIf you did not ask for this, ignore this message.\n`,
  });
}

/** Consumes a reset token (once, atomically), sets the new password and ends every earlier session. */
export async function resetPassword(db: Db, token: string, password: string): Promise<string> {
  const tokenHash = hashLinkToken(token);
  const [reset] = await db.select().from(passwordResets).where(eq(passwordResets.tokenHash, tokenHash));
  if (!reset || reset.usedAt) throw invalidToken();
  if (reset.expiresAt.getTime() <= Date.now()) throw expiredReset();
  const hash = await hashPassword(password);
  return db.transaction(async (tx) => {
    // Re-checked here so two tabs using the same link cannot both succeed.
    const [used] = await tx
      .update(passwordResets)
      .set({ usedAt: sql`now()` })
      .where(and(eq(passwordResets.id, reset.id), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, sql`now()`)))
      .returning({ userId: passwordResets.userId });
    if (!used) throw invalidToken();
    // Whoever knew the old password may hold a session; the version bump ends them all.
    await tx
      .update(users)
      .set({ passwordHash: hash, sessionVersion: sql`${users.sessionVersion} + 1` })
      .where(eq(users.id, used.userId));
    return used.userId;
  });
}

/**
 * Consumes an invitation (once, atomically) and adds the membership.
 * For a new e-mail it creates the account with the chosen password. For an e-mail that already has an
 * account, `password` must be that account's current password and is never changed: otherwise whoever can
 * read the invitation (the inviting team's admins see it in their Outbox) could take the account over.
 */
export async function acceptInvitation(db: Db, token: string, password: string): Promise<string> {
  const tokenHash = hashLinkToken(token);
  const [inv] = await db.select().from(invitations).where(eq(invitations.tokenHash, tokenHash));
  if (!inv || inv.acceptedAt) throw invalidToken();
  if (inv.expiresAt.getTime() <= Date.now()) throw expiredInvitation();
  const [existing] = await db.select({ id: users.id, hash: users.passwordHash }).from(users).where(eq(users.email, inv.email));
  if (existing) {
    // A password-less account cannot prove ownership here; its owner sets one through a reset mail.
    const ok = await bcrypt.compare(password, existing.hash ?? DUMMY_HASH);
    if (!existing.hash || !ok) throw existingAccountPassword(inv.email);
  }
  const newHash = existing ? null : await hashPassword(password);
  return db.transaction(async (tx) => {
    // Re-checked here so two tabs accepting the same link cannot both succeed.
    const [claimed] = await tx
      .update(invitations)
      .set({ acceptedAt: sql`now()` })
      .where(and(eq(invitations.id, inv.id), isNull(invitations.acceptedAt), gt(invitations.expiresAt, sql`now()`)))
      .returning({ id: invitations.id });
    if (!claimed) throw invalidToken();
    let userId = existing?.id;
    if (!userId) {
      const [created] = await tx
        .insert(users)
        .values({ email: inv.email, name: inv.name, passwordHash: newHash })
        .onConflictDoNothing({ target: users.email })
        .returning({ id: users.id });
      // The account appeared since the check above; never overwrite it, the person can simply retry.
      if (!created)
        throw conflict('An account for this e-mail was created meanwhile; open the link again and enter that account’s password.');
      userId = created.id;
    }
    await tx
      .insert(memberships)
      .values({ teamId: inv.teamId, userId, role: inv.role })
      .onConflictDoUpdate({ target: [memberships.teamId, memberships.userId], set: { role: inv.role } });
    return userId;
  });
}

// Opening a link: 404 when it never existed (or was revoked), 410 when it was used or has expired.
const unknownLink = (what: string) =>
  new HttpError(
    404,
    'invalid_token',
    `This ${what} link is not valid: it may be mistyped, or it was withdrawn or replaced by a newer one.`,
    {
      reason: 'unknown',
    },
  );
const usedLink = (what: string) =>
  new HttpError(410, 'invalid_token', `This ${what} link was used already; each link works once.`, { reason: 'used' });

/**
 * What an invitation link says when opened, before any password is typed; nothing is written.
 * Returns no more than the invitation mail itself did (address and team), plus which form to show.
 */
export async function inspectInvitation(db: Db, token: string): Promise<InvitationCheck> {
  const [inv] = await db
    .select({ email: invitations.email, teamName: teams.name, acceptedAt: invitations.acceptedAt, expiresAt: invitations.expiresAt })
    .from(invitations)
    .innerJoin(teams, eq(teams.id, invitations.teamId))
    .where(eq(invitations.tokenHash, hashLinkToken(token)));
  if (!inv) throw unknownLink('invitation');
  if (inv.acceptedAt) throw usedLink('invitation');
  if (inv.expiresAt.getTime() <= Date.now()) throw expiredInvitation(410);
  const [existing] = await db.select({ id: users.id }).from(users).where(eq(users.email, inv.email));
  return { email: inv.email, teamName: inv.teamName, existingAccount: Boolean(existing) };
}

/** Whether a reset link can still be used, when opened; reveals nothing about the account. */
export async function inspectResetToken(db: Db, token: string): Promise<ResetCheck> {
  const [reset] = await db
    .select({ usedAt: passwordResets.usedAt, expiresAt: passwordResets.expiresAt })
    .from(passwordResets)
    .where(eq(passwordResets.tokenHash, hashLinkToken(token)));
  if (!reset) throw unknownLink('password-reset');
  if (reset.usedAt) throw usedLink('password-reset');
  if (reset.expiresAt.getTime() <= Date.now()) throw expiredReset(410);
  return { expiresAt: reset.expiresAt.toISOString() };
}
