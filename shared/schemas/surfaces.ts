import { z } from 'zod';

/** Interpolated surfaces over a prospect: what the client asks for and what the server returns. */
export const SURFACE_QUANTITIES = ['top_tvdss', 'top_below_mudline'] as const;
export type SurfaceQuantity = (typeof SURFACE_QUANTITIES)[number];
export const SURFACE_QUANTITY_LABELS: Record<SurfaceQuantity, string> = {
  top_tvdss: 'Top of overpressure, depth below sea level',
  top_below_mudline: 'Top of overpressure, depth below mudline',
};

/** Largest grid a run may ask for: 250,000 cells (e.g. 500 × 500). */
export const MAX_SURFACE_CELLS = 250_000;

export const variogramSchema = z.object({
  model: z.enum(['spherical', 'exponential', 'gaussian']),
  nugget: z.number().min(0),
  sill: z.number().min(0),
  range: z.number().positive(),
});

export const surfaceRequestBody = z.object({
  name: z.string().trim().min(1).max(120).optional(),
  quantity: z.enum(SURFACE_QUANTITIES).default('top_tvdss'),
  /** Which wells: listed, a planned well's offset set, or (default) accepted TOP picks within the prospect + buffer. */
  wells: z
    .discriminatedUnion('from', [
      z.object({ from: z.literal('prospect'), bufferKm: z.number().min(0).max(200).default(10) }),
      z.object({ from: z.literal('offset-set'), plannedWellId: z.string().uuid() }),
      z.object({ from: z.literal('list'), wellIds: z.array(z.string().uuid()).min(1).max(5000) }),
    ])
    .default({ from: 'prospect', bufferKm: 10 }),
  method: z
    .discriminatedUnion('kind', [
      z.object({ kind: z.literal('kriging'), model: z.enum(['spherical', 'exponential', 'gaussian']).default('spherical'), variogram: variogramSchema.nullable().default(null), maxNeighbours: z.number().int().min(3).max(64).default(16) }),
      z.object({ kind: z.literal('idw'), power: z.number().min(0.5).max(6).default(2) }),
    ])
    .default({ kind: 'kriging', model: 'spherical', variogram: null, maxNeighbours: 16 }),
  cellSizeM: z.number().min(25, 'must be at least 25 m').max(10_000).default(250),
  /** The grid covers the prospect outline grown by this much, m. */
  extentBufferKm: z.number().min(0).max(100).default(5),
  contourIntervalM: z.number().positive().max(2000).default(50),
});
export type SurfaceRequest = z.input<typeof surfaceRequestBody>;

export const surfaceWellSchema = z.object({
  wellId: z.string().uuid(),
  name: z.string(),
  lon: z.number(),
  lat: z.number(),
  value: z.number(),
  interpretationVersion: z.number().nullable(),
  /** Leave-one-out: predicted − observed, m. */
  residual: z.number().nullable(),
  predicted: z.number().nullable(),
});

export const surfaceSummarySchema = z.object({
  id: z.string().uuid(),
  prospectId: z.string().uuid(),
  name: z.string(),
  quantity: z.enum(SURFACE_QUANTITIES),
  method: z.string(),
  cellSizeM: z.number(),
  wellCount: z.number(),
  rmseM: z.number().nullable(),
  createdBy: z.string().nullable(),
  createdByName: z.string().nullable(),
  createdAt: z.string(),
});
export type SurfaceSummary = z.infer<typeof surfaceSummarySchema>;

export const surfaceSchema = surfaceSummarySchema.extend({
  params: z.record(z.string(), z.unknown()),
  grid: z.object({
    nx: z.number(),
    ny: z.number(),
    cellSizeM: z.number(),
    /** proj4 definition of the local metric frame (azimuthal equidistant about the prospect). */
    projection: z.string(),
    /** Centre of cell (0, 0) in that frame; rows go north. */
    x0: z.number(),
    y0: z.number(),
    /** Row-major, south row first; null outside the extent. */
    values: z.array(z.number().nullable()),
    stdDev: z.array(z.number().nullable()).nullable(),
    /** The grid's outer corners in lon/lat: [south-west, south-east, north-east, north-west]. */
    cornersLonLat: z.array(z.tuple([z.number(), z.number()])).length(4),
    min: z.number(),
    max: z.number(),
  }),
  /** Contour lines (GeoJSON MultiLineString features with `value`), in lon/lat. */
  contours: z.object({ type: z.literal('FeatureCollection'), features: z.array(z.unknown()) }),
  extent: z.object({ type: z.literal('Polygon'), coordinates: z.array(z.array(z.tuple([z.number(), z.number()]))) }),
  variogram: z
    .object({ model: variogramSchema, experimental: z.array(z.object({ lagM: z.number(), gamma: z.number(), pairs: z.number() })), fitted: z.boolean() })
    .nullable(),
  crossValidation: z.object({ rmse: z.number(), meanError: z.number() }),
  wells: z.array(surfaceWellSchema),
  warnings: z.array(z.string()),
});
export type Surface = z.infer<typeof surfaceSchema>;
