import type { StudyDefinition } from '../../shared/schemas/study.ts';
import { jobsByPoint } from '../../shared/study/collect.ts';
import { expandStudy, type ExpandedStudy, type StudyJob } from '../../shared/study/expand.ts';

/**
 * How a study is cut into chunks for the workers. A unit is one point with all its runs (or the
 * base setup's runs, index −1), so a chunk's write stores whole points and is keyed by them.
 * Chunks hold enough units to take about `targetMs` on one thread, from the study path's cost
 * per simulated second (`npm run bench`: about 5.9 ms per 60 s run on one thread of this machine).
 */
export const MS_PER_SIMULATED_SECOND = 5.9 / 60;
const DEFAULT_CHUNK_MS = 1000;

export interface FleetPlan {
  expanded: ExpandedStudy;
  /** The jobs of each unit, in run order. */
  jobsOf: Map<number, StudyJob[]>;
  /** Units in the order chunks take them: the base first, then the points in sweep order. */
  units: number[];
  chunkUnits: number;
  chunks: number;
  runsTotal: number;
}

export function fleetPlan(def: StudyDefinition, targetMs = DEFAULT_CHUNK_MS): FleetPlan {
  const expanded = expandStudy(def);
  const jobsOf = jobsByPoint(expanded);
  const units = [...(jobsOf.has(-1) ? [-1] : []), ...expanded.points.map((p) => p.index)];
  const runsTotal = expanded.jobs.length + expanded.baseJobs.length;
  const msPerUnit = (runsTotal / Math.max(1, units.length)) * def.duration * MS_PER_SIMULATED_SECOND;
  const chunkUnits = Math.max(1, Math.min(1000, Math.round(targetMs / msPerUnit)));
  return { expanded, jobsOf, units, chunkUnits, chunks: Math.ceil(units.length / chunkUnits), runsTotal };
}

/** The units of chunk `k`. */
export const chunkUnitsOf = (plan: Pick<FleetPlan, 'units' | 'chunkUnits'>, k: number): number[] => plan.units.slice(k * plan.chunkUnits, (k + 1) * plan.chunkUnits);

/** Chunks with at least one unit not stored yet. */
export function missingChunks(plan: FleetPlan, stored: ReadonlySet<number>): number[] {
  const out: number[] = [];
  for (let k = 0; k < plan.chunks; k++) if (chunkUnitsOf(plan, k).some((u) => !stored.has(u))) out.push(k);
  return out;
}

/** Runs of the stored units. */
export const storedRuns = (plan: FleetPlan, stored: Iterable<number>): number => [...stored].reduce((n, u) => n + (plan.jobsOf.get(u)?.length ?? 0), 0);

/** Chunk length in ms: FLEET_CHUNK_MS when set (tests and the benchmark), else about a second. */
export function chunkTargetMs(env: NodeJS.ProcessEnv = process.env): number {
  const v = Number(env.FLEET_CHUNK_MS);
  return Number.isFinite(v) && v > 0 ? v : DEFAULT_CHUNK_MS;
}
