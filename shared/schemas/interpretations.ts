import { z } from 'zod';

/**
 * A well interpretation: the normal compaction trend, the log-based pore-pressure method and its
 * parameters, the fracture-pressure settings and the top-of-overpressure pick. Saved as versions;
 * the newest accepted one is what maps, surfaces and exports use. All depths TVD below the rig datum, m.
 */
export const trendSchema = z.object({
  curveId: z.string().uuid().nullable(),
  curve: z.enum(['sonic', 'resistivity']),
  model: z.enum(['exponential', 'loglinear']),
  fromM: z.number().min(0),
  toM: z.number().min(0),
  /** As fitted by `fitNormalTrend` (exponential: matrix, surface, cPerM; loglinear: a, b); editable. */
  params: z.record(z.string(), z.number()),
  r2: z.number().nullable(),
  /** Optional shale filter: samples with gamma ray below this (API) are left out of the fit. */
  gammaCutoffApi: z.number().nullable(),
});

/** Running-median window applied to the log before the method, m (0: off); versions saved before it read as 0. */
const smoothingM = z.number().min(0).max(500).default(0);

export const poreMethodSchema = z.discriminatedUnion('method', [
  z.object({ method: z.literal('eaton-sonic'), exponent: z.number().min(0.1).max(10).default(3), smoothingM }),
  z.object({ method: z.literal('eaton-resistivity'), exponent: z.number().min(0.1).max(10).default(1.2), smoothingM }),
  z.object({
    method: z.literal('bowers'),
    smoothingM,
    v0: z.number().default(5000),
    A: z.number().positive(),
    B: z.number().positive(),
    unloading: z
      .object({ vMaxMs: z.number().positive(), U: z.number().min(1) })
      .nullable()
      .default(null),
  }),
]);

export const fractureSchema = z.discriminatedUnion('method', [
  z.object({
    method: z.literal('eaton'),
    /** Poisson's ratio: constant (gradient 0) or linear in TVD. */
    poissonTop: z.number().min(0).max(0.5),
    poissonGradientPerKm: z.number().min(-0.2).max(0.2).default(0),
  }),
  z.object({ method: z.literal('matthews-kelly'), ki: z.number().min(0).max(1.5) }),
]);

export const topPickSchema = z.object({
  tvdM: z.number().min(0),
  method: z.enum(['auto', 'manual']),
  confidence: z.enum(['high', 'medium', 'low']),
  comment: z.string().max(2000).nullable(),
  marginKgM3: z.number().min(0),
  minThicknessM: z.number().min(0),
});

export const interpretationContentSchema = z.object({
  /** The normal (hydrostatic) pore-fluid density used, kg/m³ (brine by default). */
  normalDensityKgM3: z.number().min(900).max(1300).default(1030),
  trend: trendSchema.nullable(),
  pore: poreMethodSchema.nullable(),
  fracture: fractureSchema.nullable(),
  top: topPickSchema.nullable(),
});
export type InterpretationContent = z.infer<typeof interpretationContentSchema>;

export const saveInterpretationBody = interpretationContentSchema.extend({
  /** The version the editor started from (null for the first); a newer one on the server is a 409. */
  baseVersion: z.number().int().min(1).nullable(),
  status: z.enum(['draft', 'accepted']).default('accepted'),
  note: z.string().max(2000).nullable().optional(),
});
export type SaveInterpretationBody = z.input<typeof saveInterpretationBody>;

export const interpretationSchema = interpretationContentSchema.extend({
  id: z.string().uuid(),
  wellId: z.string().uuid(),
  version: z.number(),
  status: z.enum(['draft', 'accepted']),
  note: z.string().nullable(),
  createdBy: z.string().nullable(),
  createdByName: z.string().nullable(),
  createdAt: z.string(),
  /** Set when this version restored an earlier one. */
  restoredFrom: z.number().nullable(),
});
export type Interpretation = z.infer<typeof interpretationSchema>;
