// Runs one surface computation off the main thread, so a large grid never stalls other requests.
import { parentPort, workerData } from 'node:worker_threads';
import { SurfaceInputError, computeSurface, type SurfaceInput } from './computeSurface';

try {
  const result = computeSurface(workerData as SurfaceInput, (phase, done, total) =>
    parentPort!.postMessage({ type: 'progress', phase, done, total }),
  );
  parentPort!.postMessage({ type: 'done', result });
} catch (err) {
  parentPort!.postMessage({ type: 'error', input: err instanceof SurfaceInputError, message: (err as Error).message });
}
