import { z } from 'zod';
import { hertz, metersPerSecond, seconds } from '../units.ts';
import { LinearCorner } from '../sim/linear/linear-corner.ts';
import { Metrics } from './metrics.ts';
import { ModalResult } from './modal.ts';
import { Road } from './road.ts';
import { Setup } from './setup.ts';

/** How a non-linear damper is replaced by one coefficient for the linear analysis. */
export const EquivalentDampingChoice = z.discriminatedUnion('method', [
  z.strictObject({
    method: z.literal('least-squares'),
    /** Upper piston speed of the fit, m/s; default 0.3. */
    maxSpeed: metersPerSecond.positive().max(5).optional(),
  }),
  z.strictObject({
    method: z.literal('secant'),
    /** Reference piston speed, m/s; default 0.1. */
    referenceSpeed: metersPerSecond.positive().max(5).optional(),
  }),
]);
export type EquivalentDampingChoice = z.infer<typeof EquivalentDampingChoice>;

/**
 * Time integration method: `rk4`, fixed-step Runge–Kutta 4 with located regime switches (the
 * default); `odex`, extrapolation with error control at `tolerance` (the reference).
 */
export const IntegratorName = z.enum(['rk4', 'odex']);
export type IntegratorName = z.infer<typeof IntegratorName>;

/** What every run drives: a road at a speed for a time (a corner run and a vehicle run alike). */
export const runScenarioFields = {
  road: Road,
  /** Vehicle speed, m/s. */
  speed: metersPerSecond.positive().max(100),
  /** Simulated time, s. */
  duration: seconds.positive().max(600),
  /** Replaces the seed of an ISO 8608 road (ignored by other roads). */
  seed: z.number().int().min(0).max(4294967295).optional(),
  /**
   * Start of the analysed part, s. Default: 2 s (at most a quarter of the run) for random,
   * sine and measured roads, which start with a transient; 0 for events and sweeps, which
   * start from rest on a flat road.
   */
  settleTime: seconds.nonnegative().optional(),
  /** Output sample rate, Hz; default 500 (Wk weighting reaches 80 Hz). */
  outputRate: hertz.min(200).max(5000).optional(),
};

/** The checks across the scenario's fields: the analysed part inside the run, a bounded output. */
export function checkRunScenario(r: { settleTime?: number; duration: number; outputRate?: number }, ctx: z.RefinementCtx): void {
  if (r.settleTime !== undefined && r.settleTime >= r.duration) {
    ctx.addIssue({ code: 'custom', path: ['settleTime'], message: 'settleTime must be shorter than the run' });
  }
  if (r.duration * (r.outputRate ?? 500) > 2_000_000) {
    ctx.addIssue({ code: 'custom', path: ['duration'], message: 'at most 2 000 000 output samples per run (duration × outputRate)' });
  }
}

/** One simulation: a setup driven over a road at a speed. */
export const RunRequest = z
  .strictObject({
    setup: Setup,
    ...runScenarioFields,
    /** Integration method; default `rk4`. */
    integrator: IntegratorName.optional(),
    /** odex's relative tolerance; default 1e-4 (absolute tolerances scale with it). */
    tolerance: z.number().min(1e-12).max(1e-3).optional(),
    /** Definition of the equivalent linear damper; default least squares over 0–0.3 m/s. */
    equivalentDamping: EquivalentDampingChoice.optional(),
    /** Edges of the low/mid/high damper speed bands, m/s. */
    velocityBands: z.strictObject({ low: metersPerSecond.positive(), high: metersPerSecond.positive() }).optional(),
    /** Bins of the damper velocity histogram. */
    histogramBins: z.number().int().min(4).max(400).optional(),
  })
  .superRefine((r, ctx) => {
    checkRunScenario(r, ctx);
    if (r.velocityBands && r.velocityBands.low >= r.velocityBands.high) {
      ctx.addIssue({ code: 'custom', path: ['velocityBands', 'high'], message: 'the high band edge must be above the low one' });
    }
  });
export type RunRequest = z.infer<typeof RunRequest>;
export type RunRequestInput = z.input<typeof RunRequest>;

/** What was actually driven over. */
export const RoadSummary = z.object({
  kind: z.enum(['iso8608', 'sine', 'sweep', 'bump', 'pothole', 'kerb', 'measured']),
  name: z.string().optional(),
  /** ISO 8608: lowest and highest spatial frequency generated, cycle/m. */
  nMin: z.number().optional(),
  nMax: z.number().optional(),
  /** ISO 8608: Gd(n0) of the class, m³. */
  roughness: z.number().optional(),
  /** ISO 8608: the seed used. */
  seed: z.number().optional(),
  /** ISO 8608: period of the profile; measured: length of the profile, m. */
  length: z.number().optional(),
  /** Grid step of a gridded profile, m. */
  spacing: z.number().optional(),
  /** Distance driven in the run, m. */
  distance: z.number(),
});
export type RoadSummary = z.infer<typeof RoadSummary>;

/** Cost of the integration. */
export const RunTiming = z.object({
  /** Wall time of the integration alone, ms. */
  integrateMs: z.number().nonnegative(),
  /** Wall time of the whole run (road, integration, metrics, modal), ms. */
  totalMs: z.number().nonnegative(),
  /** Accepted integrator steps. */
  steps: z.number().int().nonnegative(),
  rejectedSteps: z.number().int().nonnegative(),
  /** Evaluations of the equations of motion by the integrator (output samples not counted). */
  rhsEvaluations: z.number().int().nonnegative(),
  /** Pieces the run was integrated in (the integrator restarts at road breakpoints). */
  segments: z.number().int().positive(),
});
export type RunTiming = z.infer<typeof RunTiming>;

/** The corner at rest, SI. */
export const StaticSummary = z.object({
  tyreLoad: z.number(),
  tyreDeflection: z.number(),
  springForceAtWheel: z.number(),
  springDeflection: z.number(),
  gasForce: z.number(),
  bodySag: z.number(),
  wheelSag: z.number(),
});

/** JSON part of a finished run; the time histories travel beside it as typed arrays. */
export const RunResult = z.object({
  setupName: z.string(),
  road: RoadSummary,
  speed: z.number(),
  duration: z.number(),
  settleTime: z.number(),
  outputRate: z.number(),
  tolerance: z.number(),
  /** Absent on runs saved before the choice existed (they were integrated with odex). */
  integrator: IntegratorName.optional(),
  statics: StaticSummary,
  linear: LinearCorner,
  modal: ModalResult,
  metrics: Metrics,
  timing: RunTiming,
});
export type RunResult = z.infer<typeof RunResult>;
