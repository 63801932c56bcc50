// Plain JavaScript entry for the surface worker thread: it registers tsx's loader in this thread, then
// loads the TypeScript worker (Node 20 does not take --import in a worker's execArgv).
import { register } from 'tsx/esm/api';

register();
await import('./surface.worker.ts');
