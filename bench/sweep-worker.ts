import { parentPort } from 'node:worker_threads';
import type { RunRequestInput } from '../shared/schemas/run.ts';
import { runCorner } from '../shared/sim/run-corner.ts';

/** Runs its share of a sweep on request and reports one figure per run (traces stay here). */
parentPort!.on('message', (requests: RunRequestInput[] | 'exit') => {
  if (requests === 'exit') {
    parentPort!.close();
    return;
  }
  const results = requests.map((r) => {
    const out = runCorner(r);
    return out.ok ? { aw: out.result.metrics.bodyAccelWkRms, evals: out.result.timing.rhsEvaluations } : { error: out.reason };
  });
  parentPort!.postMessage(results);
});
parentPort!.postMessage('ready');
