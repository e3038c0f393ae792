import * as Comlink from 'comlink';
import { createStudyRunner, type StudyJobOutcome, type StudyRunContext, type StudyRunJob, type StudyRunner } from '../shared/study/run-jobs.ts';
import { warmUpStudyCode } from '../shared/study/warm-up.ts';

/**
 * Comlink shell around the study runner (shared/study/run-jobs.ts). One message runs a whole
 * batch of jobs and answers with their figures only (no traces), so a 400-run study costs a few
 * dozen messages. The runner, with its sampled roads, is kept while batches of the same study
 * run (`key`) keep coming.
 */
let current: { key: string; runner: StudyRunner } | undefined;
let warmed = false;

function warmUp(): void {
  if (warmed) return;
  warmed = true;
  warmUpStudyCode();
}

const api = {
  runBatch(key: string, context: StudyRunContext, jobs: StudyRunJob[]): { outcomes: StudyJobOutcome[]; workerMs: number } {
    const started = performance.now();
    if (current?.key !== key) current = { key, runner: createStudyRunner(context) };
    const outcomes = jobs.map((job) => current!.runner.run(job));
    return { outcomes, workerMs: performance.now() - started };
  },
  /**
   * Answers once the module has loaded, after one short run of the example corner so the
   * integrator and metrics are compiled before the first real batch (the first batches of a
   * cold worker otherwise run several times slower).
   */
  ping(): 'ready' {
    warmUp();
    return 'ready';
  },
};

export type StudyWorkerApi = typeof api;

Comlink.expose(api);
