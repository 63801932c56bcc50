// Runs one surface computation off the main thread, so a large grid never stalls other requests.
import { parentPort, workerData } from 'node:worker_threads';
import { SurfaceInputError, computeSurface, type SurfaceInput } from '../../../shared/interpolation/surface';
import type { WorkerMessage } from './workerMessages';

const post = (message: WorkerMessage) => parentPort!.postMessage(message);

try {
  const result = computeSurface(workerData as SurfaceInput, (phase, done, total) => post({ type: 'progress', phase, done, total }));
  post({ type: 'done', result });
} catch (err) {
  post({ type: 'error', input: err instanceof SurfaceInputError, message: (err as Error).message });
}
