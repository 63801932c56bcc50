import { onBeforeUnmount, ref, shallowRef } from 'vue';
import type { Surface, SurfaceRequest } from '@shared/schemas/surfaces';
import { getSurfaceJob, startSurfaceJob } from '@/api/surfaces';
import type { LoadState } from '@/stores/session';

/** How often the run's progress is asked for: quick enough for a moving bar, light on the server. */
const POLL_MS = 400;

/** The server's phases in order, with a label and the share of the whole run each takes (rough timings of demo runs). */
const PHASES: { key: string; label: string; from: number; to: number }[] = [
  { key: 'starting', label: 'Starting', from: 0, to: 2 },
  { key: 'gathering wells', label: 'Gathering wells', from: 2, to: 8 },
  { key: 'interpolating', label: 'Interpolating the grid', from: 8, to: 80 },
  { key: 'cross-validating', label: 'Cross-validating', from: 80, to: 90 },
  { key: 'contouring', label: 'Drawing contours', from: 90, to: 95 },
  { key: 'saving', label: 'Saving', from: 95, to: 99 },
  { key: 'finished', label: 'Finished', from: 100, to: 100 },
];

/**
 * Overall progress of a run, 0…100, from the server's phase and its done/total; each phase restarts
 * its own count, so the bar would jump back without this.
 * @example runProgress({ phase: 'interpolating', done: 500, total: 1000 }) // { label: 'Interpolating the grid', percent: 44 }
 */
export function runProgress(job: { phase: string; done: number; total: number }): { label: string; percent: number } {
  const p = PHASES.find((x) => x.key === job.phase);
  if (!p) return { label: job.phase, percent: 0 };
  const share = job.total > 0 ? Math.min(1, Math.max(0, job.done / job.total)) : 0;
  return { label: p.label, percent: Math.round(p.from + share * (p.to - p.from)) };
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
        const job = await getSurfaceJob(teamId, jobId);
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
