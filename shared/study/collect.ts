import type { FieldIssue } from '../errors.ts';
import type { Road } from '../schemas/road.ts';
import type { StudyDefinition } from '../schemas/study.ts';
import type { StudyPointResult, StudyRunOutcome } from '../schemas/study-result.ts';
import { roadLabel } from '../runs/road-label.ts';
import { evaluatePoint } from './evaluate-point.ts';
import type { ExpandedStudy, StudyJob, StudyPlan } from './expand.ts';

/**
 * Turning runs into point results, the same way in the browser (as a run goes) and on the
 * server (when the browser saves them): runs are grouped by point, a point is judged once all
 * its runs are in, and an upload is checked against the jobs the definition expands to.
 */

/** A judged point as the browser saves it: its runs (and why its setup was invalid, if it was); the server judges it again. */
export function studyPointUpload(p: StudyPointResult): { index: number; runs: StudyRunOutcome[]; setupError?: string } {
  const setupError = p.violations.find((v) => v.kind === 'setupInvalid')?.message;
  return { index: p.index, runs: p.runs, ...(setupError ? { setupError } : {}) };
}

/** Names of the study's roads for tables and limit messages: the entry's name, else the road's own label. */
/** Names of the study's roads; `roads` may be sparse where an entry carries its own name. */
export function studyRoadNames(def: Pick<StudyDefinition, 'roads'>, roads: readonly (Road | undefined)[]): string[] {
  return def.roads.map((entry, i) => entry.name ?? (roads[i] ? roadLabel(roads[i], entry.seed) : `road ${i + 1}`));
}

/** The jobs of each point (index −1: the base), in run order. */
export function jobsByPoint(expanded: ExpandedStudy): Map<number, StudyJob[]> {
  const map = new Map<number, StudyJob[]>();
  for (const job of [...expanded.jobs, ...expanded.baseJobs]) {
    const list = map.get(job.pointIndex);
    if (list) list.push(job);
    else map.set(job.pointIndex, [job]);
  }
  return map;
}

type Def = Pick<StudyDefinition, 'aggregate' | 'objectives' | 'constraints'> & { seeds?: number };

/** The points and jobs of a study, from its full expansion (small studies, in the browser) or looked up point by point (studyPlan). */
export type StudyJobsSource = ExpandedStudy | StudyPlan;

function asPlan(source: StudyJobsSource, expected?: Map<number, StudyJob[]>): StudyPlan {
  if ('jobsOf' in source) return source;
  const byPoint = expected ?? jobsByPoint(source);
  return {
    pointCount: source.points.length,
    valuesOf: (index) => (index === -1 ? (byPoint.has(-1) ? {} : undefined) : source.points[index]?.values),
    jobsOf: (index) => byPoint.get(index),
  };
}

const runKey = (r: { roadIndex: number; speed: number; seedIndex?: number }) => `${r.roadIndex}|${r.speed}|${r.seedIndex ?? 0}`;
const runWords = (r: { roadIndex: number; speed: number; seedIndex?: number }) => `road ${r.roadIndex + 1} at ${r.speed} m/s${r.seedIndex ? ` with seed ${r.seedIndex + 1}` : ''}`;

/**
 * A saved point checked against its expected jobs: one run per (road, speed, seed) of the
 * point, no more, no fewer. Returns the judged point, or the problems by field path under
 * `prefix`. `expectedJobs` is only a shortcut for callers that already grouped an expansion.
 */
