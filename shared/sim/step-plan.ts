import type { Setup } from '../schemas/setup.ts';
import { minSlope } from './corner-parts.ts';
import type { RoadExcitation } from './roads/excitation.ts';

/**
 * The step of the fixed-step integrator (integrate-rk4.ts), chosen from the corner's fastest
 * dynamics, and the road sampled once on that step's grid.
 *
 * Step: two output steps (4 ms at the 500 Hz the figures use) when that keeps h·ω ≤ 0.35 for
 * the wheel hop (spring and tyre), h·ω ≤ 1.2 with a stop 1 cm engaged (contact is brief and is
 * entered at its located start, so the step never straddles the change of law) and h·λ ≤ 0.8
 * for the steepest damper slope acting on the wheel; the sample between is the model
 * evaluated on the step's cubic Hermite interpolant (one call instead of a second four-call
 * step). Stiffer or more damped corners get one output step divided into as many RK4 steps as
 * those limits ask. RK4 is stable to about 2.8 on either axis, so the limits are an accuracy
 * choice: at h·ω = 0.35 the step's local error on the wheel hop is (hω)⁵/120 ≈ 4e-5 of its
 * amplitude, and the figures of the Pipit example stay within 0.1 % of odex at 1e-8
 * (integrate-rk4.test.ts measures it on random roads, bumps with lift-off and stop strikes).
 */

/** Output rate of the traces the figures are computed from, Hz (single runs, live runs and studies). */
export const STUDY_OUTPUT_RATE = 500;

const HOP_LIMIT = 0.35;
const STOP_LIMIT = 1.2;
const DAMPING_LIMIT = 0.8;
const STOP_PROBE = 0.01;
/**
 * A controlled valve's target jumps between soft and firm as velocities change sign, so RK4
 * loses its order there: h ≤ 0.1·τ (τ at least 10 ms) kept the demo front with a 10 ms
 * skyhook valve within 0.02 % of odex at 1e-8 on class C (0.2 % at h = 2 ms).
 */
const CONTROL_LIMIT = 0.1;
const CONTROL_TIME_FLOOR = 0.01;
const MAX_SUBSTEPS = 64;
/** With a top mount: the mount's relaxation through the damper can ask for finer steps. */
const MAX_SUBSTEPS_PARTS = 2048;

/** Largest slope of a one-sided table from (0, 0), per unit of its abscissa. */
function maxSlope(points: readonly (readonly [number, number])[]): number {
  let v0 = 0;
  let f0 = 0;
  let s = 0;
  for (const [v, f] of points) {
    if (v > v0) s = Math.max(s, (f - f0) / (v - v0));
    v0 = v;
    f0 = f;
  }
  return s;
}

function stopRate(stop: Setup['bumpStop']): number {
  if (!stop) return 0;
  if (stop.law.kind === 'table') return maxSlope(stop.law.points);
  // dF/dδ of Σ c_i δ^i at the probe depth.
  return stop.law.coefficients.reduce((s, c, i) => s + c * (i + 1) * STOP_PROBE ** i, 0);
}

/**
 * How finely a setup is stepped: `outputsPerStep` 2 (one RK4 step spans two output samples, the
 * middle one read from the cubic Hermite interpolant of the step) when the dynamics allow
 * h = 2/outputRate, else `substeps` RK4 steps per output sample (1, 2, 3, …).
 */
export interface StepPlan {
  outputsPerStep: 1 | 2;
  substeps: number;
}

export function stepPlanFor(setup: Setup, outputRate = STUDY_OUTPUT_RATE): StepPlan {
  const mr2 = setup.motionRatio ** 2;
  const mu = setup.unsprungMass;
  const k = setup.springRate * mr2 + setup.tyreRate;
  const hop = Math.sqrt(k / mu);
  const stop = Math.sqrt((k + Math.max(stopRate(setup.bumpStop), stopRate(setup.reboundStop))) / mu);
  const c = Math.max(maxSlope(setup.damper.compression), maxSlope(setup.damper.rebound)) * mr2 + setup.tyreDamping;
  const lambda = c / mu;
  let h = Math.min(HOP_LIMIT / hop, STOP_LIMIT / stop, DAMPING_LIMIT / Math.max(lambda, 1e-9));
  const parts = setup.topMount || setup.friction || setup.damper.control;
  if (parts) h = Math.min(h, partsStep(setup, k));
  if (h >= 2 / outputRate) return { outputsPerStep: 2, substeps: 1 };
  return { outputsPerStep: 1, substeps: Math.min(parts ? MAX_SUBSTEPS_PARTS : MAX_SUBSTEPS, Math.max(1, Math.ceil(1 / (outputRate * h) - 1e-9))) };
}

/**
 * Step limits of the optional strut parts, under the same rules: the strut's steepest slope
 * (firm table, friction's F/v at rest, the control gains as dampers) for h·λ on the wheel; a top
 * mount's relaxation through the damper, λ = km/(smallest table slope + cm), and the wheel hop
 * on the mount's rate; a control's valve time (CONTROL_LIMIT).
 */
function partsStep(setup: Setup, k: number): number {
  const mr2 = setup.motionRatio ** 2;
  const mu = setup.unsprungMass;
  const ctl = setup.damper.control;
  const tables = [setup.damper.compression, setup.damper.rebound, ...(ctl ? [ctl.firm.compression, ctl.firm.rebound] : [])];
  let slope = Math.max(...tables.map(maxSlope));
  if (setup.friction) slope += setup.friction.breakaway / setup.friction.smoothingSpeed;
  if (ctl) {
    const l = ctl.law;
    slope += l.kind === 'blend' ? Math.max(l.skyGain, l.groundGain) : l.gain;
  }
  let h = DAMPING_LIMIT / Math.max((slope * mr2 + setup.tyreDamping) / mu, 1e-9);
  if (ctl) h = Math.min(h, CONTROL_LIMIT * Math.max(ctl.responseTime, CONTROL_TIME_FLOOR));
  const mount = setup.topMount;
  if (mount) {
    const floor = Math.min(...tables.map(minSlope)) + mount.damping;
    h = Math.min(h, DAMPING_LIMIT / (mount.rate / Math.max(floor, 1e-9)), HOP_LIMIT / Math.sqrt((k + mount.rate * mr2) / mu));
  }
  return h;
}

/** The RK4 step of a plan, s. */
export const stepOf = (plan: StepPlan, outputRate: number) => plan.outputsPerStep / (outputRate * plan.substeps);

/** A road sampled for the fixed-step integrator: elevation and its rate at every half step. */
export interface SampledRoad {
  plan: StepPlan;
  /** The road itself, for the few times off the grid (a located switch, a road breakpoint). */
  road: RoadExcitation;
  /** Half-step grid. */
  z: Float64Array;
  v: Float64Array;
}

/** Samples a road's time input on the half-step grid of a plan (a study shares it between its points). */
export function sampleRoad(road: RoadExcitation, duration: number, plan: StepPlan, outputRate = STUDY_OUTPUT_RATE): SampledRoad {
  const h = stepOf(plan, outputRate);
  const n = 2 * Math.ceil(duration / h - 1e-9) + 1;
  const z = new Float64Array(n);
  const v = new Float64Array(n);
  const out = new Float64Array(2);
  for (let i = 0; i < n; i++) {
    road.sample((i * h) / 2, out);
    z[i] = out[0];
    v[i] = out[1];
  }
  return { plan, road, z, v };
}

