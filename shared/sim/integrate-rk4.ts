import { createEventTracker } from './event-tracker.ts';
import { allocateStates, outputCount, type IntegrationOptions, type IntegrationOutcome } from './integration-options.ts';
import { newCornerForces, SWITCH_COUNT, type CornerModel } from './quarter-car.ts';
import type { RoadExcitation } from './roads/excitation.ts';
import { sampleRoad, stepOf, stepPlanFor } from './step-plan.ts';
import { allocateTrace, writeSample } from './trace.ts';

/**
 * The default integration of the corner: classic fourth-order Runge–Kutta at a fixed step
 * chosen from the corner's fastest dynamics (step-plan.ts), on the road sampled once on the
 * step's half-step grid, with each regime switch located and restarted at.
 *
 * - Road. Inside a regular step the road comes from the sampled grid (two samples per step,
 *   shared by every point of a study); only pieces off the grid (see below) ask the road itself.
 * - Switches (tyre lift-off and landing, stop contact, any force law the model switches on a
 *   function of its state: `CornerModel.switches`). After each step the sign of every switch
 *   is compared with its regime (event-tracker.ts); on a change the step is dropped, the
 *   earliest crossing is found by the Illinois method on the step's cubic Hermite interpolant
 *   (built from the states and derivatives at both ends, fourth-order accurate like the
 *   step itself), and the step is taken again as one RK4 step up to the crossing and a second
 *   one from there to the grid point. No step straddles a change of law, so the order of the
 *   method holds through contact. A contact that starts and ends inside one step (under 4 ms
 *   on the demo corner) is stepped across, as is every damper-table kink: the force stays
 *   continuous there.
 * - Road breakpoints (bump edges, kerb ramp ends) end a piece the same way.
 * - Output. The forces at each step's end are the next step's first stage and the output
 *   sample there; samples inside a step (the middle sample of a two-sample step, every sample
 *   of a piece off the grid) are the model evaluated on the Hermite interpolant.
 */

/** Located switches allowed per run before contact is stepped across (a chattering contact). */
const MAX_EVENTS = 20_000;
/**
 * Pieces each step is cut into while any switch is out of its starting regime (a stop
 * touching, the wheel in the air). Contact brings the stiffest force laws of the model, and
 * stop tables have kinks of their own that are stepped across; a quarter step there keeps stop
 * strikes within 0.1 % of odex at 1e-8 (integrate-rk4.test.ts) at the cost of the few per cent
 * of the run spent in contact.
 */
const CONTACT_PIECES = 4;
/** |zs| or |zu| beyond this, m, is a diverged run. */
const DIVERGED = 10;

