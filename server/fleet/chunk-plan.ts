import type { StudyDefinition } from '../../shared/schemas/study.ts';
import { plannedCounts, studyPlan, type StudyPlan } from '../../shared/study/expand.ts';

/**
 * How a study is cut into chunks for the workers. A unit is one point with all its runs (or the
 * base setup's runs, index −1), so a chunk's write stores whole points and is keyed by them.
 * Chunks hold enough units to take about `targetMs` on one thread, from the study path's cost
 * per simulated second (`npm run bench`: about 5.9 ms per 60 s run on one thread of this machine).
 * Points and their runs are looked up one at a time (`studyPlan`): a study of 10⁶ runs is never
 * expanded whole, neither on the request thread that starts it nor in a worker.
 */
export const MS_PER_SIMULATED_SECOND = 5.9 / 60;
const DEFAULT_CHUNK_MS = 1000;

export interface FleetPlan {
  plan: StudyPlan;
  /** Units in the order chunks take them: the base first (when there is one), then the points in sweep order. */
  unitCount: number;
  hasBase: boolean;
  /** Every unit has the same runs: roads × speeds × seeds. */
  runsPerUnit: number;
  chunkUnits: number;
  chunks: number;
  runsTotal: number;
}

export function fleetPlan(def: StudyDefinition, targetMs = DEFAULT_CHUNK_MS): FleetPlan {
  const plan = studyPlan(def);
  const hasBase = plan.valuesOf(-1) !== undefined;
  const unitCount = plan.pointCount + (hasBase ? 1 : 0);
  const runsTotal = plannedCounts(def).runs;
  const runsPerUnit = runsTotal / unitCount;
  const msPerUnit = runsPerUnit * def.duration * MS_PER_SIMULATED_SECOND;
  const chunkUnits = Math.max(1, Math.min(1000, Math.round(targetMs / msPerUnit)));
  return { plan, unitCount, hasBase, runsPerUnit, chunkUnits, chunks: Math.ceil(unitCount / chunkUnits), runsTotal };
}

/** The units of chunk `k` (−1 is the base). */
export function chunkUnitsOf(plan: Pick<FleetPlan, 'unitCount' | 'hasBase' | 'chunkUnits'>, k: number): number[] {
  const from = k * plan.chunkUnits;
  const to = Math.min(plan.unitCount, from + plan.chunkUnits);
  return Array.from({ length: Math.max(0, to - from) }, (_, i) => from + i - (plan.hasBase ? 1 : 0));
}

/** Chunks with at least one unit not stored yet. */
export function missingChunks(plan: Pick<FleetPlan, 'unitCount' | 'hasBase' | 'chunkUnits' | 'chunks'>, stored: ReadonlySet<number>): number[] {
  const out: number[] = [];
  for (let k = 0; k < plan.chunks; k++) if (chunkUnitsOf(plan, k).some((u) => !stored.has(u))) out.push(k);
  return out;
}

/** Whether `u` is a unit of the plan. */
const isUnit = (plan: Pick<FleetPlan, 'unitCount' | 'hasBase'>, u: number) => (u === -1 ? plan.hasBase : Number.isInteger(u) && u >= 0 && u < plan.unitCount - (plan.hasBase ? 1 : 0));

/** Stored units of the plan. */
export const storedUnits = (plan: FleetPlan, stored: Iterable<number>): number => [...stored].filter((u) => isUnit(plan, u)).length;

/** Runs of the stored units. */
export const storedRuns = (plan: FleetPlan, stored: Iterable<number>): number => storedUnits(plan, stored) * plan.runsPerUnit;

/** Chunk length in ms: FLEET_CHUNK_MS when set (tests and the benchmark), else about a second. */
export function chunkTargetMs(env: NodeJS.ProcessEnv = process.env): number {
  const v = Number(env.FLEET_CHUNK_MS);
  return Number.isFinite(v) && v > 0 ? v : DEFAULT_CHUNK_MS;
}
