import type { DriveFitOutcome } from '../../../../shared/drive/fit-drive.ts';
import type { DriveFitRequestInput } from '../../../../shared/schemas/drive-fit.ts';
import { createWorkerPool, type WorkerPool } from '../../../lib/worker-pool.ts';
import type { DriveFitApi } from '../../../../workers/drive-fit.worker.ts';

let pool: WorkerPool<DriveFitApi> | undefined;

/** One worker: a fit already keeps a core busy, and a second fit at once is never asked for. */
function fitPool(): WorkerPool<DriveFitApi> {
  pool ??= createWorkerPool<DriveFitApi>({
    create: () => new Worker(new URL('../../../../workers/drive-fit.worker.ts', import.meta.url), { type: 'module', name: 'ridewright-drive-fit' }),
    size: 1,
    idleMs: 60_000,
  });
  return pool;
}

export type FitRunOutcome = DriveFitOutcome | { ok: false; cancelled: true; reason: string };

/** Runs one fit in the worker; the signal stops the computation itself. */
export async function runDriveFit(request: DriveFitRequestInput, signal?: AbortSignal): Promise<FitRunOutcome> {
  const outcome = await fitPool().run((api) => api.fit(request) as unknown as Promise<DriveFitOutcome>, { signal });
  if (outcome.status === 'done') return outcome.value;
  if (outcome.status === 'cancelled') return { ok: false, cancelled: true, reason: 'cancelled' };
  return { ok: false, reason: `The fit stopped: ${outcome.reason}` };
}
