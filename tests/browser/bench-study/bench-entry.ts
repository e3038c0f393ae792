import pipit from '../../../examples/pipit-front.setup.json';
import { Setup } from '../../../shared/schemas/setup.ts';
import { StudyDefinition } from '../../../shared/schemas/study.ts';
import { startStudyRun } from '../../../src/features/studies/run/run-study.ts';
import { prewarmStudyPool, studyPool, studyPoolSize } from '../../../src/features/studies/run/study-pool.ts';

/**
 * Page for `npm run bench:study`: the study run exactly as the study page starts it (same
 * batching, pool, worker, collector), without the React page around it. It records wall time,
 * how often progress moved, and the longest gap between main-thread timer ticks while it ran.
 */

export interface BenchResult {
  elapsedMs: number;
  runs: number;
  points: number;
  workers: number;
  progressEvents: number;
  /** Longest gap between 10 ms timer ticks during the run, ms: a measure of main-thread blocking. */
  longestGapMs: number;
  /** Longest wait between two progress updates, ms. */
  longestProgressGapMs: number;
  status: string;
}

const definitionOver = (seeds: number) => StudyDefinition.parse({
  name: 'Benchmark: damper scale × spring rate',
  base: { setupId: 'bench', revisionId: 'bench' },
  axes: [
    { parameter: 'damperScale', from: 0.5, to: 2, steps: 20 },
    { parameter: 'springRate', from: 20000, to: 44000, steps: 20 },
  ],
  roads: [{ source: 'inline', road: { kind: 'iso8608', name: 'ISO class C', class: 'C', seed: 7 } }],
  speeds: [20],
  duration: 60,
  objectives: [
    { figure: 'bodyAccelWkRms', weight: 1 },
    { figure: 'tyreLoadRatio', weight: 1 },
  ],
  constraints: { maxStrokeUsed: 0.9 },
  seeds,
});
const definition = definitionOver(1);
const baseSetup = Setup.parse(pipit);
const roads = definition.roads.map((r) => (r.source === 'inline' ? r.road : (null as never)));

/** One run of the study, each point over `seeds` road seeds (1: the plain 400-run study). */
async function run(seeds = 1): Promise<BenchResult> {
  let last = performance.now();
  let longestGapMs = 0;
  const timer = setInterval(() => {
    const now = performance.now();
    longestGapMs = Math.max(longestGapMs, now - last);
    last = now;
  }, 10);
  let progressEvents = 0;
  let lastProgress = performance.now();
  let longestProgressGapMs = 0;
  const started = performance.now();
  const handle = startStudyRun(
    { definition: definitionOver(seeds), baseSetup, roads },
    {
      onProgress: () => {
        const now = performance.now();
        longestProgressGapMs = Math.max(longestProgressGapMs, now - lastProgress);
        lastProgress = now;
        progressEvents++;
      },
    },
  );
  const end = await handle.done;
  const elapsedMs = performance.now() - started;
  clearInterval(timer);
  return { elapsedMs, runs: end.points.reduce((n, p) => n + p.runs.length, 0) + (end.base?.runs.length ?? 0), points: end.points.length, workers: end.workers, progressEvents, longestGapMs, longestProgressGapMs, status: end.status };
}

/** Waits until every worker of the pool has loaded its module (as the study page does on mount). */
async function warm(): Promise<number> {
  prewarmStudyPool();
  const size = studyPoolSize();
  await Promise.all(Array.from({ length: size }, () => studyPool().run((api) => api.ping())));
  return size;
}

declare global {
  interface Window {
    benchStudy: { warm: typeof warm; run: typeof run };
  }
}
window.benchStudy = { warm, run };
document.getElementById('status')!.textContent = 'ready';
