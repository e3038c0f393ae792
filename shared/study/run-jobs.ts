import type { Road } from '../schemas/road.ts';
import type { Setup } from '../schemas/setup.ts';
import type { StudyPointValues, StudyRunOutcome } from '../schemas/study-result.ts';
import { computeMetrics, firstSample } from '../sim/metrics/compute-metrics.ts';
import { roadDampingFigures } from '../sim/metrics/road-damping.ts';
import { strokeAndTableFigures } from '../sim/metrics/stroke-limits.ts';
import { eventEndTime } from '../sim/roads/event-end.ts';
import { buildRoad } from '../sim/roads/index.ts';
import { applyPoint } from './apply-point.ts';
import { figuresFromMetrics } from './figures.ts';
import type { TraceColumns } from '../sim/trace.ts';
import { integrateCorner } from '../sim/integrate.ts';
import { cornerModel, staticEquilibrium } from '../sim/quarter-car.ts';
import { sampleRoad, stepPlanFor, STUDY_OUTPUT_RATE, type SampledRoad } from '../sim/step-plan.ts';

/**
 * Runs study jobs one by one, keeping what every point shares: each road sampled once per speed
 * (and step), each point's setup built once. The worker holds one runner per study run; Node
 * (tests, bench, seed) uses it directly. Pure apart from that cache.
 */

/** What every job of one study run shares. */
export interface StudyRunContext {
  /** The base setup revision's document. */
  base: Setup;
  /** The definition's roads, resolved, in its order. */
  roads: Road[];
  /** s */
  duration: number;
  /** s; absent: the single-run default for the road. */
  settleTime?: number;
}

/** One run to make, with its point's swept values. */
export interface StudyRunJob {
  pointIndex: number;
  values: StudyPointValues;
  roadIndex: number;
  /** m/s */
  speed: number;
  seed?: number;
}

/** The outcome of one job: the run's figures, or why it failed (also when the point's setup is invalid). */
export interface StudyJobOutcome {
  pointIndex: number;
  run: StudyRunOutcome;
  /** Set when the swept values do not make a valid setup. */
  setupError?: string;
}

/** Settling time a single run uses when none is given: 2 s for inputs that start with a transient, at most a quarter of the run. */
export function defaultStudySettle(road: Road, duration: number): number {
  const transient = road.kind === 'iso8608' || road.kind === 'measured' || road.kind === 'sine';
  return transient ? Math.min(2, duration / 4) : 0;
}

const ROAD_CACHE = 12;

export interface StudyRunner {
  run(job: StudyRunJob): StudyJobOutcome;
}

export function createStudyRunner(ctx: StudyRunContext): StudyRunner {
  const roads = new Map<string, SampledRoad | string>();
  const setups = new Map<number, ReturnType<typeof applyPoint>>();
  let trace: TraceColumns | undefined;

  function sampled(job: StudyRunJob, setup: Setup): SampledRoad | string {
    const plan = stepPlanFor(setup);
    const key = `${job.roadIndex}|${job.speed}|${job.seed ?? ''}|${plan.outputsPerStep}|${plan.substeps}|${setup.tyreFootprint ?? ''}`;
    let found = roads.get(key);
    if (found === undefined) {
      const doc = ctx.roads[job.roadIndex];
      const road: Road = doc.kind === 'iso8608' && job.seed !== undefined ? { ...doc, seed: job.seed } : doc;
      const built = buildRoad(road, job.speed, ctx.duration, setup.tyreFootprint, setup.tyreRadius);
      found = built.ok ? sampleRoad(built.road, ctx.duration, plan) : built.reason;
      if (roads.size >= ROAD_CACHE) roads.delete(roads.keys().next().value!);
      roads.set(key, found);
    }
    return found;
  }

  function setupOf(job: StudyRunJob) {
    let s = setups.get(job.pointIndex);
    if (!s) {
      s = applyPoint(ctx.base, job.values);
      // Points arrive in order; only the few in flight need keeping.
      if (setups.size > 64) setups.delete(setups.keys().next().value!);
      setups.set(job.pointIndex, s);
    }
    return s;
  }

  return {
    run(job) {
      const base = { roadIndex: job.roadIndex, speed: job.speed };
      const applied = setupOf(job);
      if (!applied.ok) return { pointIndex: job.pointIndex, run: { ...base, figures: null, error: applied.message }, setupError: applied.message };
      const road = sampled(job, applied.setup);
      if (typeof road === 'string') return { pointIndex: job.pointIndex, run: { ...base, figures: null, error: road } };
      const statics = staticEquilibrium(applied.setup);
      if (!statics.ok) return { pointIndex: job.pointIndex, run: { ...base, figures: null, error: `setup.${statics.reason}` } };
      const model = cornerModel(applied.setup, statics.state);
      const integrated = integrateCorner(model, road.road, { duration: ctx.duration, outputRate: STUDY_OUTPUT_RATE, sampled: road, reuse: trace });
      if (!integrated.ok) return { pointIndex: job.pointIndex, run: { ...base, figures: null, error: integrated.reason } };
      trace = integrated.trace;
      const settleTime = ctx.settleTime ?? defaultStudySettle(ctx.roads[job.roadIndex], ctx.duration);
      const eventEnd = eventEndTime(ctx.roads[job.roadIndex], job.speed, applied.setup.tyreFootprint);
      const from = firstSample(integrated.trace, settleTime);
      const metrics = {
        ...computeMetrics(integrated.trace, { settleTime, staticTyreLoad: statics.state.tyreLoad, stroke: applied.setup.stroke, eventEnd }),
        ...strokeAndTableFigures(integrated.trace, from, applied.setup),
        ...roadDampingFigures(integrated.trace, from),
      };
      return { pointIndex: job.pointIndex, run: { ...base, figures: figuresFromMetrics(metrics, statics.state, applied.setup) } };
    },
  };
}
