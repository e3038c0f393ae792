import type { Setup } from '../schemas/setup.ts';
import { allocateTrace } from '../sim/integrate.ts';
import { cornerModel, newCornerForces, staticEquilibrium, type StaticState } from '../sim/quarter-car.ts';
import type { RoadExcitation } from '../sim/roads/excitation.ts';
import type { TraceColumns } from '../sim/trace.ts';

/**
 * The study integrator: classic fixed-step Runge–Kutta 4 over the same equations of motion as a
 * single run (`cornerModel`), for sweeps of hundreds of runs.
 *
 * Why not the single-run integrator: its extrapolation method, switch location and dense
 * output cost about 130 000 right-hand-side calls plus interpolation per 60 s run, several
 * hundred milliseconds in a browser worker; a study needs a few milliseconds per run. Every
 * point of a study drives the same road at the same speed, so the road is sampled once on the
 * half-step grid (`sampleRoad`) and shared by every point, and each RK4 step then costs four
 * calls of the model and no road work.
 *
 * Step: two output steps (4 ms at the 500 Hz the figures use) when that keeps h·ω ≤ 0.35 for
 * the wheel hop (spring and tyre), h·ω ≤ 1.2 with a stop 1 cm engaged (contact is brief, and
 * RK4 stays accurate to a few per mille per step there) and h·λ ≤ 0.8 for the steepest damper
 * slope acting on the wheel; the sample between is the model evaluated on the
 * step's cubic Hermite interpolant (one call instead of a second four-call step). Stiffer or
 * more damped corners get one output step divided into as many RK4 steps as those limits ask.
 * RK4 is stable to about 2.8 on either axis, so the limits are an accuracy choice. Regime
 * changes (lift-off, stop contact) and damper-table kinks are stepped across, not located: the
 * force stays
 * continuous, and the tests in fixed-step.test.ts hold the figures within a stated tolerance
 * of the single-run integrator on the demo corner, soft and firm, on random roads and a bump.
 */

/** Output rate of the traces the figures are computed from, Hz (as single runs). */
export const STUDY_OUTPUT_RATE = 500;

const HOP_LIMIT = 0.35;
const STOP_LIMIT = 1.2;
const DAMPING_LIMIT = 0.8;
const STOP_PROBE = 0.01;
const MAX_SUBSTEPS = 64;

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
  const h = Math.min(HOP_LIMIT / hop, STOP_LIMIT / stop, DAMPING_LIMIT / Math.max(lambda, 1e-9));
  if (h >= 2 / outputRate) return { outputsPerStep: 2, substeps: 1 };
  return { outputsPerStep: 1, substeps: Math.min(MAX_SUBSTEPS, Math.max(1, Math.ceil(1 / (outputRate * h) - 1e-9))) };
}

const stepOf = (plan: StepPlan, outputRate: number) => plan.outputsPerStep / (outputRate * plan.substeps);

/** A road sampled for the study integrator: elevation and its rate at every half step. */
export interface SampledRoad {
  plan: StepPlan;
  /** Half-step grid. */
  z: Float64Array;
  v: Float64Array;
}

/** Samples a road's time input on the half-step grid of a plan (shared by every point of a study). */
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
  return { plan, z, v };
}

export type FixedStepOutcome = { ok: true; trace: TraceColumns; statics: StaticState } | { ok: false; reason: string };

/**
 * Integrates one corner over a sampled road from static equilibrium and returns the trace on
 * the output grid (the same columns a single run produces) for `computeMetrics`. `reuse`: a
 * trace of the right length to overwrite (a study makes hundreds; allocating each is most of
 * the garbage).
 */
