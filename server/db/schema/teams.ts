import { pgTable, text, timestamp, uuid, primaryKey, pgEnum, index } from 'drizzle-orm/pg-core';
import { ROLES } from '../../../shared/auth/permissions';
import { createdAt, id } from './columns';
import { users } from './users';

export const roleEnum = pgEnum('team_role', ROLES);

export const teams = pgTable('teams', {
  id: id(),
  name: text().notNull().unique(),
  createdAt: createdAt(),
});

/** A user's role in one team; every team-scoped permission check reads this. */
export const memberships = pgTable(
  'memberships',
  {
    teamId: uuid()
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    userId: uuid()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    role: roleEnum().notNull(),
    createdAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.teamId, t.userId] }), index().on(t.userId)],
);

/** Single-use, expiring invitations sent by a team admin; only the token's SHA-256 is kept. */
export const invitations = pgTable(
  'invitations',
  {
    id: id(),
    teamId: uuid()
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    email: text().notNull(),
    name: text().notNull(),
    role: roleEnum().notNull(),
    tokenHash: text().notNull().unique(),
    invitedBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    expiresAt: timestamp({ withTimezone: true }).notNull(),
    acceptedAt: timestamp({ withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [index().on(t.teamId)],
);
