import type { Road } from '../schemas/road.ts';
import type { RunRequestInput } from '../schemas/run.ts';
import type { Setup } from '../schemas/setup.ts';
import type { StudyDefinition } from '../schemas/study.ts';
import type { StudyJob } from './expand.ts';

/**
 * The study's roads as full road objects: inline roads as written, library roads through
 * `lookup` (the server or client cache). Lists the ids it could not find.
 */
export function resolveStudyRoads(
  def: Pick<StudyDefinition, 'roads'>,
  lookup: (roadId: string) => Road | undefined,
): { ok: true; roads: Road[] } | { ok: false; missing: string[] } {
  const missing: string[] = [];
  const roads = def.roads.map((r) => {
    if (r.source === 'inline') return r.road;
    const found = lookup(r.roadId);
    if (!found) missing.push(r.roadId);
    return found;
  });
  return missing.length ? { ok: false, missing } : { ok: true, roads: roads as Road[] };
}

/** The run request of one job, for `runCorner` (shared/sim/run-corner.ts). */
export function studyRunRequest(def: Pick<StudyDefinition, 'duration' | 'settleTime'>, job: StudyJob, setup: Setup, roads: readonly Road[]): RunRequestInput {
  const req: RunRequestInput = { setup, road: roads[job.roadIndex], speed: job.speed, duration: def.duration };
  if (def.settleTime !== undefined) req.settleTime = def.settleTime;
  if (job.seed !== undefined) req.seed = job.seed;
  return req;
}
