import { boolean, date, doublePrecision, index, integer, jsonb, pgEnum, pgTable, text, uuid } from 'drizzle-orm/pg-core';
import { CURVE_ROLES, PRESSURE_KINDS, PRESSURE_QUALITIES } from '../../../shared/schemas/wells';
import { createdAt, id } from './columns';
import { uploads } from './uploads';
import { wells } from './wells';

// The rows that belong to one well: they live and die with it (the well is the aggregate root).
const wellRef = () =>
  uuid()
    .notNull()
    .references(() => wells.id, { onDelete: 'cascade' });
const uploadRef = () => uuid().references(() => uploads.id, { onDelete: 'set null' });

export const pressureKindEnum = pgEnum('pressure_kind', PRESSURE_KINDS);
export const pressureQualityEnum = pgEnum('pressure_quality', PRESSURE_QUALITIES);
export const curveRoleEnum = pgEnum('curve_role', CURVE_ROLES);

/** Deviation survey stations with the minimum-curvature results, recomputed whenever stations change. */
export const surveyStations = pgTable(
  'survey_stations',
  {
    id: id(),
    wellId: wellRef(),
    seq: integer().notNull(),
    mdM: doublePrecision().notNull(),
    incDeg: doublePrecision().notNull(),
    aziDeg: doublePrecision().notNull(),
    tvdM: doublePrecision().notNull(),
    northM: doublePrecision().notNull(),
    eastM: doublePrecision().notNull(),
    doglegDegPer30m: doublePrecision().notNull(),
    uploadId: uploadRef(),
  },
  (t) => [index().on(t.wellId, t.seq)],
);

/**
 * Pressure observations as entered (value + unit) and in SI: absolute pressure in Pa at the TVD,
 * and the equivalent density (kg/m³) at that TVD below the rig datum.
 */
export const pressureObservations = pgTable(
  'pressure_observations',
  {
    id: id(),
    wellId: wellRef(),
    kind: pressureKindEnum().notNull(),
    mdM: doublePrecision().notNull(),
    tvdM: doublePrecision().notNull(),
    /** True when the TVD was computed from the survey (and is recomputed when the survey changes). */
    tvdFromSurvey: boolean().notNull().default(false),
    valueEntered: doublePrecision().notNull(),
    unitEntered: text().notNull(),
    pressurePa: doublePrecision().notNull(),
    emwKgM3: doublePrecision().notNull(),
    quality: pressureQualityEnum().notNull().default('unknown'),
    fluid: text(),
    observedOn: date(),
    source: text(),
    uploadId: uploadRef(),
    createdAt: createdAt(),
  },
  (t) => [index().on(t.wellId, t.tvdM), index().on(t.kind)],
);

export const formationTops = pgTable(
  'formation_tops',
  {
    id: id(),
    wellId: wellRef(),
    name: text().notNull(),
    mdM: doublePrecision().notNull(),
    tvdM: doublePrecision(),
    tvdFromSurvey: boolean().notNull().default(false),
    lithology: text(),
    uploadId: uploadRef(),
  },
  (t) => [index().on(t.wellId, t.mdM)],
);

/** One log curve from a LAS file: the index in metres MD and the values (NaN for NULL stored as NULL). */
export const logCurves = pgTable(
  'log_curves',
  {
    id: id(),
    wellId: wellRef(),
    mnemonic: text().notNull(),
    unit: text().notNull(),
    description: text().notNull().default(''),
    role: curveRoleEnum().notNull().default('other'),
    mdM: doublePrecision().array().notNull(),
    values: doublePrecision().array().notNull(),
    topMdM: doublePrecision().notNull(),
    baseMdM: doublePrecision().notNull(),
    /** The original LAS header sections (~V ~W ~C ~P ~O) as parsed. */
    lasHeader: jsonb().$type<Record<string, unknown>>(),
    uploadId: uploadRef(),
    createdAt: createdAt(),
  },
  (t) => [index().on(t.wellId)],
);
