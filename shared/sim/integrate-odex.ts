import { Outcome, Solver } from 'odex';
import { createEventTracker } from './event-tracker.ts';
import { allocateStates, DEFAULT_TOLERANCE, outputCount, type IntegrationOptions, type IntegrationOutcome } from './integration-options.ts';
import { newCornerForces, SWITCH_COUNT, type CornerModel } from './quarter-car.ts';
import type { RoadExcitation } from './roads/excitation.ts';
import { allocateTrace, writeSample } from './trace.ts';

/**
 * The reference integration of the corner with odex (Gragg–Bulirsch–Stoer extrapolation with dense
 * output), sampled on a uniform output grid.
 *
 * Choices, and why:
 * - Tolerances. `tolerance` is the relative tolerance, default 1e-4; the absolute ones are
 *   scaled to the size of each state on a rough road: tolerance × 1 cm for displacements and
 *   tolerance × 10 cm/s for velocities (× mu for the wheel variable below), so no state is
 *   judged only relatively near a zero crossing. Measured on the Pipit example over ISO class
 *   C at 20 m/s for 60 s: at 1e-4 every continuous metric is within 0.01 % of a run at 1e-8
 *   and moves by 0.01 % when the tolerance is tightened tenfold (budget 0.1 %), for about
 *   100 000 right-hand-side evaluations. 1e-3 is still within 0.05 % of the 1e-8 run for a
 *   fifth fewer evaluations (a choice for large studies); 1e-5 costs half as much again.
 * - State variables. While the tyre touches, the fourth state is p = mu·vu − ct·zr rather than
 *   the wheel velocity vu. With tyre damping ct the wheel is pushed by ct·żr, and the road's
 *   rate is one derivative rougher than the road itself (the rate of a C² spline is only C¹);
 *   in p that term cancels, so the road enters the equations only through zr. While the wheel
 *   is in the air the road does not act at all and p = mu·vu; the variable changes at each
 *   landing and lift-off, where the integration restarts anyway. On the Pipit example over
 *   class C this cut the right-hand-side evaluations by about a third, down to what the same
 *   corner costs without tyre damping. vu is recovered exactly wherever a state is reported.
 * - Smooth road input. Extrapolation methods lose their order, and waste rejected steps, when
 *   the right-hand side has jumps in low derivatives. Random and measured roads are handed
 *   over as C² cubic splines on a fine grid (roads/spline.ts), sines and sweeps fade in and
 *   out with a C² quintic, and the slope jumps that events really have (bump edges, kerb
 *   ramp ends) are listed as breakpoints: the integration stops exactly there and restarts,
 *   so no step straddles them.
 * - Regime switches (tyre lift-off and landing, bump-stop and rebound-stop contact) are
 *   located and restarted at. They are rare, and they are the sharpest events in the model:
 *   the tyre force loses its whole stiffness at lift-off and, with tyre damping, jumps at
 *   landing. After every accepted step the sign of each switch function is checked; on a
 *   change the step is dropped, the crossing is found on the dense output (Illinois method),
 *   and the run resumes from the step's start with the crossing as a segment end, so the
 *   state at the switch comes from an integration that never straddled it. Without this,
 *   peaks right after a landing moved by 0.1 % between tolerances 1e-5 and 1e-6.
 * - Damper-table kinks (including the compression/rebound change at zero speed) are left to
 *   the error control: they are crossed dozens of times per second and the force stays
 *   continuous. Blending each kink into a C¹ curve over ±0.5 to ±10 mm/s was tried and saved
 *   no evaluations at all (the Pipit's tabled damper costs what a linear one does), so the
 *   curve is used exactly as the user drew it.
 * - Maximum step: 0.15 of the wheel-hop period (MAX_STEP_HOP_PERIODS below), so a quiet
 *   stretch (a level road before an event) cannot grow the step past the fastest dynamics of
 *   the corner, and the dense output between step ends stays accurate on a rough road.
 * - Output: dense output is evaluated at every grid time inside each accepted step, and the
 *   equations of motion once more there for accelerations and forces. The caller picks the
 *   rate; 500 Hz by default in the runner (the Wk weighting reaches 80 Hz).
 */

/** Undamped wheel-hop frequency estimate √((ks + kt)/mu)/2π, Hz, for the step limit. */
function wheelHopHz(model: CornerModel): number {
  const s = model.setup;
  return Math.sqrt((s.springRate * s.motionRatio ** 2 + s.tyreRate) / s.unsprungMass) / (2 * Math.PI);
}

