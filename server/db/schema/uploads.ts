import { index, integer, jsonb, pgEnum, pgTable, text, uuid } from 'drizzle-orm/pg-core';
import { IMPORT_KINDS } from '../../../shared/schemas/imports';
import { bytea, createdAt, id } from './columns';
import { teams } from './teams';
import { users } from './users';

export const importKindEnum = pgEnum('import_kind', IMPORT_KINDS);

/** Every committed import, with the original bytes so it can be traced back and re-run. */
export const uploads = pgTable(
  'uploads',
  {
    id: id(),
    teamId: uuid()
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    kind: importKindEnum().notNull(),
    fileName: text().notNull(),
    sizeBytes: integer().notNull(),
    sha256: text().notNull(),
    content: bytea().notNull(),
    /** What the import did: counts of created/updated/skipped rows, the skipped rows and why. */
    outcome: jsonb().$type<Record<string, unknown>>().notNull(),
    mapping: jsonb().$type<Record<string, unknown>>(),
    uploadedBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
  },
  (t) => [index().on(t.teamId, t.createdAt), index().on(t.teamId, t.sha256)],
);
