import type { FleetProgress, FleetStatus } from '../../shared/schemas/fleet.ts';
import type { Actor, WorkspaceRef } from '../core/actor.ts';
import { fail, ok, type Outcome } from '../core/outcome.ts';
import type { Db } from '../db/database.ts';
import { recordAudit } from '../audit/index.ts';
import { definitionOf, findStudy, finishStudyRun, listStudyPointIndices } from '../studies/index.ts';
import { chunkTargetMs, fleetPlan, missingChunks, storedRuns, storedUnits } from './chunk-plan.ts';
import type { ChunkJob, FleetQueue } from './fleet-queue.ts';
import { progressOf, type RunsSample } from './fleet-progress.ts';
import { findFleetRun, moveFleetRun, putFleetRun } from './fleet.repository.ts';

/**
 * Starting, watching and stopping a study on the team's workers. The server only plans and
 * queues: the runs happen in `npm run worker` processes, which store whole points and close the
 * study when the last one is in. Without a queue (no REDIS_URL) these refuse, and studies run in
 * the browser as before.
 */

const noStudy = () => fail('not_found', 'No such study in this workspace.');
const noWorkers = () => fail('conflict', 'This server has no team workers (REDIS_URL is not set); run the study in this browser.');

export async function fleetStatus(db: Db, queue: FleetQueue | null, ws: WorkspaceRef, studyId: string, now: number): Promise<Outcome<FleetStatus>> {
  if (!(await findStudy(db, ws.workspaceId, studyId))) return noStudy();
  const run = await findFleetRun(db, studyId);
  return ok({ available: queue !== null, run: run ? progressOf(run, now) : null });
}

/**
 * Queues every chunk that still has a point to store (a study stopped earlier continues where
 * it stopped). A chunk already stored is not queued again; writes are keyed by point anyway.
 */
export async function startFleetRun(db: Db, queue: FleetQueue | null, ws: WorkspaceRef, actor: Actor, studyId: string, now: Date): Promise<Outcome<FleetStatus>> {
  if (!queue) return noWorkers();
  const study = await findStudy(db, ws.workspaceId, studyId);
  if (!study) return noStudy();
  const previous = await findFleetRun(db, studyId);
  if (previous && (previous.state === 'running' || previous.state === 'finishing')) return fail('conflict', 'This study is already running on the team’s workers.');
  const plan = fleetPlan(definitionOf(study), chunkTargetMs());
  const stored = new Set(await listStudyPointIndices(db, studyId));
  const runsDone = storedRuns(plan, stored);
  const generation = (previous?.generation ?? 0) + 1;
  const at = now.toISOString();
  await db.transaction().execute(async (trx) => {
    await putFleetRun(trx, {
      study_id: studyId,
      workspace_id: ws.workspaceId,
      generation,
      state: 'running',
      chunk_units: plan.chunkUnits,
      chunks: plan.chunks,
      units_total: plan.unitCount,
      units_done: storedUnits(plan, stored),
      runs_total: plan.runsTotal,
      runs_done: runsDone,
      runs_at_start: runsDone,
      error: null,
      started_by: actor.id,
      started_at: at,
      updated_at: at,
      finished_at: null,
    });
    await recordAudit(trx, {
      workspaceId: ws.workspaceId,
      actorId: actor.id,
      action: 'study.workers_started',
      entityType: 'study',
      entityId: studyId,
      summary: `${actor.name} started study "${study.name}" on the team's workers: ${plan.runsTotal - runsDone} of ${plan.runsTotal} runs to go.`,
      at: now,
    });
  });
  const missing = missingChunks(plan, stored);
  const job = { studyId, workspaceId: ws.workspaceId, generation };
  try {
    if (missing.length) await queue.addChunks(missing.map((chunk) => ({ ...job, chunk })));
    else {
      await moveFleetRun(db, studyId, generation, ['running'], 'finishing', at);
      await queue.addFinish(job);
    }
  } catch (err) {
    await moveFleetRun(db, studyId, generation, ['running', 'finishing'], 'failed', new Date().toISOString(), { error: `The queue could not be reached: ${(err as Error).message}`, finished: true });
    return fail('busy', 'The team’s workers could not be reached; try again, or run the study in this browser.');
  }
  return fleetStatus(db, queue, ws, studyId, now.getTime());
}

/**
 * Stops the run at once: from now on no chunk's write is accepted (the running ones are thrown
 * away), queued chunks are taken off the queue, and the points stored so far are closed as a
 * partial result, ranked as a browser run's would be.
 */
export async function cancelFleetRun(db: Db, queue: FleetQueue | null, ws: WorkspaceRef, actor: Actor, studyId: string, now: Date): Promise<Outcome<FleetStatus>> {
  if (!queue) return noWorkers();
  const study = await findStudy(db, ws.workspaceId, studyId);
  if (!study) return noStudy();
  const run = await findFleetRun(db, studyId);
  if (!run || run.state !== 'running') return fail('conflict', 'This study is not running on the team’s workers.');
  const at = now.toISOString();
  const stopped = await db.transaction().execute(async (trx) => {
    if (!(await moveFleetRun(trx, studyId, run.generation, ['running'], 'cancelled', at, { finished: true }))) return false;
    await recordAudit(trx, { workspaceId: ws.workspaceId, actorId: actor.id, action: 'study.workers_cancelled', entityType: 'study', entityId: studyId, summary: `${actor.name} stopped study "${study.name}" on the team's workers.`, at: now });
    return true;
  });
  if (!stopped) return fail('conflict', 'This study finished or stopped meanwhile.');
  const chunks: ChunkJob[] = Array.from({ length: run.chunks }, (_, chunk) => ({ studyId, workspaceId: ws.workspaceId, generation: run.generation, chunk }));
  await queue.removeChunks(chunks);
  if ((await listStudyPointIndices(db, studyId)).some((i) => i >= 0)) {
    const closed = await finishStudyRun(db, ws, actor, studyId, { status: 'partial', elapsedMs: now.getTime() - Date.parse(run.started_at) }, now);
    if (!closed.ok) return closed;
  }
  return fleetStatus(db, queue, ws, studyId, now.getTime());
}

/** The run's progress now, with the rate over `samples` (the stream keeps them per listener); null before any run. */
export async function fleetProgressNow(db: Db, studyId: string, now: number, samples: RunsSample[]): Promise<FleetProgress | null> {
  const run = await findFleetRun(db, studyId);
  return run ? progressOf(run, now, samples) : null;
}