export function judgeUploadedPoint(
  def: Def,
  source: StudyJobsSource,
  expectedJobs: Map<number, StudyJob[]> | undefined,
  upload: { index: number; runs: readonly StudyRunOutcome[]; setupError?: string },
  roadNames: readonly string[],
  prefix: string,
): { ok: true; point: StudyPointResult } | { ok: false; issues: FieldIssue[] } {
  const plan = asPlan(source, expectedJobs);
  const jobs = plan.jobsOf(upload.index);
  if (!jobs) {
    const why = upload.index === -1 ? 'this study sweeps speed, so it has no base-setup runs' : `the study has points 0 to ${plan.pointCount - 1}`;
    return { ok: false, issues: [{ path: `${prefix}.index`, message: `No point ${upload.index}: ${why}.` }] };
  }
  const issues: FieldIssue[] = [];
  const seeds = def.seeds ?? 1;
  if (upload.runs.length !== jobs.length) issues.push({ path: `${prefix}.runs`, message: `Point ${upload.index} has ${jobs.length} runs (roads × speeds${seeds > 1 ? ' × seeds' : ''}); ${upload.runs.length} were sent.` });
  const order = new Map(jobs.map((j, k) => [runKey(j), k]));
  const seen = new Set<string>();
  upload.runs.forEach((run, k) => {
    const key = runKey(run);
    if (!order.has(key) || (seeds === 1 && run.seedIndex !== undefined)) {
      issues.push({ path: `${prefix}.runs.${k}`, message: `Point ${upload.index} has no run on ${runWords(run)}.` });
    } else if (seen.has(key)) {
      issues.push({ path: `${prefix}.runs.${k}`, message: `The run on ${runWords(run)} is sent twice.` });
    }
    seen.add(key);
    if (run.figures === null && !run.error) issues.push({ path: `${prefix}.runs.${k}.error`, message: 'A run without figures must say why it failed.' });
  });
  if (issues.length) return { ok: false, issues };
  const values = plan.valuesOf(upload.index) ?? {};
  // Runs in the job order, whatever order they came in.
  const runs = [...upload.runs].sort((a, b) => order.get(runKey(a))! - order.get(runKey(b))!);
  const point = evaluatePoint(def, { index: upload.index, values }, runs, { setupError: upload.setupError, roadName: (i) => roadNames[i] ?? `road ${i + 1}` });
  return { ok: true, point };
}

/**
 * Collects job outcomes as they arrive and hands back each point once all its runs are in.
 * Used by the browser runner; `points()` lists the finished ones in sweep order.
 */
export function createPointCollector(def: Def, source: StudyJobsSource, roadNames: readonly string[]) {
  const plan = asPlan(source);
  const expected = new Map<number, number>();
  const jobCount = (index: number) => {
    let n = expected.get(index);
    if (n === undefined) {
      n = plan.jobsOf(index)?.length ?? -1;
      expected.set(index, n);
    }
    return n;
  };
  const pending = new Map<number, { runs: StudyRunOutcome[]; setupError?: string }>();
  const done = new Map<number, StudyPointResult>();
  return {
    /** Adds one run; returns the point when it was the point's last. */
    add(pointIndex: number, run: StudyRunOutcome, setupError?: string): StudyPointResult | null {
      const count = jobCount(pointIndex);
      if (count < 0 || done.has(pointIndex)) throw new Error(`collector: unexpected run for point ${pointIndex}`);
      const entry = pending.get(pointIndex) ?? { runs: [] };
      entry.runs.push(run);
      if (setupError) entry.setupError = setupError;
      pending.set(pointIndex, entry);
      if (entry.runs.length < count) return null;
      pending.delete(pointIndex);
      expected.delete(pointIndex);
      const judged = judgeUploadedPoint(def, plan, undefined, { index: pointIndex, ...entry }, roadNames, 'point');
      if (!judged.ok) throw new Error(`collector: ${judged.issues[0].message}`);
      done.set(pointIndex, judged.point);
      return judged.point;
    },
    /** Finished points of the sweep (not the base), in sweep order. */
    points(): StudyPointResult[] {
      return [...done.values()].filter((p) => p.index >= 0).sort((a, b) => a.index - b.index);
    },
    base(): StudyPointResult | null {
      return done.get(-1) ?? null;
    },
    /** Runs of the finished points, for saving. */
    finishedRuns(pointIndex: number) {
      return done.get(pointIndex)?.runs;
    },
  };
}
