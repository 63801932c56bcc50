import { z } from 'zod';

/** Interpolated surfaces over a prospect: what the client asks for and what the server returns. */
export const SURFACE_QUANTITIES = ['top_tvdss', 'top_below_mudline', 'emw_at_depth', 'overpressure_at_depth'] as const;
export type SurfaceQuantity = (typeof SURFACE_QUANTITIES)[number];
export const SURFACE_QUANTITY_LABELS: Record<SurfaceQuantity, string> = {
  top_tvdss: 'Top of overpressure, depth below sea level',
  top_below_mudline: 'Top of overpressure, depth below mudline (or ground)',
  emw_at_depth: 'Pore-pressure EMW at a depth',
  overpressure_at_depth: 'Overpressure at a depth',
};

/** What kind of value each quantity maps, and the SI unit its values, residuals and standard deviations are in. */
export const SURFACE_QUANTITY_KINDS = {
  top_tvdss: 'depth',
  top_below_mudline: 'depth',
  emw_at_depth: 'emw',
  overpressure_at_depth: 'pressure',
} as const satisfies Record<SurfaceQuantity, string>;
export type SurfaceQuantityKind = (typeof SURFACE_QUANTITY_KINDS)[SurfaceQuantity];
export const SURFACE_KIND_SI_UNITS = { depth: 'm', emw: 'kg/m3', pressure: 'Pa' } as const satisfies Record<SurfaceQuantityKind, string>;
export type SurfaceSiUnit = (typeof SURFACE_KIND_SI_UNITS)[SurfaceQuantityKind];

/** The quantities read off each well's pore-pressure profile at a depth the user gives. */
export const AT_DEPTH_QUANTITIES: readonly SurfaceQuantity[] = ['emw_at_depth', 'overpressure_at_depth'];

/**
 * The SI unit of a quantity's values.
 * @example surfaceSiUnit('overpressure_at_depth') // 'Pa'
 */
export function surfaceSiUnit(quantity: SurfaceQuantity): SurfaceSiUnit {
  return SURFACE_KIND_SI_UNITS[SURFACE_QUANTITY_KINDS[quantity]];
}

/**
 * Default contour spacing per kind, in its SI unit: 50 m of depth, 20 kg/m³ of EMW (≈ 0.02 sg, 0.17 ppg),
 * 1 MPa of overpressure (common practice, no source).
 */
export const DEFAULT_CONTOUR_INTERVALS = { depth: 50, emw: 20, pressure: 1e6 } as const satisfies Record<SurfaceQuantityKind, number>;

/** Largest grid a run may ask for: 250,000 cells (e.g. 500 × 500). */
export const MAX_SURFACE_CELLS = 250_000;

export const variogramSchema = z.object({
  model: z.enum(['spherical', 'exponential', 'gaussian']),
  nugget: z.number().min(0),
  sill: z.number().min(0),
  range: z.number().positive(),
});

export const surfaceRequestBody = z
  .object({
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
        z.object({
          kind: z.literal('kriging'),
          model: z.enum(['spherical', 'exponential', 'gaussian']).default('spherical'),
          variogram: variogramSchema.nullable().default(null),
          maxNeighbours: z.number().int().min(3).max(64).nullable().default(null),
          trend: z.enum(['none', 'planar']).default('none'),
        }),
        z.object({ kind: z.literal('idw'), power: z.number().min(0.5).max(6).default(2) }),
      ])
      .default({ kind: 'kriging', model: 'spherical', variogram: null, maxNeighbours: null, trend: 'none' }),
    cellSizeM: z.number().min(25, 'must be at least 25 m').max(10_000).default(250),
    /** The grid covers the prospect outline grown by this much, m. */
    extentBufferKm: z.number().min(0).max(100).default(5),
    /** The depth unit the run's depth was entered in: the run's name gives the depth in it. */
    depthUnit: z.enum(['m', 'ft']).optional(),
    /** The unit the contour interval was entered in (m, ft, ppg, psi…): contours are labelled in it, so they read as round values. */
    contourLabelUnit: z.string().max(16).optional(),
    /** Contour spacing of depth quantities, m. */
    contourIntervalM: z.number().positive().max(2000).default(50),
    /** Contour spacing of `emw_at_depth`, kg/m³ (default 20). */
    contourIntervalKgM3: z.number().positive().max(1000).optional(),
    /** Contour spacing of `overpressure_at_depth`, Pa (default 1 MPa). */
    contourIntervalPa: z.number().positive().max(1e8).optional(),
    /** The depth of `emw_at_depth` and `overpressure_at_depth`, TVD below sea level, m (required for those). */
    depthTvdssM: z.number().min(0, 'must be at or below sea level (>= 0 m TVDSS)').max(15_000, 'must be at most 15000 m TVDSS').optional(),
  })
  .superRefine((b, ctx) => {
    if (AT_DEPTH_QUANTITIES.includes(b.quantity) && b.depthTvdssM === undefined) {
      ctx.addIssue({ code: 'custom', path: ['depthTvdssM'], message: `is required for ${b.quantity}: the depth below sea level, m` });
    }
  });
