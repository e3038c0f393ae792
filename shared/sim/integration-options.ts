import type { IntegratorName } from '../schemas/run.ts';
import type { SampledRoad } from './step-plan.ts';
import type { TraceColumns } from './trace.ts';

// What both integrators take and give back (integrate.ts picks one of them).

export const DEFAULT_INTEGRATOR: IntegratorName = 'rk4';

export interface IntegrationOptions {
  /** s. */
  duration: number;
  /** Output samples per second, Hz (≥ 400 recommended: the Wk weighting reaches 80 Hz). */
  outputRate: number;
  /** Method; default `rk4`. */
  integrator?: IntegratorName;
  /** odex only: relative tolerance; default 1e-4. */
  tolerance?: number;
  /** Initial [zs, vs, zu, vu] from static equilibrium; default at rest in equilibrium. */
  initial?: readonly [number, number, number, number];
  /** Also keep the four states on the output grid (`states` in the outcome). */
  recordStates?: boolean;
  /** rk4 only: the road already sampled for this corner's step plan (a study shares it between points). */
  sampled?: SampledRoad;
  /** rk4 only: a trace of the right length to overwrite instead of allocating one. */
  reuse?: TraceColumns;
}

export interface IntegrationStats {
  /** Accepted steps (rk4: pieces of a step count once each). */
  steps: number;
  /** Steps dropped because a switch changed inside them. */
  rejectedSteps: number;
  rhsEvaluations: number;
  /** Stretches integrated without a restart (road breakpoints and located switches end one). */
  segments: number;
  integrateMs: number;
}

/** The integrated states on the output grid (m, m/s; from static equilibrium, up positive). */
export interface StateColumns {
  bodyDisplacement: Float64Array;
  bodyVelocity: Float64Array;
  wheelDisplacement: Float64Array;
  wheelVelocity: Float64Array;
}

export const allocateStates = (n: number): StateColumns => ({
  bodyDisplacement: new Float64Array(n),
  bodyVelocity: new Float64Array(n),
  wheelDisplacement: new Float64Array(n),
  wheelVelocity: new Float64Array(n),
});

export type IntegrationOutcome =
  | { ok: true; trace: TraceColumns; states?: StateColumns; stats: IntegrationStats }
  | { ok: false; reason: string };

/** odex's default relative tolerance. */
export const DEFAULT_TOLERANCE = 1e-4;

/** Output samples on [0, duration] at a rate: the last one may sit a rounding error past the end. */
export const outputCount = (duration: number, outputRate: number): number => Math.floor(duration * outputRate + 1e-9) + 1;
