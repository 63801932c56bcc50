import { pgTable, text, timestamp, uuid, index } from 'drizzle-orm/pg-core';
import { createdAt, id } from './columns';

/** People who can sign in. Email is stored lower-case; the hash is bcrypt. */
export const users = pgTable('users', {
  id: id(),
  email: text().notNull().unique(),
  name: text().notNull(),
  passwordHash: text(),
  createdAt: createdAt(),
});

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
