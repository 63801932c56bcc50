import { integer, pgTable, text, timestamp, uuid, index } from 'drizzle-orm/pg-core';
import { createdAt, id } from './columns';

/** People who can sign in. Email is stored lower-case; the hash is bcrypt. */
export const users = pgTable('users', {
  id: id(),
  email: text().notNull().unique(),
  name: text().notNull(),
  passwordHash: text(),
  /** Carried in every session token; a password reset bumps it, which ends every earlier session. */
  sessionVersion: integer().notNull().default(0),
  createdAt: createdAt(),
});

/**
 * Sessions ended by signing out, by the id their token carries. A row only needs to outlive the
 * longest token that could still carry that id, so expired rows are pruned.
 */
export const revokedSessions = pgTable(
  'revoked_sessions',
  {
    sessionId: uuid().primaryKey(),
    userId: uuid()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    expiresAt: timestamp({ withTimezone: true }).notNull(),
  },
  (t) => [index().on(t.expiresAt)],
);

/** Single-use password-reset links; only the SHA-256 of the token is kept. */
export const passwordResets = pgTable(
  'password_resets',
  {
    id: id(),
    userId: uuid()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    tokenHash: text().notNull().unique(),
    expiresAt: timestamp({ withTimezone: true }).notNull(),
    usedAt: timestamp({ withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [index().on(t.userId)],
);
