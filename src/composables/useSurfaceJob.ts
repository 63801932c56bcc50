import { onBeforeUnmount, ref, shallowRef } from 'vue';
import type { JobPhase, SurfaceJobPhase } from '@shared/schemas/jobs';
import type { Surface, SurfaceRequest } from '@shared/schemas/surfaces';
import { getJob } from '@/api/jobs';
import { startSurfaceJob } from '@/api/surfaces';
import type { LoadState } from '@/stores/session';
import { JOB_PHASE_LABELS } from '@/utils/jobPhases';

/** How often the run's progress is asked for: quick enough for a moving bar, light on the server. */
const POLL_MS = 400;

/**
 * The share of the whole run (percent, from → to) each phase of a surface job takes, in the server's order
 * (rough timings of demo runs); labels come from the one phase table.
 */
const SHARES: Partial<Record<JobPhase, [number, number]>> = {
  starting: [0, 2],
  'gathering wells': [2, 4],
  'building well profiles': [4, 8],
  interpolating: [8, 80],
  'cross-validating': [80, 90],
  contouring: [90, 95],
  saving: [95, 99],
  finished: [100, 100],
} satisfies Record<'starting' | SurfaceJobPhase | 'finished', [number, number]>;

/**
 * Overall progress of a run, 0…100, from the server's phase and its done/total; each phase restarts
 * its own count, so the bar would jump back without this.
 * @example runProgress({ phase: 'interpolating', done: 500, total: 1000 }) // { label: 'Interpolating the grid', percent: 44 }
 */
export function runProgress(job: { phase: JobPhase; done: number; total: number }): { label: string; percent: number } {
  const label = JOB_PHASE_LABELS[job.phase];
  const share = SHARES[job.phase];
  if (!share) return { label, percent: 0 };
  const [from, to] = share;
  const part = job.total > 0 ? Math.min(1, Math.max(0, job.done / job.total)) : 0;
  return { label, percent: Math.round(from + part * (to - from)) };
}

/**
 * Runs a surface in the background and follows its progress until it is stored or fails.
 * @example
 * const job = useSurfaceJob();
 * const surface = await job.run(teamId, prospectId, { wells: { from: 'prospect', bufferKm: 30 } });
 * job.percent.value // 0…100 while it runs
 */
export function useSurfaceJob() {
  const state = ref<LoadState>('idle');
  const phase = ref('');
  const percent = ref(0);
  const error = ref<string | null>(null);
  const result = shallowRef<Surface | null>(null);
  let stopped = false;

  onBeforeUnmount(() => {
    stopped = true;
  });

  async function run(teamId: string, prospectId: string, body: SurfaceRequest): Promise<Surface | null> {
    state.value = 'loading';
    phase.value = runProgress({ phase: 'starting', done: 0, total: 0 }).label;
    percent.value = 0;
    error.value = null;
    result.value = null;
    try {
      const { jobId } = await startSurfaceJob(teamId, prospectId, body);
      for (;;) {
        if (stopped) return null;
        const job = await getJob(teamId, jobId, 'surface');
        const progress = runProgress(job);
        phase.value = progress.label;
        if (job.state === 'error') throw new Error(job.error?.message ?? 'The surface run failed.');
        if (job.state === 'done' && job.result) {
          percent.value = 100;
          result.value = job.result;
          state.value = 'done';
          return job.result;
        }
        percent.value = Math.max(percent.value, Math.min(99, progress.percent));
        await new Promise((r) => setTimeout(r, POLL_MS));
      }
    } catch (e) {
      error.value = e instanceof Error ? e.message : String(e);
      state.value = 'error';
      return null;
    }
  }

  return { state, phase, percent, error, result, run };
}
