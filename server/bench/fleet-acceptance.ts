/**
 * `npm run bench:fleet-check`: issue 15's acceptance run on this machine. Redis on loopback, a
 * throwaway SQLite database with the demo workspace, two worker processes; one study of 2 000
 * points × 10 road seeds (20 000 runs plus the base setup's). Partway, one worker is killed with
 * SIGKILL and replaced; later the study is cancelled and started again. At the end it checks that
 * every point is stored once with its spread, and prints the times. `--points N`, `--seeds N`,
 * `--duration S` (default 20 s runs) change the size.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { StudyDefinition } from '../../shared/schemas/study.ts';
import { openDatabase } from '../db/database.ts';
import { migrateToLatest } from '../db/migrator.ts';
import { seedDemo } from '../db/seed/seed-demo.ts';
import { openFleetQueue } from '../fleet/index.ts';
import { cancelFleetRun, startFleetRun } from '../fleet/fleet.service.ts';
import { createStudy, getStudyJson } from '../studies/studies.service.ts';
import { demoEngineerRevision, startRedis, startWorker, type WorkerProcess } from './fleet-processes.ts';

const arg = (name: string, fallback: number) => {
  const i = process.argv.indexOf(name);
  return i >= 0 ? Number(process.argv[i + 1]) : fallback;
};
const POINTS = arg('--points', 2000);
const SEEDS = arg('--seeds', 10);
const DURATION = arg('--duration', 20);

const dir = mkdtempSync(join(tmpdir(), 'rw-fleet-check-'));
const dbFile = join(dir, 'fleet.sqlite');
const redis = await startRedis(dir);
const db = openDatabase(dbFile);
const queue = openFleetQueue(redis.url);
const workers: WorkerProcess[] = [];
const env = { REDIS_URL: redis.url, RIDEWRIGHT_DB: dbFile, DATABASE_URL: '' };
const say = (s: string) => console.log(`[${new Date().toISOString().slice(11, 19)}] ${s}`);

try {
  const migrated = await migrateToLatest(db);
  if (migrated.error) throw migrated.error;
  await seedDemo(db);
  const rev = await demoEngineerRevision(db);
  const ws = { workspaceId: rev.workspaceId };
  const actor = { id: rev.userId, name: rev.userName };
  const across = Math.round(Math.sqrt(POINTS * 1.25));
  const up = Math.round(POINTS / across);
  const definition = StudyDefinition.parse({
    name: `Fleet check: ${across * up} points × ${SEEDS} seeds`,
    base: { setupId: rev.setupId, revisionId: rev.revisionId },
    axes: [
      { parameter: 'reboundScale', from: 0.5, to: 1.8, steps: across },
      { parameter: 'compressionScale', from: 0.5, to: 1.8, steps: up },
    ],
    roads: [{ source: 'inline', road: { kind: 'iso8608', name: 'Class C lane', class: 'C', seed: 3, amplitudes: 'random' } }],
    speeds: [20],
    duration: DURATION,
    seeds: SEEDS,
    objectives: [{ figure: 'bodyAccelWkRms', weight: 1 }],
    constraints: {},
  });
  const made = await createStudy(db, ws, actor, { definition }, new Date());
  if (!made.ok) throw new Error(made.message);
  const studyId = made.value.id;
  const row = () => db.selectFrom('study_fleet_run').selectAll().where('study_id', '=', studyId).executeTakeFirstOrThrow();
  const stored = async () => Number((await db.selectFrom('study_point').select((eb) => eb.fn.countAll<number>().as('n')).where('study_id', '=', studyId).executeTakeFirstOrThrow()).n);
  const waitFor = async (test: (r: Awaited<ReturnType<typeof row>>) => boolean) => {
    for (;;) {
      const r = await row();
      if (r.state === 'failed') throw new Error(r.error ?? 'failed');
      if (test(r)) return r;
      await new Promise((res) => setTimeout(res, 200));
    }
  };

  for (let i = 0; i < 2; i++) workers.push(await startWorker(env));
  const t0 = performance.now();
  const started = await startFleetRun(db, queue, ws, actor, studyId, new Date());
  if (!started.ok) throw new Error(started.message);
  const total = (await row()).runs_total;
  say(`started: ${total} runs on 2 worker processes (load average ${loadavg()[0].toFixed(1)})`);

  await waitFor((r) => r.runs_done >= total * 0.3);
  const victim = workers.shift()!;
  await victim.kill('SIGKILL');
  say(`worker killed with SIGKILL at ${(await row()).runs_done} runs; ${await stored()} points stored`);
  workers.push(await startWorker(env));

  await waitFor((r) => r.runs_done >= total * 0.6);
  const cancelled = await cancelFleetRun(db, queue, ws, actor, studyId, new Date());
  if (!cancelled.ok) throw new Error(cancelled.message);
  const atCancel = await stored();
  await new Promise((res) => setTimeout(res, 1500));
  const afterCancel = await stored();
  say(`cancelled: ${atCancel} points stored at the cancel, ${afterCancel} 1.5 s later; state ${(await row()).state}`);
  const again = await startFleetRun(db, queue, ws, actor, studyId, new Date());
  if (!again.ok) throw new Error(again.message);
  say('started again');

  const done = await waitFor((r) => r.state === 'complete');
  const seconds = (performance.now() - t0) / 1000;
  const detail = await getStudyJson(db, ws, studyId);
  if (!detail.ok) throw new Error(detail.message);
  const study = JSON.parse(detail.value) as { points: { index: number; spread?: Record<string, { sd: number; min: number; max: number; n: number }>; figures: Record<string, number> }[]; results?: { compromise?: unknown } };
  const indices = new Set(study.points.map((p) => p.index));
  const withSpread = study.points.filter((p) => (p.spread?.bodyAccelWkRms?.n ?? 0) === SEEDS).length;
  const sds = study.points.map((p) => p.spread?.bodyAccelWkRms?.sd ?? NaN).filter(Number.isFinite).sort((a, b) => a - b);
  const rel = study.points.map((p) => (p.spread?.bodyAccelWkRms?.sd ?? NaN) / p.figures.bodyAccelWkRms).filter(Number.isFinite).sort((a, b) => a - b);
  say(`complete: ${done.runs_done} of ${total} runs counted, ${study.points.length} points (${indices.size} distinct, ${withSpread} with a ${SEEDS}-seed spread) in ${seconds.toFixed(0)} s = ${(total / seconds).toFixed(1)} runs/s`);
  say(`Wk-weighted body acceleration over seeds: sd median ${sds[sds.length >> 1]?.toFixed(4)} m/s², sd/mean median ${(100 * rel[rel.length >> 1]).toFixed(1)} % (range ${(100 * rel[0]).toFixed(1)}–${(100 * rel[rel.length - 1]).toFixed(1)} %)`);
  if (study.points.length !== across * up || indices.size !== across * up || withSpread !== across * up || done.runs_done !== total) {
    process.exitCode = 1;
    say('NOT WHOLE: a point is missing, doubled, or without its spread');
  }
} finally {
  await Promise.all(workers.map((w) => w.kill('SIGTERM')));
  await queue.close();
  await db.destroy();
  await redis.stop();
  rmSync(dir, { recursive: true, force: true });
}
