import type { Road } from '../../../../shared/schemas/road.ts';
import type { Setup } from '../../../../shared/schemas/setup.ts';
import type { StudyDefinition } from '../../../../shared/schemas/study.ts';
import type { StudyPointResult } from '../../../../shared/schemas/study-result.ts';
import { createPointCollector, studyRoadNames } from '../../../../shared/study/collect.ts';
import { expandStudy } from '../../../../shared/study/expand.ts';
import { studyRoadSlots, type StudyJobOutcome, type StudyRunContext } from '../../../../shared/study/run-jobs.ts';
import { planBatches } from './plan-batches.ts';
import { studyPool, studyPoolSize } from './study-pool.ts';

/**
 * One run of a study in the browser: every job goes to the worker pool in batches; outcomes
 * are grouped into points as they return (the shared collector, the same code the server judges
 * saved points with). The main thread only files results: no simulation, no Pareto work until
 * the end. Cancelling stops the workers at once and keeps every point already finished.
 */

export interface StudyRunInput {
  definition: StudyDefinition;
  baseSetup: Setup;
  roads: Road[];
}

export interface StudyProgress {
  doneRuns: number;
  totalRuns: number;
  donePoints: number;
  totalPoints: number;
  elapsedMs: number;
  /** Runs per second so far; null before the first batch returns. */
  rate: number | null;
  /** Seconds to the end at the current rate; null until there is a rate. */
  secondsLeft: number | null;
}

export interface StudyRunEnd {
  status: 'complete' | 'cancelled';
  points: StudyPointResult[];
  base: StudyPointResult | null;
  elapsedMs: number;
  workers: number;
}

export interface StudyRunHandlers {
  /** After each batch (a few times a second at most per worker). */
  onProgress?: (p: StudyProgress) => void;
  /** Points that just became complete, in the order they finished. */
  onPoints?: (points: StudyPointResult[]) => void;
}

export interface StudyRunHandle {
  done: Promise<StudyRunEnd>;
  cancel(): void;
}

let runCounter = 0;

export function startStudyRun(input: StudyRunInput, handlers: StudyRunHandlers = {}): StudyRunHandle {
  const { definition: def } = input;
  const workers = studyPoolSize();
  const plan = planBatches(def, workers);
  const expanded = expandStudy(def);
  const collector = createPointCollector(def, expanded, studyRoadNames(def, input.roads));
  const context: StudyRunContext = { base: input.baseSetup, roads: input.roads, duration: def.duration, settleTime: def.settleTime, roadSlots: studyRoadSlots(def) };
  // Workers keep one runner per key: a new key per run, so a changed definition never reuses stale roads.
  const key = `study-run-${Date.now()}-${++runCounter}`;
  const controller = new AbortController();
  const started = performance.now();
  let doneRuns = 0;
  let donePoints = 0;

  const file = (outcomes: StudyJobOutcome[]) => {
    const finished: StudyPointResult[] = [];
    for (const o of outcomes) {
      const point = collector.add(o.pointIndex, o.run, o.setupError);
      if (point) finished.push(point);
    }
    doneRuns += outcomes.length;
    donePoints += finished.filter((p) => p.index >= 0).length;
    const elapsedMs = performance.now() - started;
    const rate = doneRuns > 0 && elapsedMs > 0 ? (1000 * doneRuns) / elapsedMs : null;
    if (finished.length) handlers.onPoints?.(finished);
    handlers.onProgress?.({
      doneRuns,
      totalRuns: plan.totalRuns,
      donePoints,
      totalPoints: expanded.points.length,
      elapsedMs,
      rate,
      secondsLeft: rate ? (plan.totalRuns - doneRuns) / rate : null,
    });
  };

  handlers.onProgress?.({ doneRuns: 0, totalRuns: plan.totalRuns, donePoints: 0, totalPoints: expanded.points.length, elapsedMs: 0, rate: null, secondsLeft: null });
  const pool = studyPool();
  const batches = plan.batches.map((jobs) =>
    pool.run((api) => api.runBatch(key, context, jobs) as unknown as Promise<{ outcomes: StudyJobOutcome[] }>, { signal: controller.signal }).then((outcome) => {
      if (outcome.status === 'done') file(outcome.value.outcomes);
      // A worker that died fails its runs, honestly, instead of leaving the study waiting.
      else if (outcome.status === 'failed') file(jobs.map((j) => ({ pointIndex: j.pointIndex, run: { roadIndex: j.roadIndex, speed: j.speed, figures: null, error: `the worker stopped: ${outcome.reason}` } })));
    }),
  );

  const done = Promise.all(batches).then(
    (): StudyRunEnd => ({
      status: doneRuns === plan.totalRuns ? 'complete' : 'cancelled',
      points: collector.points(),
      base: collector.base(),
      elapsedMs: performance.now() - started,
      workers,
    }),
  );
  return { done, cancel: () => controller.abort() };
}