export type SurfaceRequest = z.input<typeof surfaceRequestBody>;

/** Kriging with `maxNeighbours: null` uses every well up to this many (one factorisation, no seams), the nearest {@link DEFAULT_NEIGHBOURS} above. */
export const ALL_WELLS_MAX = 100;
export const DEFAULT_NEIGHBOURS = 16;

/**
 * The neighbour limit a kriging run uses: undefined for all wells.
 * @example krigingNeighbours(null, 54) // undefined
 * @example krigingNeighbours(null, 500) // 16
 */
export function krigingNeighbours(maxNeighbours: number | null, wells: number): number | undefined {
  const k = maxNeighbours ?? (wells <= ALL_WELLS_MAX ? undefined : DEFAULT_NEIGHBOURS);
  return k === undefined || k >= wells ? undefined : k;
}

/**
 * The contour spacing a request asks for, in the SI unit of its quantity.
 * @example contourIntervalOf(surfaceRequestBody.parse({ quantity: 'overpressure_at_depth', depthTvdssM: 3000 })) // 1000000
 */
export function contourIntervalOf(b: z.output<typeof surfaceRequestBody>): number {
  const kind = SURFACE_QUANTITY_KINDS[b.quantity];
  if (kind === 'emw') return b.contourIntervalKgM3 ?? DEFAULT_CONTOUR_INTERVALS.emw;
  if (kind === 'pressure') return b.contourIntervalPa ?? DEFAULT_CONTOUR_INTERVALS.pressure;
  return b.contourIntervalM;
}

/**
 * Leave-one-out errors over their kriging σ: about 68 % within 1σ and 95 % within 2σ, RMS ≈ 1, when σ is right
 * (normal-distribution table). The verdict bands are common practice, no source.
 */
export const SIGMA_VERDICTS = ['about right', 'too small', 'too large'] as const;
export const sigmaCheckSchema = z.object({
  rmsZ: z.number(),
  within1: z.number(),
  within2: z.number(),
  verdict: z.enum(SIGMA_VERDICTS),
});
export type SigmaCheck = z.infer<typeof sigmaCheckSchema>;

export const surfaceWellSchema = z.object({
  wellId: z.string().uuid(),
  name: z.string(),
  lon: z.number(),
  lat: z.number(),
  /** The well's value, in the surface's `unit`. */
  value: z.number(),
  interpretationVersion: z.number().nullable(),
  /** Leave-one-out: predicted − observed, in the surface's `unit`. */
  residual: z.number().nullable(),
  predicted: z.number().nullable(),
  /** Kriging's own standard deviation of that leave-one-out prediction, in `unit` (null for IDW and older runs). */
  looStdDev: z.number().nullable().default(null),
  /** For quantities at a depth: what the well's profile gives there (TVD below its rig datum, pressures in Pa). */
  atDepth: z
    .object({
      tvdM: z.number(),
      porePa: z.number(),
      hydrostaticPa: z.number(),
      overburdenPa: z.number(),
      poreEmwKgM3: z.number(),
      overpressurePa: z.number(),
    })
    .nullable()
    .optional(),
});

/** A well of the chosen set that the run left out, and why (no accepted TOP, logs not reaching the depth…). */
export const surfaceExcludedWellSchema = z.object({ wellId: z.string().uuid(), name: z.string(), reason: z.string() });
export type SurfaceExcludedWell = z.infer<typeof surfaceExcludedWellSchema>;

export const surfaceSummarySchema = z.object({
  id: z.string().uuid(),
  prospectId: z.string().uuid(),
  name: z.string(),
  quantity: z.enum(SURFACE_QUANTITIES),
  method: z.string(),
  cellSizeM: z.number(),
  wellCount: z.number(),
  /** SI unit of the values, residuals, standard deviations and RMSE: m, kg/m3 or Pa. */
  unit: z.enum(['m', 'kg/m3', 'Pa']),
  /** The depth of an at-depth quantity, TVD below sea level, m; null for TOP surfaces. */
  depthTvdssM: z.number().nullable(),
  /** Leave-one-out RMSE in `unit`. */
  rmse: z.number().nullable(),
  /** The same RMSE for depth quantities only (m); null for EMW and overpressure surfaces. */
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
    .object({
      model: variogramSchema,
      experimental: z.array(z.object({ lagM: z.number(), gamma: z.number(), pairs: z.number() })),
      fitted: z.boolean(),
    })
    .nullable(),
  crossValidation: z.object({
    rmse: z.number(),
    meanError: z.number(),
    /** Whether kriging's σ matches its own leave-one-out errors (kriging runs; null for IDW and older runs). */
    sigmaCheck: sigmaCheckSchema.nullable().default(null),
  }),
  wells: z.array(surfaceWellSchema),
  /** Wells of the chosen set left out of the run, each with its reason (runs stored before this list: empty). */
  excluded: z.array(surfaceExcludedWellSchema),
  warnings: z.array(z.string()),
});
export type Surface = z.infer<typeof surfaceSchema>;
