import { importJobSchema, surfaceJobSchema, type Job, type JobKind } from '@shared/schemas/jobs';
import type { ZodType } from 'zod';
import { api, type ApiClient } from './client';

const JOB_SCHEMAS: { [K in JobKind]: ZodType<Extract<Job, { kind: K }>> } = { import: importJobSchema, surface: surfaceJobSchema };

/**
 * Where a background job (an import commit or a surface run) stands: phase, done/total, and its result or error
 * once finished. A job of another kind than `kind` is refused as an unexpected reply.
 * @example const job = await getJob(teamId, jobId, 'surface'); job.done / job.total
 */
export function getJob<K extends JobKind>(
  teamId: string,
  jobId: string,
  kind: K,
  client: ApiClient = api,
): Promise<Extract<Job, { kind: K }>> {
  return client.get(`/api/teams/${encodeURIComponent(teamId)}/jobs/${encodeURIComponent(jobId)}`, JOB_SCHEMAS[kind]);
}
