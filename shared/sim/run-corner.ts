import type { z } from 'zod';
import type { FieldIssue } from '../errors.ts';
import type { Road } from '../schemas/road.ts';
import { RunRequest, type RunRequestInput, type RunResult } from '../schemas/run.ts';
import { equivalentDampingLeastSquares, equivalentDampingSecant, type EquivalentDamping } from './damper-equivalent.ts';
import { integrateCorner } from './integrate.ts';
import { DEFAULT_INTEGRATOR, DEFAULT_TOLERANCE } from './integration-options.ts';
import { modalAnalysis } from './linear/modal.ts';
import { computeMetrics, firstSample } from './metrics/compute-metrics.ts';
import { roadDampingFigures } from './metrics/road-damping.ts';
import { strokeAndTableFigures } from './metrics/stroke-limits.ts';
import { cornerModel, linearCorner, staticEquilibrium } from './quarter-car.ts';
import { eventEndTime } from './roads/event-end.ts';
import { buildRoad } from './roads/index.ts';
import type { TraceColumns } from './trace.ts';

/**
 * A failed run says where it failed: `input` (the request, the setup's statics or the road
 * cannot be used, e.g. a field out of range or a measured road too short for the run) or
 * `integration` (the numbers were valid but the motion could not be integrated).
 */
export type RunOutcome =
  | { ok: true; result: RunResult; trace: TraceColumns }
  | { ok: false; stage: 'input' | 'integration'; reason: string; issues?: FieldIssue[] };

export const DEFAULT_OUTPUT_RATE = 500;
/** Settling time for inputs that start with a transient, s (at most a quarter of the run). */
const DEFAULT_SETTLE = 2;

/** zod issues as `{ path: 'setup.damper.rebound.2.0', message }`. */
export function fieldIssues(error: z.ZodError): FieldIssue[] {
  return error.issues.map((i) => ({ path: i.path.map(String).join('.') || '(root)', message: i.message }));
}

function defaultSettle(road: Road, duration: number): number {
  const transient = road.kind === 'iso8608' || road.kind === 'measured' || road.kind === 'sine';
  return transient ? Math.min(DEFAULT_SETTLE, duration / 4) : 0;
}

/**
 * One complete run: validate, find the static state, build the road, integrate, compute the
 * metrics and the linear modal figures. Expected failures (bad input, a road too short, a
 * corner the gas would lift, an integration that gives up) come back as `{ ok: false }`.
 */
export function runCorner(input: RunRequestInput): RunOutcome {
  const started = performance.now();
  const parsed = RunRequest.safeParse(input);
  if (!parsed.success) {
    const issues = fieldIssues(parsed.error);
    return { ok: false, stage: 'input', reason: `${issues[0].path}: ${issues[0].message}`, issues };
  }
  const req = parsed.data;
  const { setup, speed, duration } = req;

  const statics = staticEquilibrium(setup);
  if (!statics.ok) return { ok: false, stage: 'input', reason: `setup.${statics.reason}` };

  const road: Road = req.road.kind === 'iso8608' && req.seed !== undefined ? { ...req.road, seed: req.seed } : req.road;
  const built = buildRoad(road, speed, duration, setup.tyreFootprint, setup.tyreRadius);
  if (!built.ok) return { ok: false, stage: 'input', reason: built.reason };

  const tolerance = req.tolerance ?? DEFAULT_TOLERANCE;
  const outputRate = req.outputRate ?? DEFAULT_OUTPUT_RATE;
  const settleTime = req.settleTime ?? defaultSettle(road, duration);
  if (duration - settleTime < 4 / outputRate) {
    return { ok: false, stage: 'input', reason: 'settleTime: leaves too little of the run to analyse' };
  }
  const integrator = req.integrator ?? DEFAULT_INTEGRATOR;
  const integrated = integrateCorner(cornerModel(setup, statics.state), built.road, { duration, outputRate, tolerance, integrator });
  if (!integrated.ok) return { ok: false, stage: 'integration', reason: integrated.reason };
  const { trace, stats } = integrated;

  const metrics = {
    ...computeMetrics(trace, {
      settleTime,
      staticTyreLoad: statics.state.tyreLoad,
      stroke: setup.stroke,
      velocityBands: req.velocityBands,
      histogramBins: req.histogramBins,
      eventEnd: eventEndTime(road, speed, setup.tyreFootprint),
    }),
    ...strokeAndTableFigures(trace, firstSample(trace, settleTime), setup),
    ...roadDampingFigures(trace, firstSample(trace, settleTime)),
  };

  const eq: EquivalentDamping =
    req.equivalentDamping?.method === 'secant'
      ? equivalentDampingSecant(setup.damper, req.equivalentDamping.referenceSpeed)
      : equivalentDampingLeastSquares(setup.damper, { maxSpeed: req.equivalentDamping?.maxSpeed });
  const linear = linearCorner(setup, eq);
  const modal = modalAnalysis(linear, eq.definition);

  const result: RunResult = {
    setupName: setup.name,
    road: built.road.summary,
    speed,
    duration,
    settleTime,
    outputRate,
    tolerance,
    integrator,
    statics: statics.state,
    linear,
    modal,
    metrics,
    timing: {
      integrateMs: stats.integrateMs,
      totalMs: performance.now() - started,
      steps: stats.steps,
      rejectedSteps: stats.rejectedSteps,
      rhsEvaluations: stats.rhsEvaluations,
      segments: stats.segments,
    },
  };
  return { ok: true, result, trace };
}
