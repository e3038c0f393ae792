import type { Road } from '../../../../shared/schemas/road.ts';
import type { Setup } from '../../../../shared/schemas/setup.ts';
import type { StudyFigures } from '../../../../shared/schemas/study.ts';
import type { StudyPointResult, StudyRunOutcome } from '../../../../shared/schemas/study-result.ts';
import { ensembleFigures } from '../../../../shared/study/ensemble.ts';
import type { StudyJobOutcome, StudyRunContext, StudyRunJob } from '../../../../shared/study/run-jobs.ts';
import { ensembleSeed } from '../../../../shared/study/seeds.ts';
import { studyPool, studyPoolSize } from './study-pool.ts';

/**
 * One run repeated over N road seeds in the study workers: the same runner, seeds and
 * statistics as a study point over N seeds, so the figures agree with a one-point study.
 */
export interface SeedRepeatInput {
  setup: Setup;
  road: Road;
  /** m/s */
  speed: number;
  /** s */
  duration: number;
  /** s; absent: the study default for the road. */
  settleTime?: number;
  /** The run's seed when it replaced the road's own. */
  seed?: number;
  seeds: number;
}

export interface SeedRepeatResult {
  runs: StudyRunOutcome[];
  /** Mean over the seeds whose run succeeded, with the spread. */
  figures: StudyFigures;
  spread: NonNullable<StudyPointResult['spread']>;
  /** The seed each run used, in seed order. */
  roadSeeds: number[];
  failed: number;
  elapsedMs: number;
  workers: number;
}

/** The jobs of the repeat, one per seed, in seed order. */
export function seedRepeatJobs(input: Pick<SeedRepeatInput, 'speed' | 'seed' | 'seeds'>): StudyRunJob[] {
  return Array.from({ length: input.seeds }, (_, k) => ({ pointIndex: 0, values: {}, roadIndex: 0, speed: input.speed, seedIndex: k, ...(input.seed !== undefined ? { seed: input.seed } : {}) }));
}

/** Folds the repeat's outcomes (any order) into the seed statistics. */
export function summariseSeedRepeat(input: Pick<SeedRepeatInput, 'road' | 'seed' | 'seeds'>, outcomes: readonly StudyJobOutcome[]): Omit<SeedRepeatResult, 'elapsedMs' | 'workers'> {
  const runs = outcomes.map((o) => o.run).sort((a, b) => (a.seedIndex ?? 0) - (b.seedIndex ?? 0));
  const { figures, spread } = ensembleFigures(runs, 'mean', input.seeds);
  const own = input.road.kind === 'iso8608' ? (input.seed ?? input.road.seed) : 0;
  return { runs, figures, spread: spread ?? {}, roadSeeds: runs.map((r) => ensembleSeed(own, r.seedIndex ?? 0)), failed: runs.filter((r) => !r.figures).length };
}

let counter = 0;

/** Runs the repeat spread over the study workers; `signal` stops it. */
export async function runOverSeeds(input: SeedRepeatInput, signal?: AbortSignal): Promise<SeedRepeatResult | null> {
  const started = performance.now();
  const workers = studyPoolSize();
  const jobs = seedRepeatJobs(input);
  const size = Math.max(1, Math.ceil(jobs.length / workers));
  const context: StudyRunContext = { base: input.setup, roads: [input.road], duration: input.duration, settleTime: input.settleTime };
  const key = `seed-repeat-${Date.now()}-${++counter}`;
  const pool = studyPool();
  const batches: StudyRunJob[][] = [];
  for (let i = 0; i < jobs.length; i += size) batches.push(jobs.slice(i, i + size));
  const outcomes = await Promise.all(batches.map((batch) => pool.run((api) => api.runBatch(key, context, batch) as unknown as Promise<{ outcomes: StudyJobOutcome[] }>, { signal })));
  if (outcomes.some((o) => o.status !== 'done')) {
    const failed = outcomes.find((o) => o.status === 'failed');
    if (failed && failed.status === 'failed') throw new Error(failed.reason);
    return null;
  }
  const all = outcomes.flatMap((o) => (o.status === 'done' ? o.value.outcomes : []));
  return { ...summariseSeedRepeat(input, all), elapsedMs: performance.now() - started, workers };
}
