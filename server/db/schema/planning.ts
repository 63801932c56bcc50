import { doublePrecision, index, integer, jsonb, pgEnum, pgTable, primaryKey, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { REFERENCE_LAYER_KINDS, type PlannedWell } from '../../../shared/schemas/planning';
import { createdAt, id, updatedAt } from './columns';
import { pointGeometry, polygonGeometry } from './geometry';
import { teams } from './teams';
import { users } from './users';
import { wells } from './wells';
import { customType } from 'drizzle-orm/pg-core';

const teamRef = () =>
  uuid()
    .notNull()
    .references(() => teams.id, { onDelete: 'cascade' });
const userRef = () => uuid().references(() => users.id, { onDelete: 'set null' });

/** An exploration prospect outline with its target interval (depths TVD below sea level, m). */
export const prospects = pgTable(
  'prospects',
  {
    id: id(),
    teamId: teamRef(),
    name: text().notNull(),
    outline: polygonGeometry().notNull(),
    targetTopM: doublePrecision(),
    targetBaseM: doublePrecision(),
    notes: text(),
    createdBy: userRef(),
    updatedBy: userRef(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
    version: integer().notNull().default(1),
  },
  (t) => [index('prospects_outline_gist').using('gist', t.outline), index().on(t.teamId)],
);

/** A well not yet drilled, whose pressures the team predicts from its offset set. */
export const plannedWells = pgTable(
  'planned_wells',
  {
    id: id(),
    teamId: teamRef(),
    prospectId: uuid().references(() => prospects.id, { onDelete: 'set null' }),
    name: text().notNull(),
    location: pointGeometry().notNull(),
    datumElevationM: doublePrecision().notNull().default(25),
    waterDepthM: doublePrecision(),
    waterDepthSource: text().$type<PlannedWell['waterDepthSource']>().notNull().default('entered'),
    plannedTdM: doublePrecision().notNull(),
    notes: text(),
    createdBy: userRef(),
    updatedBy: userRef(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
    version: integer().notNull().default(1),
  },
  (t) => [index('planned_wells_location_gist').using('gist', t.location), index().on(t.teamId)],
);

/** The offset wells a planner picked for a planned well, with who, when and why. */
export const offsetPicks = pgTable(
  'offset_picks',
  {
    plannedWellId: uuid()
      .notNull()
      .references(() => plannedWells.id, { onDelete: 'cascade' }),
    wellId: uuid()
      .notNull()
      .references(() => wells.id, { onDelete: 'cascade' }),
    reason: text(),
    addedBy: userRef(),
    addedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.plannedWellId, t.wellId] })],
);

export const referenceLayerKindEnum = pgEnum('reference_layer_kind', REFERENCE_LAYER_KINDS);

const anyGeometry = customType<{ data: string; driverData: string }>({ dataType: () => 'geometry(Geometry,4326)' });

/** A team's uploaded reference layer (lease blocks, survey outlines, faults, bathymetry contours…). */
export const referenceLayers = pgTable(
  'reference_layers',
  {
    id: id(),
    teamId: teamRef(),
    name: text().notNull(),
    kind: referenceLayerKindEnum().notNull().default('other'),
    color: text().notNull().default('#6b7f99'),
    fileName: text().notNull(),
    createdBy: userRef(),
    createdAt: createdAt(),
  },
  (t) => [index().on(t.teamId)],
);

export const referenceFeatures = pgTable(
  'reference_features',
  {
    id: id(),
    layerId: uuid()
      .notNull()
      .references(() => referenceLayers.id, { onDelete: 'cascade' }),
    geom: anyGeometry().notNull(),
    properties: jsonb().$type<Record<string, unknown>>().notNull().default({}),
  },
  (t) => [index('reference_features_geom_gist').using('gist', t.geom), index().on(t.layerId)],
);
