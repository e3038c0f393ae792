/**
 * Headless study runner: every point of a study over its roads and speeds, with the pure code the
 * browser's study workers run, spread over worker threads (one per core unless --threads).
 *
 *   npm run --silent study -- --study S.json [--out results.json] [--threads N]
 *
 * Prints one JSON object on stdout (and writes it to --out when given): the points with their
 * runs, figures and limits, the base setup's point, the comfort/grip front and the best
 * compromise, as the browser shows them. Exit status: 0 done, 2 bad input (the message on
 * stderr names the field or the line of the file). The file format is in cli/study-input.ts.
 */
import { availableParallelism } from 'node:os';
import { writeFileSync } from 'node:fs';
import { parseArgs } from 'node:util';
import { Piscina } from 'piscina';
import { createPointCollector, studyRoadNames } from '../shared/study/collect.ts';
import { expandStudy } from '../shared/study/expand.ts';
import { studyRoadSlots, type StudyJobOutcome, type StudyRunJob } from '../shared/study/run-jobs.ts';
import { studyBestCompromise, studyTradeOff } from '../shared/study/study-compromise.ts';
import { readStudyFile, StudyInputError } from './study-input.ts';
import type { StudyChunk } from './study-task.ts';

/** Jobs of one point stay together so a worker builds each point's setup once. */
function chunksOf(jobs: StudyRunJob[], threads: number): StudyRunJob[][] {
  const byPoint = new Map<number, StudyRunJob[]>();
  for (const job of jobs) byPoint.set(job.pointIndex, [...(byPoint.get(job.pointIndex) ?? []), job]);
  const groups = [...byPoint.values()];
  // A few chunks per thread evens out points that take longer than others.
  const per = Math.max(1, Math.ceil(groups.length / (threads * 4)));
  const chunks: StudyRunJob[][] = [];
  for (let i = 0; i < groups.length; i += per) chunks.push(groups.slice(i, i + per).flat());
  return chunks;
}

function threadsArg(value: string | undefined): number {
  if (value === undefined) return availableParallelism();
  const n = Number(value);
  if (!Number.isInteger(n) || n < 1 || n > 64) throw new StudyInputError(`--threads: "${value}" is not a whole number from 1 to 64`);
  return n;
}

async function main(argv: string[]): Promise<number> {
  const { values } = parseArgs({ args: argv, options: { study: { type: 'string' }, out: { type: 'string' }, threads: { type: 'string' } }, strict: true, allowPositionals: false });
  if (!values.study) throw new StudyInputError('--study is required');
  const threads = threadsArg(values.threads);
  const { definition, baseSetup, roads } = readStudyFile(values.study);

  const started = performance.now();
  const expanded = expandStudy(definition);
  const jobs: StudyRunJob[] = [...expanded.jobs, ...expanded.baseJobs].map((job) => ({ ...job, values: job.pointIndex === -1 ? {} : expanded.points[job.pointIndex].values }));
  const chunks = chunksOf(jobs, threads);
  const pool = new Piscina({ filename: new URL('./study-worker.mjs', import.meta.url).href, minThreads: 0, maxThreads: Math.min(threads, chunks.length), idleTimeout: 1000 });
  let outcomes: StudyJobOutcome[][];
  try {
    outcomes = await Promise.all(
      chunks.map((chunkJobs) => {
        const chunk: StudyChunk = { base: baseSetup, roads, duration: definition.duration, settleTime: definition.settleTime, roadSlots: studyRoadSlots(definition), jobs: chunkJobs };
        return pool.run(chunk, { name: 'runStudyChunk' }) as Promise<StudyJobOutcome[]>;
      }),
    );
  } finally {
    await pool.destroy();
  }

  const collector = createPointCollector(definition, expanded, studyRoadNames(definition, roads));
  for (const out of outcomes.flat()) collector.add(out.pointIndex, out.run, out.setupError);
  const points = collector.points();
  const base = collector.base();
  const report = {
    study: definition.name,
    setup: baseSetup.name,
    runs: jobs.length,
    threads: Math.min(threads, chunks.length),
    elapsedMs: Math.round(performance.now() - started),
    points,
    base,
    front: points.length > 0 ? studyTradeOff(definition, points, base) : null,
    bestCompromise: points.length > 0 ? studyBestCompromise(definition, points, undefined, base) : null,
  };
  const text = JSON.stringify(report, null, 2) + '\n';
  if (values.out) writeFileSync(values.out, text);
  process.stdout.write(text);
  return 0;
}

try {
  process.exitCode = await main(process.argv.slice(2));
} catch (e) {
  if (e instanceof StudyInputError || (e as { code?: string }).code?.startsWith('ERR_PARSE_ARGS')) {
    process.stderr.write(`study: ${(e as Error).message}\n`);
    process.exitCode = 2;
  } else {
    throw e;
  }
}
