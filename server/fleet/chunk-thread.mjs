// Entry of a worker process's threads: registers tsx (as `node --import tsx` does for the
// process itself), then hands over the chunk task.
import { register } from 'tsx/esm/api';

register();
const task = await import('./chunk-task.ts');
export const { runChunk } = task;
