import { parentPort } from 'node:worker_threads';
import type { RunRequestInput } from '../shared/schemas/run.ts';
import { runCorner } from '../shared/sim/run-corner.ts';
import { createStudyRunner, type StudyRunJob } from '../shared/study/run-jobs.ts';
import { studyContext } from './problems.ts';

export type SweepMessage = { kind: 'single'; requests: RunRequestInput[] } | { kind: 'study'; jobs: StudyRunJob[] } | 'exit';

/** Runs its share of a sweep on request and reports one figure per run (traces stay here). */
parentPort!.on('message', (message: SweepMessage) => {
  if (message === 'exit') {
    parentPort!.close();
    return;
  }
  if (message.kind === 'single') {
    const results = message.requests.map((r) => {
      const out = runCorner(r);
      return out.ok ? { aw: out.result.metrics.bodyAccelWkRms, evals: out.result.timing.rhsEvaluations } : { error: out.reason };
    });
    parentPort!.postMessage(results);
    return;
  }
  // the study path as a study worker runs it: one runner per study run, the road sampled once
  const runner = createStudyRunner(studyContext());
  const results = message.jobs.map((job) => {
    const out = runner.run(job).run;
    return out.figures ? { aw: out.figures.bodyAccelWkRms, evals: 0 } : { error: out.error ?? 'failed' };
  });
  parentPort!.postMessage(results);
});
parentPort!.postMessage('ready');
