import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FleetProgress, FleetStatus } from '../../shared/schemas/fleet.ts';
import { StudyDetail } from '../../shared/schemas/study-record.ts';
import { StudyDefinition } from '../../shared/schemas/study.ts';
import { runStudyHere } from '../../shared/study/run-all.ts';
import { type Db, openDatabase } from '../../server/db/database.ts';
import { migrateToLatest } from '../../server/db/migrator.ts';
import { openFleetQueue, type FleetQueue } from '../../server/fleet/index.ts';
import { createStudy } from '../../server/studies/studies.service.ts';
import { addMember, createUser, createWorkspace, sessionHeaders, type TestUser } from '../api/helpers/people.ts';
import { exampleSetup, insertSetup } from '../api/helpers/runs.ts';
import { createTestApp, type TestApp } from '../api/helpers/test-app.ts';
import { type RedisProcess, startRedis, startWorker, type WorkerProcess } from '../../server/bench/fleet-processes.ts';

// The team's workers with real processes: redis-server on loopback, two `npm run worker`
// processes on one SQLite file (WAL), the API in this process. Each study is checked point by
// point, figure by figure, against the same definition run in this thread (runStudyHere), and
// the run's counters against the plan, so a point lost or stored twice fails the test.

const dir = mkdtempSync(join(tmpdir(), 'rw-fleet-'));
const dbFile = join(dir, 'fleet.sqlite');
// chunks of about 0.06 s of estimated work, so a small study has several of them to lose
process.env.FLEET_CHUNK_MS = '60';
let redis: RedisProcess;
let db: Db;
let fleet: FleetQueue;
let t: TestApp;
let engineer: TestUser;
let ws: string;
let base: { setupId: string; revisionId: string };
let workers: WorkerProcess[] = [];

const workerEnv = () => ({ REDIS_URL: redis.url, RIDEWRIGHT_DB: dbFile, DATABASE_URL: '', FLEET_LOCK_MS: '2000', FLEET_CHECK_MS: '500', FLEET_CHUNK_MS: '60' });

beforeAll(async () => {
  redis = await startRedis(dir);
  db = openDatabase(dbFile);
  const migrated = await migrateToLatest(db);
  if (migrated.error) throw migrated.error;
  fleet = openFleetQueue(redis.url);
  t = await createTestApp({ db, fleet });
  engineer = await createUser(db, { name: 'Ines Okafor' });
  ws = await createWorkspace(db, 'Tallis & Brume ride group');
  await addMember(db, ws, engineer.id, 'engineer');
  const s = await insertSetup(db, ws, engineer.id, [exampleSetup()]);
  base = { setupId: s.setupId, revisionId: s.revisionIds[0] };
  workers = await Promise.all([startWorker(workerEnv()), startWorker(workerEnv())]);
}, 120_000);

afterAll(async () => {
  await Promise.all(workers.map((w) => w.kill('SIGKILL')));
  await t?.close();
  await fleet?.close();
  await db?.destroy();
  await redis?.stop();
  rmSync(dir, { recursive: true, force: true });
});

/** 20 × 20 points of 10 s on one class C road at 20 m/s, plus the base: 401 runs, under a second on one idle thread. */
const definition = (name: string) =>
  StudyDefinition.parse({
    name,
    base,
    axes: [
      { parameter: 'reboundScale', from: 0.6, to: 1.6, steps: 20 },
      { parameter: 'springRate', from: 24000, to: 40000, steps: 20 },
    ],
    roads: [{ source: 'inline', road: { kind: 'iso8608', name: 'Class C lane', class: 'C', seed: 11 } }],
    speeds: [20],
    duration: 10,
    objectives: [
      { figure: 'bodyAccelWkRms', weight: 1 },
      { figure: 'tyreLoadRatio', weight: 1 },
    ],
    constraints: { maxStrokeUsed: 0.9 },
  });

let reference: ReturnType<typeof runStudyHere> | undefined;

async function newStudy(name: string) {
  const made = await createStudy(db, { workspaceId: ws }, engineer, { definition: definition(name) }, new Date());
  if (!made.ok) throw new Error(made.message);
  reference ??= runStudyHere(made.value.definition, made.value.baseSetup, made.value.roads);
  return made.value.id;
}

const path = (studyId: string, rest = '') => `${t.url}/api/workspaces/${ws}/studies/${studyId}${rest}`;
async function call(method: string, url: string) {
  const res = await fetch(url, { method, headers: await sessionHeaders({ db, deps: t.deps }, engineer.id) });
  return { status: res.status, body: (await res.json()) as unknown };
}
const fleetRow = (studyId: string) => db.selectFrom('study_fleet_run').selectAll().where('study_id', '=', studyId).executeTakeFirstOrThrow();
const storedUnits = async (studyId: string) => (await db.selectFrom('study_point').select('idx').where('study_id', '=', studyId).execute()).map((r) => r.idx);