export function integrateRk4(model: CornerModel, road: RoadExcitation, opts: IntegrationOptions): IntegrationOutcome {
  const started = performance.now();
  const rate = opts.outputRate;
  const T = opts.duration;
  const sampled = opts.sampled ?? sampleRoad(road, T, stepPlanFor(model.setup, rate), rate);
  const plan = sampled.plan;
  const h = stepOf(plan, rate);
  const hFine = h / CONTACT_PIECES;
  const nSteps = Math.ceil(T / h - 1e-9);
  if (sampled.z.length < 2 * nSteps + 1) throw new Error('integrateRk4: the sampled road is shorter than the run');
  const dtOut = 1 / rate;
  const nOut = outputCount(T, rate);
  const trace = opts.reuse && opts.reuse.bodyAccel.length === nOut && opts.reuse.dt === dtOut ? opts.reuse : allocateTrace(nOut, dtOut);
  const states = opts.recordStates ? allocateStates(nOut) : undefined;
  const rz = sampled.z;
  const rv = sampled.v;
  const ev = model.evaluate;
  const f = newCornerForces();
  const fOut = newCornerForces();
  const rb = new Float64Array(2);
  const sw = new Float64Array(SWITCH_COUNT);
  const tracker = createEventTracker(SWITCH_COUNT, { maxEvents: MAX_EVENTS });
  const breaks = road.breakpoints.filter((b) => b > 0 && b < T);
  const slack = dtOut * 1e-9;

  // State and derivative at the start (y0, d0) and end (y1, d1) of the current piece:
  // [zs, vs, zu, vu] and [vs, body accel, vu, wheel accel], then the model's extra states
  // (a top mount's deflection, a lagging control's setting) and their rates.
  const nx = model.extraStates ?? 0;
  const n = 4 + nx;
  const y0 = new Float64Array(n);
  const d0 = new Float64Array(n);
  const y1 = new Float64Array(n);
  const d1 = new Float64Array(n);
  const yi = new Float64Array(n);
  let evals = 0;

  // With extra states every evaluation goes through `full`: state vector in, rates out.
  const xs = new Float64Array(n);
  const xd = new Float64Array(n);
  const evx = model.evaluateExtra;
  const full = (y: Float64Array, zr: number, vr: number, d: Float64Array, forces: typeof f) => {
    evx!(y[0], y[1], y[2], y[3], zr, vr, y, d, forces);
    d[0] = y[1];
    d[1] = forces.bodyAccel;
    d[2] = y[3];
    d[3] = forces.wheelAccel;
  };
  const ka = new Float64Array(n);
  const kb = new Float64Array(n);
  const kc = new Float64Array(n);

  if (opts.initial) y0.set(opts.initial);
  if (nx > 0) {
    full(y0, rz[0], rv[0], d0, f);
  } else {
    ev(y0[0], y0[1], y0[2], y0[3], rz[0], rv[0], f);
    d0[0] = y0[1];
    d0[1] = f.bodyAccel;
    d0[2] = y0[3];
    d0[3] = f.wheelAccel;
  }
  evals++;
  const put = (i: number, y: Float64Array, forces: typeof f, zRoad: number) => {
    writeSample(trace, i, forces, zRoad);
    if (states) {
      states.bodyDisplacement[i] = y[0];
      states.bodyVelocity[i] = y[1];
      states.wheelDisplacement[i] = y[2];
      states.wheelVelocity[i] = y[3];
    }
  };
  put(0, y0, f, rz[0]);
  model.switches(y0[0], y0[1], y0[2], y0[3], rz[0], rv[0], sw);
  tracker.start(sw);

  /**
   * One RK4 step of length H from (y0, d0), road at the middle (zm, vm) and end (ze, ve), into
   * (y1, d1); leaves the forces at the end in `f`.
   */
  const step = (H: number, zm: number, vm: number, ze: number, ve: number) => {
    if (nx > 0) {
      stepFull(H, zm, vm, ze, ve);
      return;
    }
    const H2 = H / 2;
    const zs = y0[0];
    const vs = y0[1];
    const zu = y0[2];
    const vu = y0[3];
    const a1 = d0[1];
    const b1 = d0[3];
    const vs2 = vs + H2 * a1;
    const vu2 = vu + H2 * b1;
    ev(zs + H2 * vs, vs2, zu + H2 * vu, vu2, zm, vm, f);
    const a2 = f.bodyAccel;
    const b2 = f.wheelAccel;
    const vs3 = vs + H2 * a2;
    const vu3 = vu + H2 * b2;
    ev(zs + H2 * vs2, vs3, zu + H2 * vu2, vu3, zm, vm, f);
    const a3 = f.bodyAccel;
    const b3 = f.wheelAccel;
    const vs4 = vs + H * a3;
    const vu4 = vu + H * b3;
    ev(zs + H * vs3, vs4, zu + H * vu3, vu4, ze, ve, f);
    const H6 = H / 6;
    y1[0] = zs + H6 * (vs + 2 * vs2 + 2 * vs3 + vs4);
    y1[1] = vs + H6 * (a1 + 2 * a2 + 2 * a3 + f.bodyAccel);
    y1[2] = zu + H6 * (vu + 2 * vu2 + 2 * vu3 + vu4);
    y1[3] = vu + H6 * (b1 + 2 * b2 + 2 * b3 + f.wheelAccel);
    ev(y1[0], y1[1], y1[2], y1[3], ze, ve, f);
    d1[0] = y1[1];
    d1[1] = f.bodyAccel;
    d1[2] = y1[3];
    d1[3] = f.wheelAccel;
    evals += 4;
  };

  /** The same RK4 step over every state, extra ones included. */
  const stepFull = (H: number, zm: number, vm: number, ze: number, ve: number) => {
    const H2 = H / 2;
    for (let c = 0; c < n; c++) xs[c] = y0[c] + H2 * d0[c];
    full(xs, zm, vm, ka, f);
    for (let c = 0; c < n; c++) xs[c] = y0[c] + H2 * ka[c];
    full(xs, zm, vm, kb, f);
    for (let c = 0; c < n; c++) xs[c] = y0[c] + H * kb[c];
    full(xs, ze, ve, kc, f);
    const H6 = H / 6;
    for (let c = 0; c < n; c++) y1[c] = y0[c] + H6 * (d0[c] + 2 * ka[c] + 2 * kb[c] + kc[c]);
    full(y1, ze, ve, d1, f);
    evals += 4;
  };

  /** The piece's cubic Hermite interpolant at share u of its length H, into yi. */
  const hermite = (u: number, H: number) => {
    const u2 = u * u;
    const u3 = u2 * u;
    const h00 = 2 * u3 - 3 * u2 + 1;
    const h10 = (u3 - 2 * u2 + u) * H;
    const h01 = 1 - h00;
    const h11 = (u3 - u2) * H;
    for (let c = 0; c < n; c++) yi[c] = h00 * y0[c] + h10 * d0[c] + h01 * y1[c] + h11 * d1[c];
  };

  /** Switch k on the current piece (from ta, length H) at time t. */
  let pieceStart = 0;
  let pieceLength = h;
  const switchAt = (k: number, t: number) => {
    hermite((t - pieceStart) / pieceLength, pieceLength);
    road.sample(t, rb);
    model.switches(yi[0], yi[1], yi[2], yi[3], rb[0], rb[1], sw);
    return sw[k];
  };

  /** Writes the samples inside (ta, tb) from the interpolant, and the one at tb from `f` if the grid has one there. */
  let next = 1;
  const wide = plan.outputsPerStep === 2;
  /** `mid`: index of the road grid at the piece's middle when the piece is a whole step, else −1. */
  const emit = (ta: number, tb: number, zEnd: number, mid: number) => {
    const H = tb - ta;
    while (next < nOut && next * dtOut < tb - slack) {
      const t = next * dtOut;
      hermite((t - ta) / H, H);
      // The middle sample of a whole two-sample step sits on the road grid; others ask the road.
      if (mid >= 0 && wide) {
        rb[0] = rz[mid];
        rb[1] = rv[mid];
      } else {
        road.sample(t, rb);
      }
      if (nx > 0) full(yi, rb[0], rb[1], xd, fOut);
      else ev(yi[0], yi[1], yi[2], yi[3], rb[0], rb[1], fOut);
      put(next++, yi, fOut, rb[0]);
    }
    if (next < nOut && next * dtOut <= tb + slack) put(next++, y1, f, zEnd);
  };

  let s = 0;
  let t = 0;
  let bi = 0;
  let pieces = 0;
  let rejected = 0;
  let segments = 1;
  while (s < nSteps) {
    const gridEnd = (s + 1) * h;
    const j = 2 * s;
    const onGrid = t === s * h;
    let tb = gridEnd;
    if (tracker.displaced) {
      // A stop touches or the wheel is in the air: shorter pieces (see CONTACT_PIECES).
      const k = Math.floor((t - s * h) / hFine + 1e-9) + 1;
      if (k < CONTACT_PIECES) tb = s * h + k * hFine;
    }
    let atBreak = false;
    if (bi < breaks.length && breaks[bi] < tb - slack) {
      tb = breaks[bi];
      atBreak = true;
    }
    let zEnd: number;
    let vEnd: number;
    let whole = onGrid && tb === gridEnd;
    if (whole) {
      zEnd = rz[j + 2];
      vEnd = rv[j + 2];
      step(h, rz[j + 1], rv[j + 1], zEnd, vEnd);
    } else {
      road.sample((t + tb) / 2, rb);
      const zm = rb[0];
      const vm = rb[1];
      if (tb === gridEnd) {
        zEnd = rz[j + 2];
        vEnd = rv[j + 2];
      } else {
        road.sample(tb, rb);
        zEnd = rb[0];
        vEnd = rb[1];
      }
      step(tb - t, zm, vm, zEnd, vEnd);
    }
    pieces++;
    model.switches(y1[0], y1[1], y1[2], y1[3], zEnd, vEnd, sw);
    let event = false;
    if (tracker.changed(sw)) {
      pieceStart = t;
      pieceLength = tb - t;
      if (tracker.locate(switchAt, t, tb)) {
        // Take the step again, up to the switch; the rest of the step follows as its own piece.
        rejected++;
        tb = tracker.pending!.time;
        atBreak = false;
        whole = false;
        event = true;
        road.sample((t + tb) / 2, rb);
        const zm = rb[0];
        const vm = rb[1];
        road.sample(tb, rb);
        zEnd = rb[0];
        step(tb - t, zm, vm, zEnd, rb[1]);
        pieces++;
      }
    }
    emit(t, tb, zEnd, whole ? j + 1 : -1);
    if (event) {
      tracker.pass();
      segments++;
    } else {
      tracker.accept(sw);
    }
    if (atBreak) {
      bi++;
      segments++;
    }
    if (!(Math.abs(y1[0]) < DIVERGED && Math.abs(y1[2]) < DIVERGED)) {
      return { ok: false, reason: `the motion diverged near t = ${tb.toFixed(3)} s: the setup may be unstable or far too stiff for its masses` };
    }
    y0.set(y1);
    d0.set(d1);
    if (tb === gridEnd) {
      s++;
      t = s * h;
    } else {
      t = tb;
    }
  }
  return {
    ok: true,
    trace,
    states,
    stats: { steps: pieces - rejected, rejectedSteps: rejected, rhsEvaluations: evals, segments, integrateMs: performance.now() - started },
  };
}
