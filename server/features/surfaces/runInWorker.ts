import { Worker } from 'node:worker_threads';
import type { SurfaceInput, SurfaceResult } from '../../../shared/interpolation/surface';
import { badRequest } from '../../lib/httpError';
import type { Progress } from '../../lib/jobs';
import { workerMessageSchema } from './workerMessages';

/** The worker is TypeScript, loaded through tsx by a small JavaScript entry (surface.worker.mjs). */
const WORKER_URL = new URL('./surface.worker.mjs', import.meta.url);

export function runSurfaceInWorker(input: SurfaceInput, progress: Progress): Promise<SurfaceResult> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(WORKER_URL, { workerData: input, execArgv: [] });
    worker.on('message', (raw: unknown) => {
      const parsed = workerMessageSchema.safeParse(raw);
      if (!parsed.success) {
        reject(new Error(`surface worker sent an unknown message: ${parsed.error.message}`));
        void worker.terminate();
        return;
      }
      const m = parsed.data;
      if (m.type === 'progress') progress(m.phase, m.done, m.total);
      else if (m.type === 'done') resolve(m.result);
      else reject(m.input ? badRequest('invalid_surface_input', m.message) : new Error(m.message));
    });
    worker.once('error', reject);
    worker.once('exit', (code) => {
      if (code !== 0) reject(new Error(`surface worker stopped with code ${code}`));
    });
  });
}
