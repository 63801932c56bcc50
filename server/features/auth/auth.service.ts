import bcrypt from 'bcryptjs';
import { and, eq, gt, isNull, sql } from 'drizzle-orm';
import type { Session } from '../../../shared/schemas/auth';
import type { Db } from '../../db/client';
import { invitations, memberships, passwordResets, teams, users } from '../../db/schema';
import { HttpError, badRequest } from '../../lib/httpError';
import type { Mailer } from '../mail/mailer';
import { hashLinkToken, newLinkToken } from './linkTokens';

const RESET_MINUTES = 60;
const BCRYPT_ROUNDS = 10;
// Compared against when the user is unknown, so timing does not reveal which e-mails exist.
const DUMMY_HASH = bcrypt.hashSync('porelith-no-such-user', BCRYPT_ROUNDS);

const invalidCredentials = () => new HttpError(401, 'invalid_credentials', 'The e-mail or password is not right.');
const invalidToken = () =>
  badRequest('invalid_token', 'This link is not valid any more: it was used already, has expired, or was mistyped.');

/** The user with every team membership, as the API returns it. */
export async function loadSession(db: Db, userId: string): Promise<Session | null> {
  const [user] = await db.select({ id: users.id, email: users.email, name: users.name }).from(users).where(eq(users.id, userId));
  if (!user) return null;
  const rows = await db
    .select({ teamId: memberships.teamId, teamName: teams.name, role: memberships.role })
    .from(memberships)
    .innerJoin(teams, eq(teams.id, memberships.teamId))
    .where(eq(memberships.userId, userId))
    .orderBy(teams.name);
  return { user, memberships: rows };
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

/** Consumes a reset token (once, atomically) and sets the new password. */
export async function resetPassword(db: Db, token: string, password: string): Promise<string> {
  const hash = await bcrypt.hash(password, BCRYPT_ROUNDS);
  return db.transaction(async (tx) => {
    const [used] = await tx
      .update(passwordResets)
      .set({ usedAt: sql`now()` })
      .where(and(eq(passwordResets.tokenHash, hashLinkToken(token)), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, sql`now()`)))
      .returning({ userId: passwordResets.userId });
    if (!used) throw invalidToken();
    await tx.update(users).set({ passwordHash: hash }).where(eq(users.id, used.userId));
    return used.userId;
  });
}

/** Consumes an invitation (once, atomically): creates or updates the user and adds the membership. */
export async function acceptInvitation(db: Db, token: string, password: string): Promise<string> {
  const hash = await bcrypt.hash(password, BCRYPT_ROUNDS);
  return db.transaction(async (tx) => {
    const [inv] = await tx
      .update(invitations)
      .set({ acceptedAt: sql`now()` })
      .where(and(eq(invitations.tokenHash, hashLinkToken(token)), isNull(invitations.acceptedAt), gt(invitations.expiresAt, sql`now()`)))
      .returning();
    if (!inv) throw invalidToken();
    const [user] = await tx
      .insert(users)
      .values({ email: inv.email, name: inv.name, passwordHash: hash })
      .onConflictDoUpdate({ target: users.email, set: { passwordHash: hash } })
      .returning({ id: users.id });
    await tx
      .insert(memberships)
      .values({ teamId: inv.teamId, userId: user.id, role: inv.role })
      .onConflictDoUpdate({ target: [memberships.teamId, memberships.userId], set: { role: inv.role } });
    return user.id;
  });
}
