import { sql } from 'drizzle-orm';
import { boolean, date, doublePrecision, index, integer, jsonb, pgEnum, pgTable, text, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { WELL_STATUSES } from '../../../shared/schemas/wells';
import { createdAt, id, updatedAt } from './columns';
import { pointGeometry } from './geometry';
import { teams } from './teams';
import { uploads } from './uploads';
import { users } from './users';

export const wellStatusEnum = pgEnum('well_status', WELL_STATUSES);

/**
 * An offset (or planned) well. Depths are metres; MD from the rig datum; TVD from the same datum.
 * `version` guards concurrent edits (PATCH with a stale version is a 409).
 */
export const wells = pgTable(
  'wells',
  {
    id: id(),
    teamId: uuid()
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    uwi: text(),
    operator: text(),
    location: pointGeometry().notNull(),
    surfaceX: doublePrecision().notNull(),
    surfaceY: doublePrecision().notNull(),
    surfaceEpsg: integer().notNull().default(4326),
    /** Rig datum (rotary table / kelly bushing) above sea level, m. */
    datumElevationM: doublePrecision().notNull().default(0),
    datumKind: text().notNull().default('RT'),
    /** Ground level above sea level (onshore), m. */
    groundElevationM: doublePrecision(),
    waterDepthM: doublePrecision(),
    airGapM: doublePrecision(),
    offshore: boolean().notNull().default(false),
    spudDate: date(),
    tdMdM: doublePrecision(),
    tdTvdM: doublePrecision(),
    status: wellStatusEnum().notNull().default('drilled'),
    note: text(),
    /** Free-form extras from imports that have no column of their own. */
    extra: jsonb().$type<Record<string, string>>(),
    createdUploadId: uuid().references(() => uploads.id, { onDelete: 'set null' }),
    updatedUploadId: uuid().references(() => uploads.id, { onDelete: 'set null' }),
    createdBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    updatedBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
    version: integer().notNull().default(1),
  },
  (t) => [
    index('wells_location_gist').using('gist', t.location),
    index().on(t.teamId, t.name),
    uniqueIndex('wells_team_uwi_unique')
      .on(t.teamId, t.uwi)
      .where(sql`${t.uwi} IS NOT NULL`),
    uniqueIndex('wells_team_name_unique').on(t.teamId, t.name),
  ],
);
