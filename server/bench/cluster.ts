/**
 * `npm run bench:cluster`: the team's workers on this machine. Starts redis-server on loopback,
 * a throwaway SQLite database with the demo workspace, then runs one study with one worker
 * process and again with two (one thread each), and prints runs per second, the scaling
 * efficiency, the cost per chunk beyond its runs, the per-thread rate against the in-process
 * study path, and an estimate for a 10⁶-run study on 20 machines of 16 cores. Nothing is
 * asserted; timings depend on the machine and what else runs on it. `--points N` (default 400).
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { StudyDefinition } from '../../shared/schemas/study.ts';
import { expandStudy } from '../../shared/study/expand.ts';
import { createStudyRunner } from '../../shared/study/run-jobs.ts';
import { warmUpStudyCode } from '../../shared/study/warm-up.ts';
import { openDatabase } from '../db/database.ts';
import { migrateToLatest } from '../db/migrator.ts';
import { seedDemo } from '../db/seed/seed-demo.ts';
import { openFleetQueue } from '../fleet/index.ts';
import { startFleetRun } from '../fleet/fleet.service.ts';
import { createStudy } from '../studies/studies.service.ts';
import { Setup } from '../../shared/schemas/setup.ts';
import { demoEngineerRevision, startRedis, startWorker, type WorkerProcess } from './fleet-processes.ts';

const arg = (name: string, fallback: number) => {
  const i = process.argv.indexOf(name);
  return i >= 0 ? Number(process.argv[i + 1]) : fallback;
};
const POINTS = arg('--points', 400);
// Chunks of a fifth of the design size, so that two workers share a dozen or more of them.
process.env.FLEET_CHUNK_MS ??= '200';
const DURATION = 60;

const dir = mkdtempSync(join(tmpdir(), 'rw-cluster-'));
const dbFile = join(dir, 'cluster.sqlite');
const redis = await startRedis(dir);
const db = openDatabase(dbFile);
const queue = openFleetQueue(redis.url);
const workers: WorkerProcess[] = [];

try {
  const migrated = await migrateToLatest(db);
  if (migrated.error) throw migrated.error;
  await seedDemo(db);
  const rev = await demoEngineerRevision(db);
  const side = Math.round(Math.sqrt(POINTS));
  const def = (name: string) =>
    StudyDefinition.parse({
      name,
      base: { setupId: rev.setupId, revisionId: rev.revisionId },
      axes: [
        { parameter: 'reboundScale', from: 0.6, to: 1.6, steps: side },
        { parameter: 'compressionScale', from: 0.6, to: 1.6, steps: side },
      ],
      roads: [{ source: 'inline', road: { kind: 'iso8608', name: 'Class C lane', class: 'C', seed: 3 } }],
      speeds: [20],
      duration: DURATION,
      objectives: [{ figure: 'bodyAccelWkRms', weight: 1 }],
      constraints: {},
    });

  // The in-process study path on one thread, as the browser's study worker runs it.
  const reference = def('in-process');
  const base = Setup.parse(JSON.parse(rev.document));
  const expanded = expandStudy(reference);
  warmUpStudyCode();
  const runner = createStudyRunner({ base, roads: reference.roads.map((r) => (r.source === 'inline' ? r.road : null!)), duration: DURATION });
  const sample = expanded.jobs.slice(0, Math.min(120, expanded.jobs.length));
  const t0 = performance.now();
  for (const j of sample) runner.run({ ...j, values: expanded.points[j.pointIndex].values });
  const inProcessMs = (performance.now() - t0) / sample.length;
  console.error(`in-process: ${inProcessMs.toFixed(2)} ms per ${DURATION} s run on one thread`);

  const trial = async (n: number) => {
    while (workers.length < n) workers.push(await startWorker({ REDIS_URL: redis.url, RIDEWRIGHT_DB: dbFile, DATABASE_URL: '', FLEET_LOG_CHUNKS: '1' }));
    const made = await createStudy(db, { workspaceId: rev.workspaceId }, { id: rev.userId, name: rev.userName }, { definition: def(`${n} worker(s)`) }, new Date());
    if (!made.ok) throw new Error(made.message);
    const started = performance.now();
    const s = await startFleetRun(db, queue, { workspaceId: rev.workspaceId }, { id: rev.userId, name: rev.userName }, made.value.id, new Date());
    if (!s.ok) throw new Error(s.message);
    for (;;) {
      const row = await db.selectFrom('study_fleet_run').selectAll().where('study_id', '=', made.value.id).executeTakeFirstOrThrow();
      if (row.state === 'complete' || row.state === 'failed') {
        if (row.state === 'failed') throw new Error(row.error ?? 'failed');
        const seconds = (performance.now() - started) / 1000;
        console.error(`${n} worker(s): ${row.runs_total} runs in ${seconds.toFixed(2)} s, ${row.chunks} chunks`);
        return { seconds, runs: row.runs_total, chunks: row.chunks };
      }
      await new Promise((r) => setTimeout(r, 25));
    }
  };
  // a first study warms the workers' threads (tsx, the integrator) before anything is timed
  await trial(1);
  for (const w of workers) w.lines.length = 0;
  const one = await trial(1);
  const two = await trial(2);
  const rate1 = one.runs / one.seconds;
  const rate2 = two.runs / two.seconds;
  const efficiency = rate2 / (2 * rate1);
  const perChunkOverheadMs = ((one.seconds * 1000) - one.runs * inProcessMs) / one.chunks;
  // measured inside the workers: a chunk's time in the worker beyond its runs on the thread
  const timings = workers.flatMap((w) => w.lines.flatMap((l) => {
    const m = /stored: ([\d.]+) ms in the worker, ([\d.]+) ms of runs/.exec(l);
    return m ? [{ worker: Number(m[1]), thread: Number(m[2]) }] : [];
  }));
  const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] ?? NaN;
  const inWorkerOverhead = median(timings.map((x) => x.worker - x.thread));
  const threadMsPerRun = timings.reduce((a, x) => a + x.thread, 0) / Math.max(1, timings.length) / (one.runs / one.chunks);
  const workerMsPerRun = 1000 / rate1;

  // 10⁶ runs on 20 machines × 16 cores, at this machine's per-thread rate and the two-process efficiency
  const cores = 20 * 16;
  const fleetRate = cores * rate1 * Math.min(1, efficiency);
  const runsPerChunk = one.runs / one.chunks;
  const chunksPerSecond = fleetRate / runsPerChunk;
  // per chunk: add, take (move to active), lock renewals (one per 15 s, none for a 1 s chunk), finish and take the next;
  // BullMQ does each in one Lua script of a few commands: about 10 Redis commands per chunk, counted generously
  const redisOps = chunksPerSecond * 10;
  const rows: [string, string][] = [
    ['in-process study path, one thread', `${inProcessMs.toFixed(2)} ms per ${DURATION} s run`],
    ['one worker process (1 thread)', `${rate1.toFixed(1)} runs/s (${workerMsPerRun.toFixed(2)} ms per run, ${((workerMsPerRun / inProcessMs - 1) * 100).toFixed(1)} % over in-process)`],
    ['two worker processes (1 thread each)', `${rate2.toFixed(1)} runs/s`],
    ['scaling efficiency 1 → 2 processes', `${(efficiency * 100).toFixed(0)} %`],
    ['worker thread, ms per run (all chunks)', `${threadMsPerRun.toFixed(2)} ms (${((threadMsPerRun / inProcessMs - 1) * 100).toFixed(1)} % over in-process)`],
    ['in the worker beyond the runs, per chunk (median)', `${inWorkerOverhead.toFixed(1)} ms (clone, judge, one transaction)`],
    ['wall time beyond in-process runs, per chunk', `${perChunkOverheadMs.toFixed(0)} ms (${one.chunks} chunks of ${runsPerChunk.toFixed(0)} runs; includes load from others)`],
    ['10⁶ runs on 20 × 16 cores', `${fleetRate.toFixed(0)} runs/s → ${(1e6 / fleetRate / 60).toFixed(1)} min`],
    ['  chunks per second at that rate', chunksPerSecond.toFixed(0)],
    ['  Redis commands per second (≈10 per chunk)', redisOps.toFixed(0)],
    ['  database transactions per second (1 per chunk)', chunksPerSecond.toFixed(0)],
  ];
  console.log(`\nbench:cluster on this machine (2 cores, shared; load average now ${loadavg()[0].toFixed(1)})`);
  for (const [k, v] of rows) console.log(`  ${k.padEnd(48)} ${v}`);
} finally {
  await Promise.all(workers.map((w) => w.kill('SIGTERM')));
  await queue.close();
  await db.destroy();
  await redis.stop();
  rmSync(dir, { recursive: true, force: true });
}
