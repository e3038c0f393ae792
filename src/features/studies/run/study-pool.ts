import type { StudyWorkerApi } from '../../../../workers/study.worker.ts';
import { createWorkerPool, type WorkerPool } from '../../../lib/worker-pool.ts';
import { studyWorkerCount } from './plan-batches.ts';

/**
 * The study workers: the app's generic pool (src/lib/worker-pool.ts) over `workers/study.worker.ts`,
 * created on first use, one worker per core (2–8), stopped after a minute idle. Cancelling a
 * study terminates the busy workers (the pool starts warm replacements).
 */
let pool: WorkerPool<StudyWorkerApi> | undefined;

export function studyPoolSize(): number {
  return studyWorkerCount(typeof navigator === 'undefined' ? undefined : navigator.hardwareConcurrency);
}

export function studyPool(): WorkerPool<StudyWorkerApi> {
  pool ??= createWorkerPool<StudyWorkerApi>({
    create: () => new Worker(new URL('../../../../workers/study.worker.ts', import.meta.url), { type: 'module', name: 'ridewright-study' }),
    size: studyPoolSize(),
    idleMs: 60_000,
    warm: (api) => api.ping(),
  });
  return pool;
}

/** Starts the workers ahead of a run (the study page calls it on mount), so the first batch does not wait for module loading. */
export function prewarmStudyPool(): void {
  studyPool().prewarm(studyPoolSize());
}
