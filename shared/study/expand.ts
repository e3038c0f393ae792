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
  /** Position in sweep order (first axis outer, second inner). */
  index: number;
  values: StudyPointValues;
}

/** One run to make: a point (or the base, pointIndex −1) over one road at one speed. */
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
}

export interface ExpandedStudy {
  points: StudyPoint[];
  /** Every point's runs: point by point in sweep order, then road, then speed. */
  jobs: StudyJob[];
  /** The unchanged base setup over the same roads and speeds (empty when speed is swept). */
  baseJobs: StudyJob[];
}

/**
 * A definition as the list of runs to make, in a fixed order: the same definition always gives
 * the same jobs with the same seeds, so results repeat on every machine.
 */
export function expandStudy(def: Pick<StudyDefinition, 'axes' | 'roads' | 'speeds'>): ExpandedStudy {
  const [first, second] = def.axes;
  const a = sweepValues(first);
  const b = second ? sweepValues(second) : [undefined];
  const points: StudyPoint[] = [];
  for (const x of a) {
    for (const y of b) {
      const values: StudyPointValues = { [first.parameter]: x };
      if (second && y !== undefined) values[second.parameter] = y;
      points.push({ index: points.length, values });
    }
  }
  const jobs: StudyJob[] = [];
  const speedsOf = (values: StudyPointValues) => (values.speed !== undefined ? [values.speed] : def.speeds);
  const add = (list: StudyJob[], pointIndex: number, speeds: readonly number[], idBase: number) => {
    def.roads.forEach((road, roadIndex) => {
      for (const speed of speeds) {
        const job: StudyJob = { id: idBase + list.length, pointIndex, roadIndex, speed };
        if (road.seed !== undefined) job.seed = road.seed;
        list.push(job);
      }
    });
  };
  for (const p of points) add(jobs, p.index, speedsOf(p.values), 0);
  const baseJobs: StudyJob[] = [];
  if (!def.axes.some((ax) => ax.parameter === 'speed')) add(baseJobs, -1, def.speeds, jobs.length);
  return { points, jobs, baseJobs };
}

/** The swept values of point `index` (sweep order: first axis outer, second inner), without expanding the whole study. */
export function pointValuesAt(axes: StudyDefinition['axes'], index: number): StudyPointValues | undefined {
  const [first, second] = axes;
  const inner = second ? second.steps : 1;
  if (!Number.isInteger(index) || index < 0 || index >= first.steps * inner) return undefined;
  const values: StudyPointValues = { [first.parameter]: sweepValues(first)[Math.floor(index / inner)] };
  if (second) values[second.parameter] = sweepValues(second)[index % inner];
  return values;
}

/** Points and runs a definition asks for (the base setup's runs included). */
export function plannedCounts(def: Pick<StudyDefinition, 'axes' | 'roads' | 'speeds'>): { points: number; runs: number } {
  const points = def.axes.reduce((n, a) => n * a.steps, 1);
  const sweptSpeed = def.axes.some((a) => a.parameter === 'speed');
  const perPoint = def.roads.length * (sweptSpeed ? 1 : def.speeds.length);
  return { points, runs: points * perPoint + (sweptSpeed ? 0 : perPoint) };
}
