import type { StudyDefinition, SweepAxis } from '../schemas/study.ts';
import type { StudyPointValues } from '../schemas/study-result.ts';

/**
 * The values of one axis, `from` first: `linear` evenly spaced, `log` evenly spaced in ratio
 * (from·(to/from)^(i/(steps−1))). Ends are returned exactly as given.
 */
export function sweepValues(axis: Pick<SweepAxis, 'from' | 'to' | 'steps' | 'spacing'>): number[] {
  const { from, to, steps } = axis;
  if (steps <= 1) return [from];
  return Array.from({ length: steps }, (_, i) => {
    if (i === 0) return from;
    if (i === steps - 1) return to;
    const t = i / (steps - 1);
    return axis.spacing === 'log' ? from * (to / from) ** t : from + (to - from) * t;
  });
}

/** One point of the sweep. */
export interface StudyPoint {
  /** Position in sweep order (first axis outermost, last axis innermost). */
  index: number;
  values: StudyPointValues;
}

/** One run to make: a point (or the base, pointIndex −1) over one road at one speed, with one of the study's road seeds. */
export interface StudyJob {
  /** Unique, in run order. */
  id: number;
  pointIndex: number;
  roadIndex: number;
  /** m/s */
  speed: number;
  /**
   * Seed for an ISO 8608 road, fixed per road for the whole study (the road entry's `seed`, else
   * undefined so the road's own seed is used): every point meets the same profile, so differences
   * between points come from the setup alone.
   */
  seed?: number;
  /** Which of the study's seeds (shared/study/seeds.ts); set only when the study has more than one. */
  seedIndex?: number;
}

export interface ExpandedStudy {
  points: StudyPoint[];
  /** Every point's runs: point by point in sweep order, then road, then speed, then seed. */
  jobs: StudyJob[];
  /** The unchanged base setup over the same roads, speeds and seeds (empty when speed is swept). */
  baseJobs: StudyJob[];
}

type ExpandInput = Pick<StudyDefinition, 'axes' | 'roads' | 'speeds'> & { seeds?: number };

/** The swept values of point `index`, found digit by digit (last axis fastest); no bounds check. */
function valuesAt(axes: readonly SweepAxis[], lists: readonly number[][], index: number): StudyPointValues {
  const values: StudyPointValues = {};
  let rest = index;
  for (let k = axes.length - 1; k >= 0; k--) {
    const n = axes[k].steps;
    values[axes[k].parameter] = lists[k][rest % n];
    rest = Math.floor(rest / n);
  }
  // Keep the axis order in the object, as readers list values in it.
  const ordered: StudyPointValues = {};
  for (const a of axes) ordered[a.parameter] = values[a.parameter];
  return ordered;
}

/** The runs of one point (or the base, −1), ids from `idBase`: road, then speed, then seed. */
export function pointJobs(def: ExpandInput, pointIndex: number, values: StudyPointValues, idBase: number): StudyJob[] {
  const seeds = def.seeds ?? 1;
  const speeds = values.speed !== undefined ? [values.speed] : def.speeds;
  const list: StudyJob[] = [];
  def.roads.forEach((road, roadIndex) => {
    for (const speed of speeds) {
      for (let k = 0; k < seeds; k++) {
        const job: StudyJob = { id: idBase + list.length, pointIndex, roadIndex, speed };
        if (road.seed !== undefined) job.seed = road.seed;
        if (seeds > 1) job.seedIndex = k;
        list.push(job);
      }
    }
  });
  return list;
}

/**
 * A definition as the list of runs to make, in a fixed order: the same definition always gives
 * the same jobs with the same seeds, so results repeat on every machine.
 */
export function expandStudy(def: ExpandInput): ExpandedStudy {
  const lists = def.axes.map((a) => sweepValues(a));
  const count = def.axes.reduce((n, a) => n * a.steps, 1);
  const points: StudyPoint[] = Array.from({ length: count }, (_, index) => ({ index, values: valuesAt(def.axes, lists, index) }));
  const jobs: StudyJob[] = [];
  for (const p of points) for (const j of pointJobs(def, p.index, p.values, jobs.length)) jobs.push(j);
  const baseJobs = def.axes.some((ax) => ax.parameter === 'speed') ? [] : pointJobs(def, -1, {}, jobs.length);
  return { points, jobs, baseJobs };
}

/** The swept values of point `index` (sweep order: first axis outermost), without expanding the whole study. */
export function pointValuesAt(axes: StudyDefinition['axes'], index: number): StudyPointValues | undefined {
  const total = axes.reduce((n, a) => n * a.steps, 1);
  if (!Number.isInteger(index) || index < 0 || index >= total) return undefined;
  return valuesAt(axes, axes.map((a) => sweepValues(a)), index);
}

/** The sweep index of the point at position `at[k]` along each axis k (the inverse of pointValuesAt). */
export function pointIndexOf(axes: readonly Pick<SweepAxis, 'steps'>[], at: readonly number[]): number {
  return axes.reduce((index, a, k) => index * a.steps + (at[k] ?? 0), 0);
}

/** Points and runs a definition asks for (the base setup's runs included). */
export function plannedCounts(def: ExpandInput): { points: number; runs: number } {
  const points = def.axes.reduce((n, a) => n * a.steps, 1);
  const sweptSpeed = def.axes.some((a) => a.parameter === 'speed');
  const perPoint = def.roads.length * (sweptSpeed ? 1 : def.speeds.length) * (def.seeds ?? 1);
  return { points, runs: points * perPoint + (sweptSpeed ? 0 : perPoint) };
}

/** A study's points and runs looked up one point at a time, never expanding the whole study (10⁶ runs would not fit a request). */
export interface StudyPlan {
  pointCount: number;
  /** Swept values of a point; `{}` for the base (−1); undefined outside the study. */
  valuesOf(index: number): StudyPointValues | undefined;
  /** The runs a point (or the base, −1) is made of; undefined when the study has no such point (or no base). */
  jobsOf(index: number): StudyJob[] | undefined;
}

export function studyPlan(def: ExpandInput): StudyPlan {
  const pointCount = def.axes.reduce((n, a) => n * a.steps, 1);
  const hasBase = !def.axes.some((a) => a.parameter === 'speed');
  const valuesOf = (index: number) => (index === -1 ? (hasBase ? {} : undefined) : pointValuesAt(def.axes, index));
  return {
    pointCount,
    valuesOf,
    jobsOf(index) {
      const values = valuesOf(index);
      return values && pointJobs(def, index, values, 0);
    },
  };
}
