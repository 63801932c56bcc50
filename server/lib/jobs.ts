import { randomUUID } from 'node:crypto';

export type JobState = 'running' | 'done' | 'error';

export interface Job {
  id: string;
  teamId: string;
  state: JobState;
  phase: string;
  done: number;
  total: number;
  result?: unknown;
  error?: { status: number; code: string; message: string; details?: unknown };
  startedAt: number;
}

export type Progress = (phase: string, done: number, total: number) => void;

const KEEP_MS = 30 * 60_000;

/** In-memory progress of long work (imports, surface runs), polled by the client; finished jobs are forgotten after 30 minutes. */
export class JobRegistry {
  private readonly jobs = new Map<string, Job>();

  start(teamId: string, run: (progress: Progress) => Promise<unknown>): Job {
    this.sweep();
    const job: Job = { id: randomUUID(), teamId, state: 'running', phase: 'starting', done: 0, total: 0, startedAt: Date.now() };
    this.jobs.set(job.id, job);
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

  get(teamId: string, id: string): Job | undefined {
    const job = this.jobs.get(id);
    return job && job.teamId === teamId ? job : undefined;
  }

  private sweep() {
    const cutoff = Date.now() - KEEP_MS;
    for (const [id, job] of this.jobs) if (job.state !== 'running' && job.startedAt < cutoff) this.jobs.delete(id);
  }
}