export function integrateFixedStep(setup: Setup, road: SampledRoad, duration: number, reuse?: TraceColumns, outputRate = STUDY_OUTPUT_RATE): FixedStepOutcome {
  const statics = staticEquilibrium(setup);
  if (!statics.ok) return { ok: false, reason: `setup.${statics.reason}` };
  const model = cornerModel(setup, statics.state);
  const ev = model.evaluate;
  const { outputsPerStep: wide, substeps: sub } = road.plan;
  const h = stepOf(road.plan, outputRate);
  const h2 = h / 2;
  const h6 = h / 6;
  const h8 = h / 8;
  const nOut = Math.round(duration * outputRate) + 1;
  const steps = Math.ceil(((nOut - 1) * sub) / wide);
  if (road.z.length < 2 * steps + 1) throw new Error('integrateFixedStep: the sampled road is shorter than the run');
  const trace = reuse && reuse.bodyAccel.length === nOut ? reuse : allocateTrace(nOut, 1 / outputRate);
  const { bodyAccel, travel, tyreLoad, damperVelocity, damperForce, bumpStopForce, reboundStopForce, road: roadOut } = trace;
  const rz = road.z;
  const rv = road.v;
  const f = newCornerForces();
  const put = (k: number, zRoad: number) => {
    bodyAccel[k] = f.bodyAccel;
    travel[k] = f.travel;
    tyreLoad[k] = f.tyreLoad;
    damperVelocity[k] = f.damperVelocity;
    damperForce[k] = f.damperForce;
    bumpStopForce[k] = f.bumpStopForce;
    reboundStopForce[k] = f.reboundStopForce;
    roadOut[k] = zRoad;
  };

  let zs = 0;
  let vs = 0;
  let zu = 0;
  let vu = 0;
  // The previous step's start, for the Hermite middle sample of a wide step.
  let pzs = 0;
  let pvs = 0;
  let pzu = 0;
  let pvu = 0;
  let pa = 0;
  let pb = 0;
  for (let s = 0; ; s++) {
    const j = 2 * s;
    // Stage 1 doubles as the output sample at grid points: the forces at the step start.
    ev(zs, vs, zu, vu, rz[j], rv[j], f);
    const a1 = f.bodyAccel;
    const b1 = f.wheelAccel;
    if (wide === 2) {
      if (2 * s < nOut) put(2 * s, rz[j]);
      if (s > 0) {
        // Cubic Hermite at the middle of the last step: (y0 + y1)/2 + h·(y0' − y1')/8.
        ev((pzs + zs) / 2 + h8 * (pvs - vs), (pvs + vs) / 2 + h8 * (pa - a1), (pzu + zu) / 2 + h8 * (pvu - vu), (pvu + vu) / 2 + h8 * (pb - b1), rz[j - 1], rv[j - 1], f);
        put(2 * s - 1, rz[j - 1]);
      }
      pzs = zs;
      pvs = vs;
      pzu = zu;
      pvu = vu;
      pa = a1;
      pb = b1;
    } else if (s % sub === 0) {
      put(s / sub, rz[j]);
    }
    if (s === steps) break;
    const vs2 = vs + h2 * a1;
    const vu2 = vu + h2 * b1;
    ev(zs + h2 * vs, vs2, zu + h2 * vu, vu2, rz[j + 1], rv[j + 1], f);
    const a2 = f.bodyAccel;
    const b2 = f.wheelAccel;
    const vs3 = vs + h2 * a2;
    const vu3 = vu + h2 * b2;
    ev(zs + h2 * vs2, vs3, zu + h2 * vu2, vu3, rz[j + 1], rv[j + 1], f);
    const a3 = f.bodyAccel;
    const b3 = f.wheelAccel;
    const vs4 = vs + h * a3;
    const vu4 = vu + h * b3;
    ev(zs + h * vs3, vs4, zu + h * vu3, vu4, rz[j + 2], rv[j + 2], f);
    const a4 = f.bodyAccel;
    const b4 = f.wheelAccel;
    zs += h6 * (vs + 2 * vs2 + 2 * vs3 + vs4);
    zu += h6 * (vu + 2 * vu2 + 2 * vu3 + vu4);
    vs += h6 * (a1 + 2 * a2 + 2 * a3 + a4);
    vu += h6 * (b1 + 2 * b2 + 2 * b3 + b4);
    if (!(Math.abs(zs) < 10 && Math.abs(zu) < 10)) {
      return { ok: false, reason: `the motion diverged near t = ${(s * h).toFixed(3)} s: the setup may be unstable or far too stiff for its masses` };
    }
  }
  return { ok: true, trace, statics: statics.state };
}
