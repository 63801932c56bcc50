import { index, integer, jsonb, pgEnum, pgTable, text, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import type { InterpretationContent } from '../../../shared/schemas/interpretations';
import { createdAt, id } from './columns';
import { users } from './users';
import { wells } from './wells';

export const interpretationStatusEnum = pgEnum('interpretation_status', ['draft', 'accepted']);

/**
 * Versions of a well's interpretation. Rows are never updated: a save adds version n + 1, a restore adds
 * a copy; the unique (well, version) index makes two simultaneous saves of the same base fail cleanly.
 */
export const interpretations = pgTable(
  'interpretations',
  {
    id: id(),
    wellId: uuid()
      .notNull()
      .references(() => wells.id, { onDelete: 'cascade' }),
    version: integer().notNull(),
    status: interpretationStatusEnum().notNull(),
    content: jsonb().$type<InterpretationContent>().notNull(),
    note: text(),
    restoredFrom: integer(),
    createdBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('interpretations_well_version_unique').on(t.wellId, t.version), index().on(t.wellId, t.status)],
);
