import { doublePrecision, index, integer, jsonb, pgTable, text, uuid } from 'drizzle-orm/pg-core';
import { createdAt, id } from './columns';
import { polygonGeometry } from './geometry';
import { prospects } from './planning';
import { teams } from './teams';
import { users } from './users';

/** One interpolation run over a prospect: inputs, the grid, contours and checks, kept as run. */
export const surfaces = pgTable(
  'surfaces',
  {
    id: id(),
    teamId: uuid()
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    prospectId: uuid()
      .notNull()
      .references(() => prospects.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    quantity: text().notNull(),
    method: text().notNull(),
    params: jsonb().$type<Record<string, unknown>>().notNull(),
    nx: integer().notNull(),
    ny: integer().notNull(),
    cellSizeM: doublePrecision().notNull(),
    projection: text().notNull(),
    x0: doublePrecision().notNull(),
    y0: doublePrecision().notNull(),
    values: doublePrecision().array().notNull(),
    stdDev: doublePrecision().array(),
    extent: polygonGeometry().notNull(),
    /** Grid corners, contours, variogram, cross-validation, wells used and warnings. */
    result: jsonb().$type<Record<string, unknown>>().notNull(),
    rmseM: doublePrecision(),
    wellCount: integer().notNull(),
    createdBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
  },
  (t) => [index().on(t.teamId, t.prospectId), index('surfaces_extent_gist').using('gist', t.extent)],
);
