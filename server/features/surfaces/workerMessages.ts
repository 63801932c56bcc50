import { z } from 'zod';
import { SURFACE_COMPUTE_PHASES, type SurfaceResult } from '../../../shared/interpolation/surface';

/**
 * What the surface worker posts to the main thread. The phase is checked against the job phases on arrival, so a
 * renamed phase fails here and not as an unknown label in the client.
 */
export const workerMessageSchema = z.discriminatedUnion('type', [
  z.object({ type: z.literal('progress'), phase: z.enum(SURFACE_COMPUTE_PHASES), done: z.number(), total: z.number() }),
  // The result is the worker's own computation, structured-cloned: its shape is the compiler's to check.
  z.object({ type: z.literal('done'), result: z.custom<SurfaceResult>((v) => typeof v === 'object' && v !== null) }),
  z.object({ type: z.literal('error'), input: z.boolean(), message: z.string() }),
]);
export type WorkerMessage = z.infer<typeof workerMessageSchema>;
