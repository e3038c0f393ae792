import { createStudyRunner, type StudyJobOutcome, type StudyRunContext, type StudyRunJob, type StudyRunner } from '../../shared/study/run-jobs.ts';
import { warmUpStudyCode } from '../../shared/study/warm-up.ts';

/**
 * One chunk's runs in a worker thread, through the same runner the browser's study worker uses
 * (shared/study/run-jobs.ts). The runner, with its sampled roads, is kept while chunks of the same
 * study keep coming to this thread.
 */
let current: { key: string; runner: StudyRunner } | undefined;
let warmed = false;

export interface ChunkTaskInput {
  key: string;
  context: StudyRunContext;
  jobs: StudyRunJob[];
}

export function runChunk(input: ChunkTaskInput): { outcomes: StudyJobOutcome[]; threadMs: number } {
  if (!warmed) {
    warmed = true;
    warmUpStudyCode();
  }
  const started = performance.now();
  if (current?.key !== input.key) current = { key: input.key, runner: createStudyRunner(input.context) };
  const runner = current.runner;
  return { outcomes: input.jobs.map((job) => runner.run(job)), threadMs: performance.now() - started };
}
