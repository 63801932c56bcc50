import { z } from 'zod';

/** Vocabulary for well data, shared by the database enums, the importers and the UI. */
export const WELL_STATUSES = ['planned', 'drilling', 'drilled', 'abandoned', 'suspended'] as const;
export type WellStatus = (typeof WELL_STATUSES)[number];

export const PRESSURE_KINDS = [
  'formation_test', // wireline formation pressure test
  'dst', // drill-stem test
  'kick',
  'loss',
  'mud_weight', // mud weight in use
  'lot', // leak-off test
  'fit', // formation integrity test
  'pp_estimate', // a pore-pressure estimate (e.g. from an earlier study)
  'other',
] as const;
export type PressureKind = (typeof PRESSURE_KINDS)[number];

export const PRESSURE_KIND_LABELS: Record<PressureKind, string> = {
  formation_test: 'Formation pressure test',
  dst: 'Drill-stem test',
  kick: 'Kick',
  loss: 'Loss',
  mud_weight: 'Mud weight in use',
  lot: 'Leak-off test',
  fit: 'Formation integrity test',
  pp_estimate: 'Pore-pressure estimate',
  other: 'Other',
};

/** Test quality as the trade grades formation pressure tests. */
export const PRESSURE_QUALITIES = ['good', 'tight', 'supercharged', 'doubtful', 'unknown'] as const;
export type PressureQuality = (typeof PRESSURE_QUALITIES)[number];

export const CURVE_ROLES = ['sonic', 'resistivity', 'density', 'gamma', 'caliper', 'neutron', 'porosity', 'other'] as const;
export type CurveRole = (typeof CURVE_ROLES)[number];

export const wellSummarySchema = z.object({
  id: z.string().uuid(),
  name: z.string(),
  uwi: z.string().nullable(),
  operator: z.string().nullable(),
  lon: z.number(),
  lat: z.number(),
  status: z.enum(WELL_STATUSES),
  offshore: z.boolean(),
  waterDepthM: z.number().nullable(),
  tdMdM: z.number().nullable(),
  tdTvdM: z.number().nullable(),
  spudDate: z.string().nullable(),
  pressureCount: z.number(),
  logCount: z.number(),
  hasSurvey: z.boolean(),
  hasLot: z.boolean(),
  updatedAt: z.string(),
});
export type WellSummary = z.infer<typeof wellSummarySchema>;

export const WELL_SORTS = ['name', 'status', 'tdMdM', 'spudDate', 'waterDepthM', 'pressureCount', 'updatedAt'] as const;

const csvList = <T extends readonly [string, ...string[]]>(values: T) =>
  z
    .string()
    .transform((s) =>
      s
        .split(',')
        .map((x) => x.trim())
        .filter(Boolean),
    )
    .pipe(z.array(z.enum(values)));

export const wellListQuery = z.object({
  q: z.string().trim().max(100).optional(),
  status: csvList(WELL_STATUSES).optional(),
  hasPressures: z
    .enum(['true', 'false'])
    .transform((v) => v === 'true')
    .optional(),
  bbox: z
    .string()
    .transform((s) => s.split(',').map(Number))
    .pipe(
      z
        .tuple([z.number().min(-180).max(180), z.number().min(-90).max(90), z.number().min(-180).max(180), z.number().min(-90).max(90)])
        .refine(([w, s, e, n]) => w <= e && s <= n, 'must be west,south,east,north with west ≤ east and south ≤ north'),
    )
    .optional(),
  sort: z.enum(WELL_SORTS).default('name'),
  order: z.enum(['asc', 'desc']).default('asc'),
  limit: z.coerce.number().int().min(1).max(500).default(50),
  offset: z.coerce.number().int().min(0).default(0),
});
export type WellListQuery = z.input<typeof wellListQuery>;

export const wellListSchema = z.object({ total: z.number(), items: z.array(wellSummarySchema) });
export type WellList = z.infer<typeof wellListSchema>;

export const formationTopSchema = z.object({
  id: z.string().uuid(),
  name: z.string(),
  mdM: z.number(),
  tvdM: z.number().nullable(),
  lithology: z.string().nullable(),
});
export type FormationTop = z.infer<typeof formationTopSchema>;

export const wellDetailSchema = wellSummarySchema.extend({
  surfaceX: z.number(),
  surfaceY: z.number(),
  surfaceEpsg: z.number(),
  datumKind: z.string(),
  datumElevationM: z.number(),
  groundElevationM: z.number().nullable(),
  airGapM: z.number().nullable(),
  note: z.string().nullable(),
  version: z.number(),
  tops: z.array(formationTopSchema),
  survey: z.object({ stations: z.number(), maxIncDeg: z.number(), maxDoglegDegPer30m: z.number(), tdTvdM: z.number() }).nullable(),
  createdAt: z.string(),
});
export type WellDetail = z.infer<typeof wellDetailSchema>;

export const wellPatchBody = z
  .object({
    version: z.number().int().min(1),
    name: z.string().trim().min(1).max(120).optional(),
    uwi: z.string().trim().max(40).nullable().optional(),
    operator: z.string().trim().max(120).nullable().optional(),
    status: z.enum(WELL_STATUSES).optional(),
    note: z.string().max(4000).nullable().optional(),
    datumElevationM: z.number().min(-100).max(200).optional(),
    waterDepthM: z.number().min(0).max(4000).nullable().optional(),
    airGapM: z.number().min(0).max(100).nullable().optional(),
  })
  .strict();
export type WellPatchBody = z.infer<typeof wellPatchBody>;

export const pressureObservationSchema = z.object({
  id: z.string().uuid(),
  kind: z.enum(PRESSURE_KINDS),
  mdM: z.number(),
  tvdM: z.number(),
  valueEntered: z.number(),
  unitEntered: z.string(),
  /** Absolute pressure in Pa at the TVD (for mud weights: the mud column's hydrostatic pressure); the entered value is in valueEntered. */
  valueSi: z.number(),
  emwKgM3: z.number(),
  quality: z.enum(PRESSURE_QUALITIES),
  fluid: z.string().nullable(),
  observedOn: z.string().nullable(),
  source: z.string().nullable(),
});
export type PressureObservation = z.infer<typeof pressureObservationSchema>;

export const surveyStationSchema = z.object({
  mdM: z.number(),
  incDeg: z.number(),
  aziDeg: z.number(),
  tvdM: z.number(),
  northM: z.number(),
  eastM: z.number(),
  doglegDegPer30m: z.number(),
});
export type SurveyStation = z.infer<typeof surveyStationSchema>;

export const logCurveSummarySchema = z.object({
  id: z.string().uuid(),
  mnemonic: z.string(),
  unit: z.string(),
  description: z.string(),
  role: z.enum(CURVE_ROLES),
  samples: z.number(),
  topMdM: z.number(),
  baseMdM: z.number(),
  uploadId: z.string().uuid().nullable(),
});
export type LogCurveSummary = z.infer<typeof logCurveSummarySchema>;

export const logCurveDataSchema = logCurveSummarySchema.extend({
  mdM: z.array(z.number()),
  values: z.array(z.number().nullable()),
});
export type LogCurveData = z.infer<typeof logCurveDataSchema>;
