// Entry of the study runner's worker threads: registers tsx (as `tsx cli/study.ts` does for
// the main thread), then hands over the task.
import { register } from 'tsx/esm/api';

register();
const task = await import('./study-task.ts');
export const { runStudyChunk } = task;