/** Polls a condition (the processes are real; there is nothing to await directly). */
async function until<T>(read: () => Promise<T>, done: (v: T) => boolean, what: string, timeoutMs = 120_000): Promise<T> {
  const end = Date.now() + timeoutMs;
  for (;;) {
    const v = await read();
    if (done(v)) return v;
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}: ${JSON.stringify(v)}`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

/** Every stored point equals the in-thread run's, figure by figure, and each unit was counted once. */
async function expectSameAsInThread(studyId: string) {
  const detail = StudyDetail.parse((await call('GET', path(studyId))).body);
  expect(detail.status).toBe('complete');
  expect(detail.points).toEqual(reference!.points);
  expect(detail.basePoint).toEqual(reference!.base);
  const row = await fleetRow(studyId);
  expect(row.state).toBe('complete');
  expect([row.units_done, row.runs_done]).toEqual([row.units_total, row.runs_total]);
  expect(row.runs_total).toBe(401);
  expect(detail.results?.savedRuns).toBe(401);
}

describe('studies on the team\'s workers, with real processes', () => {
  it('give the same figures as the same study run in one thread, streamed as they go', async () => {
    const id = await newStudy('Both ways');
    expect((await call('POST', path(id, '/fleet'))).status).toBe(202);
    const res = await fetch(path(id, '/fleet/events'), { headers: await sessionHeaders({ db, deps: t.deps }, engineer.id) });
    expect(res.headers.get('content-type')).toMatch(/text\/event-stream/);
    const events: FleetProgress[] = [];
    const text = await res.text(); // the stream ends by itself when the run is over
    for (const m of text.matchAll(/^data: (.*)$/gm)) events.push(FleetProgress.parse(JSON.parse(m[1])));
    expect(events.at(-1)?.state).toBe('complete');
    expect(events.at(-1)?.runsDone).toBe(401);
    expect(events.some((e) => e.state === 'running' && e.runsPerSecond !== null && e.runsPerSecond > 0)).toBe(true);
    await expectSameAsInThread(id);
  });

  it('lose nothing and store nothing twice when a worker is killed (SIGKILL) in the middle of a chunk', async () => {
    const id = await newStudy('Worker killed');
    const victim = workers[0];
    const took = victim.nextLine(new RegExp(`took chunk ${id}`));
    expect((await call('POST', path(id, '/fleet'))).status).toBe(202);
    const chunkId = (await took).split(' ').at(-1)!;
    victim.child.kill('SIGKILL');
    const chunk = Number(/\.c(\d+)$/.exec(chunkId)![1]);
    const storedAtKill = new Set(await storedUnits(id));
    const row = await fleetRow(id);
    // units in chunk order are the base (−1) then the points
    const held = Array.from({ length: row.chunk_units }, (_, i) => chunk * row.chunk_units + i).filter((pos) => pos < row.units_total).map((pos) => pos - 1);
    // the chunk it held was not stored when it died...
    expect(held.some((u) => storedAtKill.has(u))).toBe(false);
    await until(() => fleetRow(id), (r) => r.state === 'complete', 'the other worker to finish');
    // ...and is now, by the other worker, once
    expect(new Set(await storedUnits(id))).toEqual(new Set([-1, ...reference!.points.map((p) => p.index)]));
    await expectSameAsInThread(id);
    workers[0] = await startWorker(workerEnv());
  });

  it('lose nothing that was stored when Redis restarts empty in the middle of a study', async () => {
    const id = await newStudy('Redis restarted');
    expect((await call('POST', path(id, '/fleet'))).status).toBe(202);
    await until(() => fleetRow(id), (r) => r.units_done > 0, 'the first stored points');
    await redis.restart();
    const storedAtRestart = await storedUnits(id);
    expect(storedAtRestart.length).toBeLessThan(401);
    // the workers find the queue empty and the run unfinished, and queue its missing chunks again
    await until(() => fleetRow(id), (r) => r.state === 'complete', 'the study to finish after the restart');
    expect(await storedUnits(id)).toEqual(expect.arrayContaining(storedAtRestart));
    await expectSameAsInThread(id);
  });

  it('stop within the chunks in hand when cancelled, keep what finished, and go on from there when started again', async () => {
    const id = await newStudy('Cancelled and started again');
    expect((await call('POST', path(id, '/fleet'))).status).toBe(202);
    await until(() => fleetRow(id), (r) => r.units_done > 0, 'the first stored points');
    const cancelled = await call('POST', path(id, '/fleet/cancel'));
    expect(cancelled.status).toBe(200);
    const status = FleetStatus.parse(cancelled.body);
    expect(status.run?.state).toBe('cancelled');
    const kept = await storedUnits(id);
    expect(kept.length).toBe(status.run?.unitsDone);
    expect(kept.length).toBeLessThan(401);
    await until(() => fleet.pendingCount(), (n) => n === 0, 'the queue to empty');
    // the chunks that were running when it was cancelled stored nothing
    expect((await storedUnits(id)).length).toBe(kept.length);
    const partial = StudyDetail.parse((await call('GET', path(id))).body);
    expect(partial.status).toBe('partial');
    expect(partial.results?.savedPoints).toBe(kept.filter((u) => u >= 0).length);

    expect((await call('POST', path(id, '/fleet'))).status).toBe(202);
    await until(() => fleetRow(id), (r) => r.state === 'complete', 'the second start to finish');
    await expectSameAsInThread(id);
  });

  it('fail the study with the reason, without retrying, when its input cannot be run', async () => {
    const id = await newStudy('Damaged input');
    await db.updateTable('study').set({ base_document: '{"sprungMass":"heavy"}' }).where('id', '=', id).execute();
    expect((await call('POST', path(id, '/fleet'))).status).toBe(202);
    const row = await until(() => fleetRow(id), (r) => r.state !== 'running', 'the study to stop');
    expect(row.state).toBe('failed');
    expect(row.error).toMatch(/^Part \d+ of the study failed: The study's stored input cannot be read: Stored study base setup does not match its schema/);
    const status = FleetStatus.parse((await call('GET', path(id, '/fleet'))).body);
    expect(status.run?.error).toBe(row.error);
    await until(() => fleet.pendingCount(), (n) => n === 0, 'the queue to empty');
    expect(await storedUnits(id)).toEqual([]);
  });
});
