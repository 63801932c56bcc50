import { randomUUID } from 'node:crypto';
import type { Job, JobKind, JobPhase, JobResult } from '../../shared/schemas/jobs';

/** Reports where a job stands: its phase and the count done of the phase's total. */
export type Progress = (phase: JobPhase, done: number, total: number) => void;

interface Entry {
  job: Job;
  teamId: string;
  startedAt: number;
}

const KEEP_MS = 30 * 60_000;

/**
 * In-memory progress of long work (imports, surface runs), polled by the client; finished jobs are forgotten after 30 minutes.
 * The app makes one and hands it to every router that starts or reports jobs.
 */
export class JobRegistry {
  private readonly entries = new Map<string, Entry>();

  start<K extends JobKind>(teamId: string, kind: K, run: (progress: Progress) => Promise<JobResult<K>>): Job {
    this.sweep();
    // The kind and the result's type go together by the signature; the union cannot see that through K.
    const job = { id: randomUUID(), kind, state: 'running', phase: 'starting', done: 0, total: 0 } as Job;
    this.entries.set(job.id, { job, teamId, startedAt: Date.now() });
    const progress: Progress = (phase, done, total) => Object.assign(job, { phase, done, total });
    run(progress).then(
      (result) => Object.assign(job, { state: 'done', phase: 'finished', result }),
      (err: { status?: number; code?: string; message?: string; details?: unknown }) =>
        Object.assign(job, {
          state: 'error',
          phase: 'failed',
          error: {
            status: err.status ?? 500,
            code: err.code ?? 'internal',
            message: err.message ?? 'The work failed.',
            details: err.details,
          },
        }),
    );
    return job;
  }

  /** The team's job with this id, as the client sees it; undefined for another team's. */
  get(teamId: string, id: string): Job | undefined {
    const entry = this.entries.get(id);
    return entry && entry.teamId === teamId ? entry.job : undefined;
  }

  private sweep() {
    const cutoff = Date.now() - KEEP_MS;
    for (const [id, { job, startedAt }] of this.entries) if (job.state !== 'running' && startedAt < cutoff) this.entries.delete(id);
  }
}
