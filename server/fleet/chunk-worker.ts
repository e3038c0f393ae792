import { UnrecoverableError } from 'bullmq';
import type { Piscina } from 'piscina';
import { Setup } from '../../shared/schemas/setup.ts';
import type { StudyDefinition } from '../../shared/schemas/study.ts';
import type { StudyPointResult, StudyRunOutcome } from '../../shared/schemas/study-result.ts';
import { judgeUploadedPoint, studyRoadNames } from '../../shared/study/collect.ts';
import { studyRoadSlots, type StudyJobOutcome, type StudyRunContext, type StudyRunJob } from '../../shared/study/run-jobs.ts';
import { readStored } from '../core/stored-json.ts';
import type { Db } from '../db/database.ts';
import { closeStudyRunInTx, definitionOf, findStudy, insertStudyPointsOnce, studyPointRow, studyRoadsOf } from '../studies/index.ts';
import { chunkUnitsOf, fleetPlan, type FleetPlan } from './chunk-plan.ts';
import type { ChunkTaskInput } from './chunk-task.ts';
import type { ChunkJob, FinishJob, FleetQueue } from './fleet-queue.ts';
import { addDone, claimRunningRun, findFleetRun, moveFleetRun } from './fleet.repository.ts';

/**
 * What a worker process does with a job: a chunk's runs go to the thread pool, come back as
 * whole points judged by the shared code, and are stored in one transaction that inserts only
 * points not stored yet and refuses the write once the run is stopped. The chunk that stores the
 * last point queues the close, which ranks the points and marks the study complete.
 */
export interface ChunkDeps {
  db: Db;
  queue: FleetQueue;
  pool: Piscina;
  now: () => Date;
}

interface StudyContext {
  def: StudyDefinition;
  plan: FleetPlan;
  roadNames: string[];
  run: StudyRunContext;
}

const contexts = new Map<string, StudyContext>();

/** Input the study cannot be run with fails its chunk for good: a retry would meet the same input. */
async function contextOf(db: Db, job: ChunkJob): Promise<StudyContext> {
  const key = `${job.studyId}.${job.generation}`;
  const hit = contexts.get(key);
  if (hit) return hit;
  const row = await findStudy(db, job.workspaceId, job.studyId);
  if (!row) throw new UnrecoverableError('The study was deleted while it ran.');
  let made: StudyContext;
  try {
    const def = definitionOf(row);
    const roads = await studyRoadsOf(db, row, def);
    const base = readStored(Setup, row.base_document, 'study base setup');
    made = { def, plan: fleetPlan(def), roadNames: studyRoadNames(def, roads), run: { base, roads, duration: def.duration, settleTime: def.settleTime, roadSlots: studyRoadSlots(def) } };
  } catch (err) {
    throw new UnrecoverableError(`The study's stored input cannot be read: ${(err as Error).message}`);
  }
  if (contexts.size >= 8) contexts.delete(contexts.keys().next().value!);
  contexts.set(key, made);
  return made;
}

/** The chunk's points, judged as the browser's collector judges them. */
function pointsOf(ctx: StudyContext, units: number[], outcomes: StudyJobOutcome[]): StudyPointResult[] {
  const byUnit = new Map<number, { runs: StudyRunOutcome[]; setupError?: string }>();
  for (const o of outcomes) {
    const entry = byUnit.get(o.pointIndex) ?? { runs: [] };
    entry.runs.push(o.run);
    if (o.setupError) entry.setupError = o.setupError;
    byUnit.set(o.pointIndex, entry);
  }
  return units.map((index) => {
    const judged = judgeUploadedPoint(ctx.def, ctx.plan.plan, undefined, { index, ...(byUnit.get(index) ?? { runs: [] }) }, ctx.roadNames, `point ${index}`);
    if (!judged.ok) throw new UnrecoverableError(`Point ${index} came back incomplete: ${judged.issues[0].message}`);
    return judged.point;
  });
}

/** How the chunk ended, with the ms its runs took on the thread (the rest of its time is queue, clone and storage). */
export type ChunkResult = { outcome: 'stored' | 'stopped'; threadMs: number };

export async function processChunk(deps: ChunkDeps, job: ChunkJob): Promise<ChunkResult> {
  const run = await findFleetRun(deps.db, job.studyId);
  if (!run || run.generation !== job.generation || run.state !== 'running') return { outcome: 'stopped', threadMs: 0 };
  const ctx = await contextOf(deps.db, job);
  const units = chunkUnitsOf({ ...ctx.plan, chunkUnits: run.chunk_units }, job.chunk);
  const jobs: StudyRunJob[] = units.flatMap((u) =>
    (ctx.plan.plan.jobsOf(u) ?? []).map((j) => ({ pointIndex: u, values: ctx.plan.plan.valuesOf(u) ?? {}, roadIndex: j.roadIndex, speed: j.speed, ...(j.seed !== undefined ? { seed: j.seed } : {}), ...(j.seedIndex !== undefined ? { seedIndex: j.seedIndex } : {}) })),
  );
  const input: ChunkTaskInput = { key: `${job.studyId}.${job.generation}`, context: ctx.run, jobs };
  const { outcomes, threadMs } = (await deps.pool.run(input, { name: 'runChunk' })) as { outcomes: StudyJobOutcome[]; threadMs: number };
  const rows = pointsOf(ctx, units, outcomes).map((p) => studyPointRow(job.studyId, p));
  const last = await deps.db.transaction().execute(async (trx) => {
    const at = deps.now().toISOString();
    if (!(await claimRunningRun(trx, job.studyId, job.generation, at))) return null;
    const inserted = await insertStudyPointsOnce(trx, rows);
    const runs = inserted.length * ctx.plan.runsPerUnit;
    await addDone(trx, job.studyId, inserted.length, runs);
    const after = await findFleetRun(trx, job.studyId);
    return after !== undefined && after.units_done >= after.units_total && (await moveFleetRun(trx, job.studyId, job.generation, ['running'], 'finishing', at));
  });
  if (last === null) return { outcome: 'stopped', threadMs };
  if (last) await deps.queue.addFinish({ studyId: job.studyId, workspaceId: job.workspaceId, generation: job.generation });
  return { outcome: 'stored', threadMs };
}

/** Ranks the stored points and marks the study complete, once. */
export async function finishRun(deps: ChunkDeps, job: FinishJob): Promise<void> {
  const run = await findFleetRun(deps.db, job.studyId);
  if (!run || run.generation !== job.generation || run.state !== 'finishing') return;
  const now = deps.now();
  const ws = { workspaceId: job.workspaceId };
  const actor = { id: run.started_by, name: run.started_by_name };
  await deps.db.transaction().execute(async (trx) => {
    const closed = await closeStudyRunInTx(trx, ws, actor, job.studyId, { status: 'complete', elapsedMs: now.getTime() - Date.parse(run.started_at) }, now);
    const error = closed.ok ? undefined : `The results could not be closed: ${closed.message}`;
    await moveFleetRun(trx, job.studyId, job.generation, ['finishing'], closed.ok ? 'complete' : 'failed', now.toISOString(), { finished: true, error });
  });
}

/** A chunk out of attempts (or failing for good) fails the study with the reason, once. */
export async function failRun(deps: Pick<ChunkDeps, 'db' | 'now'>, job: ChunkJob | FinishJob, reason: string): Promise<void> {
  const what = 'chunk' in job ? `Part ${job.chunk + 1} of the study` : 'Closing the results';
  await moveFleetRun(deps.db, job.studyId, job.generation, ['running', 'finishing'], 'failed', deps.now().toISOString(), { error: `${what} failed: ${reason}`, finished: true });
}
