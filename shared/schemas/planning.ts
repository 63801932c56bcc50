import { z } from 'zod';

/** Prospects, planned wells, offset-well picks and reference layers: the API contracts. */

const lon = z.number().min(-180, 'longitude must be within −180..180').max(180, 'longitude must be within −180..180');
const lat = z.number().min(-90, 'latitude must be within −90..90').max(90, 'latitude must be within −90..90');
export const lonLatSchema = z.tuple([lon, lat]);

/** A GeoJSON polygon (RFC 7946): one outer ring, closed, at least four positions. */
export const polygonSchema = z.object({
  type: z.literal('Polygon'),
  coordinates: z
    .array(z.array(lonLatSchema).min(4, 'a ring needs at least four positions (closed)'))
    .min(1, 'a polygon needs an outer ring')
    .max(1, 'holes are not supported for prospects'),
});
export type PolygonGeometry = z.infer<typeof polygonSchema>;

export const pointSchema = z.object({ type: z.literal('Point'), coordinates: lonLatSchema });

const depth = z.number().min(0, 'must not be negative').max(15_000, 'must be at most 15,000 m');

export const prospectBody = z
  .object({
    name: z.string().trim().min(1, 'is required').max(120),
    geometry: polygonSchema,
    targetTopM: depth.nullable().optional(),
    targetBaseM: depth.nullable().optional(),
    notes: z.string().max(4000).nullable().optional(),
  })
  .refine((p) => p.targetTopM == null || p.targetBaseM == null || p.targetTopM < p.targetBaseM, {
    message: 'the target top must be shallower than the target base',
    path: ['targetBaseM'],
  });
export type ProspectBody = z.infer<typeof prospectBody>;
export const prospectPatchBody = z.object({ version: z.number().int().min(1) }).and(prospectBody);

export const prospectSchema = z.object({
  id: z.string().uuid(),
  name: z.string(),
  geometry: polygonSchema,
  areaKm2: z.number(),
  targetTopM: z.number().nullable(),
  targetBaseM: z.number().nullable(),
  notes: z.string().nullable(),
  version: z.number(),
  createdBy: z.string().nullable(),
  updatedAt: z.string(),
});
export type Prospect = z.infer<typeof prospectSchema>;

export const plannedWellBody = z.object({
  name: z.string().trim().min(1, 'is required').max(120),
  location: pointSchema,
  prospectId: z.string().uuid().nullable().optional(),
  /** Rotary-table elevation above sea level, m. */
  datumElevationM: z.number().min(-100).max(200).default(25),
  /** Water depth, m; null asks the server to estimate it from the nearest wells. */
  waterDepthM: z.number().min(0).max(4000).nullable().optional(),
  plannedTdM: depth.refine((v) => v > 0, 'must be above zero'),
  notes: z.string().max(4000).nullable().optional(),
});
export type PlannedWellBody = z.infer<typeof plannedWellBody>;
export const plannedWellPatchBody = z.object({ version: z.number().int().min(1) }).and(plannedWellBody);

export const plannedWellSchema = z.object({
  id: z.string().uuid(),
  name: z.string(),
  location: pointSchema,
  prospectId: z.string().uuid().nullable(),
  datumElevationM: z.number(),
  waterDepthM: z.number().nullable(),
  /** How the water depth was set: entered, or estimated from the nearest wells (inverse-distance). */
  waterDepthSource: z.enum(['entered', 'nearest-wells', 'unknown']),
  plannedTdM: z.number(),
  notes: z.string().nullable(),
  version: z.number(),
  updatedAt: z.string(),
});
export type PlannedWell = z.infer<typeof plannedWellSchema>;

export const offsetCandidatesQuery = z.object({
  radiusKm: z.coerce.number().gt(0, 'must be above 0 km').max(500, 'must be at most 500 km').default(25),
  /** Use the planned well's prospect polygon plus this buffer instead of a radius. */
  prospectBufferKm: z.coerce.number().min(0).max(100).optional(),
});

/** Wells around a prospect alone: inside its outline or within this buffer of it. */
export const prospectOffsetQuery = z.object({
  bufferKm: z.coerce.number().min(0, 'must be 0 km or more').max(100, 'must be at most 100 km').default(10),
});

/**
 * How an offset candidate's score (0 to 1) is made up, as shares of the whole (common practice, no source):
 * nearness matters most, then a similar water depth, then whether it reached the planned depth, then its data.
 * The server ranks by it and the offset table explains the ranking from the same table.
 * @example OFFSET_SCORE_WEIGHTS.near // 0.4
 */
export const OFFSET_SCORE_WEIGHTS = { near: 0.4, water: 0.2, depth: 0.2, data: 0.2 } as const;

export const offsetCandidateSchema = z.object({
  wellId: z.string().uuid(),
  name: z.string(),
  uwi: z.string().nullable(),
  status: z.string(),
  lon: z.number(),
  lat: z.number(),
  distanceKm: z.number(),
  /** From the planned well (or the prospect's centroid) to the offset, degrees clockwise from north. */
  azimuthDeg: z.number(),
  waterDepthM: z.number().nullable(),
  waterDepthDiffM: z.number().nullable(),
  tdTvdM: z.number().nullable(),
  /** Offset TD (TVD) over the planned TD; 1 or more means it reached the planned depth. */
  tdCoverage: z.number().nullable(),
  pressureCount: z.number(),
  logCount: z.number(),
  hasLot: z.boolean(),
  hasSurvey: z.boolean(),
  topTvdssM: z.number().nullable(),
  inOffsetSet: z.boolean(),
  /** Higher is a better offset: near, similar water depth, deep enough, rich in data. */
  score: z.number(),
});
export type OffsetCandidate = z.infer<typeof offsetCandidateSchema>;

export const offsetSetBody = z.object({
  wells: z
    .array(z.object({ wellId: z.string().uuid(), reason: z.string().max(500).nullable().optional() }))
    .max(200, 'at most 200 offset wells'),
});
export type OffsetSetBody = z.infer<typeof offsetSetBody>;

export const offsetSetEntrySchema = z.object({
  wellId: z.string().uuid(),
  name: z.string(),
  reason: z.string().nullable(),
  addedBy: z.string().nullable(),
  addedByName: z.string().nullable(),
  addedAt: z.string(),
});
export type OffsetSetEntry = z.infer<typeof offsetSetEntrySchema>;

export const REFERENCE_LAYER_KINDS = ['lease_blocks', 'survey_outlines', 'faults', 'bathymetry', 'other'] as const;
export const referenceLayerSchema = z.object({
  id: z.string().uuid(),
  name: z.string(),
  kind: z.enum(REFERENCE_LAYER_KINDS),
  color: z.string(),
  featureCount: z.number(),
  geometryTypes: z.array(z.string()),
  bbox: z.tuple([z.number(), z.number(), z.number(), z.number()]).nullable(),
  createdAt: z.string(),
});
export type ReferenceLayer = z.infer<typeof referenceLayerSchema>;

/** Layers the team tile endpoint serves: `/api/teams/:teamId/tiles/:layer/:z/:x/:y.mvt`. */
export const TEAM_TILE_LAYERS = ['wells', 'prospects', 'planned-wells'] as const;