const DISPLACEMENT_SCALE = 0.01;
const VELOCITY_SCALE = 0.1;
/** Accepted steps allowed per simulated second (a stiff or unstable setup fails fast). */
const MAX_STEPS_PER_SECOND = 50_000;
/**
 * Longest step as a share of the wheel-hop period. With a quarter period, steps of 20 ms
 * let the dense output between step ends miss part of the road content (57 Hz at 20 m/s on
 * the default ISO band), and travel extremes moved by 0.1 % between tolerances; at 0.15 they
 * agree within 0.02 %, for about 10 % more evaluations than a quarter.
 */
const MAX_STEP_HOP_PERIODS = 0.15;
/** A step shorter than this (relative to t) counts as stalled. */
const STALL_STEP = 1e-13;
/** Restarts allowed per run before switch tracking is abandoned (a chattering contact). */
const MAX_EVENTS = 20_000;

/** Where a segment of the integration starts again: the start of the last accepted step. */
interface RestartPoint {
  t: number;
  y: number[];
  /** Length of the last accepted step (the next segment's first trial step). */
  lastStep: number;
}

export function integrateOdex(model: CornerModel, road: RoadExcitation, opts: IntegrationOptions): IntegrationOutcome {
  const started = performance.now();
  const tol = opts.tolerance ?? DEFAULT_TOLERANCE;
  const dt = 1 / opts.outputRate;
  const T = opts.duration;
  const nOut = outputCount(T, opts.outputRate);
  const trace = allocateTrace(nOut, dt);
  const states = opts.recordStates ? allocateStates(nOut) : undefined;
  const forces = newCornerForces();
  const rb = new Float64Array(2);
  const sw = new Float64Array(SWITCH_COUNT);
  const tracker = createEventTracker(SWITCH_COUNT, { maxEvents: MAX_EVENTS });

  // Integrated states: [zs, vs, zu, p] with p = mu·vu − c·zr, c = ct while the tyre touches
  // and 0 while the wheel is in the air (see the header note).
  const mu = model.setup.unsprungMass;
  const ct: number = model.setup.tyreDamping;
  let c = ct;
  const wheelVelocity = (p: number, zRoad: number) => (p + c * zRoad) / mu;

  let evals = 0;
  // A top mount or a lagging control adds states after the four (corner-parts.ts).
  const nx = model.extraStates ?? 0;
  const n = 4 + nx;
  const evx = model.evaluateExtra;
  const scratch = new Array<number>(n).fill(0);
  const dy = new Array<number>(n).fill(0);
  const rhs = (t: number, y: number[]): number[] => {
    evals++;
    road.sample(t, rb);
    const vu = wheelVelocity(y[3], rb[0]);
    if (nx > 0) evx!(y[0], y[1], y[2], vu, rb[0], rb[1], y, dy, forces);
    else model.evaluate(y[0], y[1], y[2], vu, rb[0], rb[1], forces);
    dy[0] = y[1];
    dy[1] = forces.bodyAccel;
    dy[2] = vu;
    dy[3] = mu * forces.wheelAccel - c * rb[1];
    return dy;
  };

  let next = 0;
  const extraAt = new Array<number>(n).fill(0);
  const write = (t: number, zs: number, vs: number, zu: number, p: number) => {
    road.sample(t, rb);
    const vu = wheelVelocity(p, rb[0]);
    if (nx > 0) evx!(zs, vs, zu, vu, rb[0], rb[1], extraAt, scratch, forces);
    else model.evaluate(zs, vs, zu, vu, rb[0], rb[1], forces);
    const i = next++;
    writeSample(trace, i, forces, rb[0]);
    if (states) {
      states.bodyDisplacement[i] = zs;
      states.bodyVelocity[i] = vs;
      states.wheelDisplacement[i] = zu;
      states.wheelVelocity[i] = vu;
    }
  };

  /** Switch values at a state, into `sw`. */
  const switchesAt = (t: number, zs: number, vs: number, zu: number, p: number) => {
    road.sample(t, rb);
    model.switches(zs, vs, zu, wheelVelocity(p, rb[0]), rb[0], rb[1], sw);
    return sw;
  };

  const restart: RestartPoint = { t: 0, y: new Array<number>(n).fill(0), lastStep: 0 };
  // Set before each solve; the output callback raises it when the solver's step collapses.
  let stalled: boolean;

  // Grid times are i·dt, compared with a hair of slack so a sample landing on a step end
  // (or on the run's end) is not lost to rounding.
  const slack = dt * 1e-9;
  const solOut = (_nr: number, xOld: number, x: number, y: number[], dense?: (c: number, x: number) => number) => {
    if (!dense) {
      for (let i = 4; i < n; i++) extraAt[i] = y[i];
      if (next === 0 && x <= slack) write(0, y[0], y[1], y[2], y[3]);
      tracker.start(switchesAt(x, y[0], y[1], y[2], y[3]));
      restart.t = x;
      for (let i = 0; i < n; i++) restart.y[i] = y[i];
      return;
    }
    if (x - xOld <= STALL_STEP * Math.max(1, x)) {
      stalled = true;
      return false;
    }
    const end = switchesAt(x, y[0], y[1], y[2], y[3]);
    const valueAt = (k: number, t: number) => switchesAt(t, dense(0, t), dense(1, t), dense(2, t), dense(3, t))[k];
    // A regime changed inside this step: drop the step and integrate up to the switch.
    if (tracker.changed(end) && tracker.locate(valueAt, xOld, x)) return false;
    tracker.accept(switchesAt(x, y[0], y[1], y[2], y[3]));
    while (next < nOut && next * dt <= x + slack) {
      const t = next * dt;
      for (let i = 4; i < n; i++) extraAt[i] = dense(i, t);
      write(t, dense(0, t), dense(1, t), dense(2, t), dense(3, t));
    }
    restart.lastStep = x - xOld;
    restart.t = x;
    for (let i = 0; i < n; i++) restart.y[i] = y[i];
  };

  const solver = new Solver(n);
  solver.denseOutput = true;
  solver.relativeTolerance = tol;
  solver.absoluteTolerance = [tol * DISPLACEMENT_SCALE, tol * VELOCITY_SCALE, tol * DISPLACEMENT_SCALE, tol * VELOCITY_SCALE * mu, ...(model.extraScales ?? []).map((x) => tol * x)];
  const hMax = MAX_STEP_HOP_PERIODS / wheelHopHz(model);
  solver.maxStepSize = hMax;
  solver.maxSteps = Math.ceil(MAX_STEPS_PER_SECOND * T) + 100;

  const breaks = road.breakpoints.filter((b) => b > 0 && b < T);
  let t = 0;
  const [zs0, vs0, zu0, vu0] = opts.initial ?? [0, 0, 0, 0];
  road.sample(0, rb);
  model.switches(zs0, vs0, zu0, vu0, rb[0], rb[1], sw);
  c = ct > 0 && sw[0] > 0 ? ct : 0;
  let y = [zs0, vs0, zu0, mu * vu0 - c * rb[0], ...new Array<number>(nx).fill(0)];
  let steps = 0;
  let rejected = 0;
  let segments = 0;
  let target = -1;
  while (T - t > slack) {
    const nextBreak = breaks.find((b) => b > t + slack) ?? T;
    const end = target > t + slack && target < nextBreak ? target : nextBreak;
    solver.initialStepSize = restart.lastStep > 0 ? Math.min(restart.lastStep, hMax) : 1e-4;
    stalled = false;
    const eventsBefore = tracker.events;
    const res = solver.solve(rhs, t, y, end, solOut);
    segments++;
    steps += res.nAccept;
    rejected += res.nReject;
    if (steps > solver.maxSteps) res.outcome = Outcome.MaxStepsExceeded;
    if (res.outcome === Outcome.EarlyReturn && tracker.events > eventsBefore) {
      // Resume from the start of the dropped step; the switch time becomes a segment end.
      // (Integrating to it and finding an earlier switch on the way simply moves it.)
      t = restart.t;
      y = restart.y.slice();
      target = tracker.pending!.time;
      continue;
    }
    if (res.outcome === Outcome.EarlyReturn && stalled && solver.stabilityCheckCount > 0) {
      // odex's step-size heuristics (its stability check and dense-output error estimate)
      // can starve the step on a right-hand side that is rough at the rounding level, which
      // happens only once the motion has died out far below the tolerances. Go on without them.
      solver.stabilityCheckCount = 0;
      solver.denseOutputErrorEstimator = false;
      t = restart.t;
      y = restart.y.slice();
      continue;
    }
    if (res.outcome !== Outcome.Converged) {
      return {
        ok: false,
        reason: `the integrator gave up near t = ${restart.t.toFixed(3)} s: the setup may be unstable or far too stiff for its masses`,
      };
    }
    y = res.y;
    if (!y.every(Number.isFinite)) {
      return { ok: false, reason: `the motion diverged before t = ${end.toFixed(3)} s` };
    }
    t = end;
    if (end === target && tracker.pending) {
      const event = tracker.pass();
      if (event.which === 0) {
        // The tyre lands or lifts here: carry the wheel velocity over into the new variable.
        const cNew = event.after > 0 ? ct : 0;
        road.sample(t, rb);
        y[3] += (c - cNew) * rb[0];
        c = cNew;
      }
    }
  }
  // The last grid time can sit a rounding error past the end of the run.
  for (let i = 4; i < n; i++) extraAt[i] = y[i];
  while (next < nOut) write(next * dt, y[0], y[1], y[2], y[3]);

  return {
    ok: true,
    trace,
    states,
    stats: { steps, rejectedSteps: rejected, rhsEvaluations: evals, segments, integrateMs: performance.now() - started },
  };
}
