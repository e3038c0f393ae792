import type { Road } from '../shared/schemas/road.ts';
import type { Setup } from '../shared/schemas/setup.ts';
import { createStudyRunner, type StudyJobOutcome, type StudyRunContext, type StudyRunJob } from '../shared/study/run-jobs.ts';

export interface StudyChunk {
  base: Setup;
  roads: Road[];
  duration: number;
  settleTime?: number;
  /** Sampled roads the runner keeps (see StudyRunContext.roadSlots). */
  roadSlots?: number;
  jobs: StudyRunJob[];
}

/** Runs one chunk of a study's jobs in a worker thread, with the browser workers' runner. */
export function runStudyChunk(chunk: StudyChunk): StudyJobOutcome[] {
  const ctx: StudyRunContext = { base: chunk.base, roads: chunk.roads, duration: chunk.duration, settleTime: chunk.settleTime, roadSlots: chunk.roadSlots };
  const runner = createStudyRunner(ctx);
  return chunk.jobs.map((job) => runner.run(job));
}
