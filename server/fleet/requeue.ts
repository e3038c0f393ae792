import type { Db } from '../db/database.ts';
import { definitionOf, findStudy, listStudyPointIndices } from '../studies/index.ts';
import { fleetPlan, missingChunks } from './chunk-plan.ts';
import type { FleetQueue } from './fleet-queue.ts';
import { findFleetRun, listUnfinishedRuns } from './fleet.repository.ts';

/**
 * What puts a run back on the queue after Redis lost it (a restart without persistence, a
 * flush): when nothing is queued or running but a run still expects chunks, its chunks with
 * points not stored are queued again, and a run waiting for its close gets the close again.
 * The database is the record of what was done; adding a chunk that is still queued does nothing
 * (same job id), and a chunk stored twice inserts nothing the second time.
 */
export async function requeueLost(db: Db, queue: FleetQueue): Promise<number> {
  const runs = await listUnfinishedRuns(db);
  if (runs.length === 0 || (await queue.pendingCount()) > 0) return 0;
  let added = 0;
  for (const r of runs) {
    const job = { studyId: r.study_id, workspaceId: r.workspace_id, generation: r.generation };
    if (r.state === 'finishing') {
      await queue.addFinish(job);
      added++;
      continue;
    }
    const study = await findStudy(db, r.workspace_id, r.study_id);
    const run = await findFleetRun(db, r.study_id);
    if (!study || !run) continue;
    const plan = fleetPlan(definitionOf(study));
    const missing = missingChunks({ ...plan, chunkUnits: run.chunk_units, chunks: run.chunks }, new Set(await listStudyPointIndices(db, r.study_id)));
    await queue.addChunks(missing.map((chunk) => ({ ...job, chunk })));
    added += missing.length;
  }
  return added;
}
