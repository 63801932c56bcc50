import { pgTable, text, timestamp, uuid, index } from 'drizzle-orm/pg-core';
import { id } from './columns';
import { teams } from './teams';

/** What the local mail fake received over SMTP: the in-app Outbox and the tests read it. */
export const mailMessages = pgTable(
  'mail_messages',
  {
    id: id(),
    teamId: uuid().references(() => teams.id, { onDelete: 'set null' }),
    fromAddress: text().notNull(),
    toAddresses: text().array().notNull(),
    subject: text().notNull(),
    textBody: text().notNull(),
    raw: text().notNull(),
    receivedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index().on(t.teamId), index().on(t.receivedAt)],
);
