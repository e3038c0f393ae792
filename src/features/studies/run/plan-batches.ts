import type { StudyDefinition } from '../../../../shared/schemas/study.ts';
import type { StudyPointValues } from '../../../../shared/schemas/study-result.ts';
import { expandStudy, type StudyJob } from '../../../../shared/study/expand.ts';
import type { StudyRunJob } from '../../../../shared/study/run-jobs.ts';

/**
 * The jobs of a study cut into batches for the worker pool. The base setup's runs go first (the
 * trade-off chart marks the base from the start), then the points in sweep order. Batches are
 * large enough that messaging costs nothing next to the runs (a message per 2–12 runs), and
 * small enough that every worker gets several, so the pool stays busy to the end and progress
 * moves steadily.
 */
export interface BatchPlan {
  batches: StudyRunJob[][];
  totalRuns: number;
}

export const MAX_BATCH = 12;

export function batchSize(totalRuns: number, workers: number): number {
  return Math.max(1, Math.min(MAX_BATCH, Math.ceil(totalRuns / (Math.max(1, workers) * 6))));
}

export function planBatches(def: Pick<StudyDefinition, 'axes' | 'roads' | 'speeds'> & { seeds?: number }, workers: number): BatchPlan {
  const expanded = expandStudy(def);
  const runJob = (j: StudyJob, values: StudyPointValues): StudyRunJob => ({
    pointIndex: j.pointIndex,
    values,
    roadIndex: j.roadIndex,
    speed: j.speed,
    ...(j.seed !== undefined ? { seed: j.seed } : {}),
    ...(j.seedIndex !== undefined ? { seedIndex: j.seedIndex } : {}),
  });
  const jobs: StudyRunJob[] = [...expanded.baseJobs.map((j) => runJob(j, {})), ...expanded.jobs.map((j) => runJob(j, expanded.points[j.pointIndex].values))];
  const size = batchSize(jobs.length, workers);
  const batches: StudyRunJob[][] = [];
  for (let i = 0; i < jobs.length; i += size) batches.push(jobs.slice(i, i + size));
  return { batches, totalRuns: jobs.length };
}

/** Workers for a study: one per logical core the browser reports, at least 2 and at most 8. */
export function studyWorkerCount(hardwareConcurrency: number | undefined): number {
  return Math.min(8, Math.max(2, hardwareConcurrency ?? 2));
}
