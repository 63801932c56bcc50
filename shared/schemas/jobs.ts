import { z } from 'zod';
import { importCommitSchema, importPreviewSchema } from './imports';
import { surfaceSchema } from './surfaces';

/**
 * Long work the server runs in the background and the client polls at GET /teams/:teamId/jobs/:jobId:
 * an import commit or a surface run.
 */
export const JOB_KINDS = ['import', 'surface'] as const;
export type JobKind = (typeof JOB_KINDS)[number];

export const JOB_STATES = ['running', 'done', 'error'] as const;
export type JobState = (typeof JOB_STATES)[number];

/** The phases of an import, in order (server/features/imports: imports.service.ts, importWriter.ts). */
export const IMPORT_JOB_PHASES = [
  'reading file',
  'checking rows',
  'writing new wells',
  'updating wells',
  'writing survey stations',
  'writing pressure observations',
  'writing formation tops',
  'writing log curves',
] as const;

/** The phases of a surface run, in order (server/features/surfaces and shared/interpolation/surface). */
export const SURFACE_JOB_PHASES = [
  'gathering wells',
  'building well profiles',
  'interpolating',
  'cross-validating',
  'contouring',
  'saving',
] as const;

/** Every phase a job goes through: its kind's own, between the registry's start and end. */
export const JOB_PHASES = ['starting', ...IMPORT_JOB_PHASES, ...SURFACE_JOB_PHASES, 'finished', 'failed'] as const;
export type JobPhase = (typeof JOB_PHASES)[number];
export type ImportJobPhase = (typeof IMPORT_JOB_PHASES)[number];
export type SurfaceJobPhase = (typeof SURFACE_JOB_PHASES)[number];

/** A failed job's error, as the API's error reply would have carried it. */
export const jobErrorSchema = z.object({ status: z.number(), code: z.string(), message: z.string(), details: z.unknown().optional() });
export type JobError = z.infer<typeof jobErrorSchema>;

const jobShape = {
  id: z.string(),
  state: z.enum(JOB_STATES),
  phase: z.enum(JOB_PHASES),
  /** Progress within the current phase; each phase restarts its count. */
  done: z.number(),
  total: z.number(),
  error: jobErrorSchema.optional(),
};

/** The import's reply once done: a commit (or a preview, for an `async` dry run). */
export const importJobSchema = z.object({
  ...jobShape,
  kind: z.literal('import'),
  result: z.discriminatedUnion('dryRun', [importCommitSchema, importPreviewSchema]).optional(),
});
export type ImportJob = z.infer<typeof importJobSchema>;

/** The stored surface once done. */
export const surfaceJobSchema = z.object({ ...jobShape, kind: z.literal('surface'), result: surfaceSchema.optional() });
export type SurfaceJob = z.infer<typeof surfaceJobSchema>;

export const jobSchema = z.discriminatedUnion('kind', [importJobSchema, surfaceJobSchema]);
export type Job = z.infer<typeof jobSchema>;
/** What a finished job of each kind holds. */
export type JobResult<K extends JobKind> = NonNullable<Extract<Job, { kind: K }>['result']>;

/** The reply that starts a job (202). */
export const jobStartedSchema = z.object({ jobId: z.string() });
export type JobStarted = z.infer<typeof jobStartedSchema>;
