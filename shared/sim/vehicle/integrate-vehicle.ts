import { createEventTracker, DEFAULT_DEADBANDS } from '../event-tracker.ts';
import { outputCount, type IntegrationStats } from '../integration-options.ts';
import { SWITCH_COUNT } from '../quarter-car.ts';
import type { RoadExcitation } from '../roads/excitation.ts';
import { sampleRoad, stepOf, stepPlanFor, type SampledRoad } from '../step-plan.ts';
import { allocateTrace, writeSample, type TraceColumns } from '../trace.ts';
import { newVehicleForces, VEHICLE_STATE_COUNT, VEHICLE_SWITCH_COUNT, type VehicleForces, type VehicleModel } from './vehicle-model.ts';

/**
 * Time integration of the pitch-plane vehicle by the corner's default method (integrate-rk4.ts):
 * classic RK4 at a fixed step, the smaller of the two axles' step plans (step-plan.ts), on
 * both axles' roads sampled once on the step's half-step grid; each regime switch of either
 * axle (event-tracker.ts) is located on the step's cubic Hermite interpolant and the step is
 * taken again up to it; road breakpoints of either axle end a piece; steps are quartered while
 * any switch is out of its starting regime. With identical axles, the CG mid-way and a dynamic
 * index of 1, each axle therefore follows its corner's run step for step
 * (vehicle-quarter-car.test.ts).
 */

/** The road under each axle: the rear meets what the front met a wheelbase earlier. */
export interface AxleRoads {
  front: RoadExcitation;
  rear: RoadExcitation;
  /** L / V, s. */
  delay: number;
}

/**
 * Axle inputs from the road built for duration + delay (once per axle when their tyres read it
 * differently, else `frontRoad` is the same road): the rear axle starts at the road's origin
 * and the front a wheelbase ahead of it, so no input is read before the road begins.
 */
export function axleRoads(road: RoadExcitation, delay: number, frontRoad: RoadExcitation = road): AxleRoads {
  const front: RoadExcitation = {
    sample(t, out) {
      frontRoad.sample(t + delay, out);
    },
    breakpoints: frontRoad.breakpoints.map((b) => b - delay).filter((b) => b > 0),
    summary: frontRoad.summary,
  };
  return { front, rear: road, delay };
}

export interface VehicleTrace {
  dt: number;
  /** Heave acceleration at the CG, m/s². */
  heaveAccel: Float64Array;
  /** Pitch acceleration, rad/s², nose up positive. */
  pitchAccel: Float64Array;
  /** Per axle, one corner's columns; `bodyAccel` is the body's vertical acceleration over the axle. */
  front: TraceColumns;
  rear: TraceColumns;
}

export interface VehicleIntegrationOptions {
  duration: number;
  outputRate: number;
  /** Initial state (vehicle-model.ts order); default at rest in equilibrium. */
  initial?: ArrayLike<number>;
}

export type VehicleIntegrationOutcome = { ok: true; trace: VehicleTrace; stats: IntegrationStats } | { ok: false; reason: string };

const MAX_EVENTS = 20_000;
const CONTACT_PIECES = 4;
const DIVERGED = 10;
const N = VEHICLE_STATE_COUNT;

export function integrateVehicleRk4(model: VehicleModel, roads: AxleRoads, opts: VehicleIntegrationOptions): VehicleIntegrationOutcome {
  const started = performance.now();
  const rate = opts.outputRate;
  const T = opts.duration;
  const planFront = stepPlanFor(model.statics.frontSetup, rate);
  const planRear = stepPlanFor(model.statics.rearSetup, rate);
  const plan = stepOf(planFront, rate) <= stepOf(planRear, rate) ? planFront : planRear;
  const sf: SampledRoad = sampleRoad(roads.front, T, plan, rate);
  const sr: SampledRoad = sampleRoad(roads.rear, T, plan, rate);
  const h = stepOf(plan, rate);
  const hFine = h / CONTACT_PIECES;
  const nSteps = Math.ceil(T / h - 1e-9);
  const dtOut = 1 / rate;
  const nOut = outputCount(T, rate);
  const trace: VehicleTrace = {
    dt: dtOut,
    heaveAccel: new Float64Array(nOut),
    pitchAccel: new Float64Array(nOut),
    front: allocateTrace(nOut, dtOut),
    rear: allocateTrace(nOut, dtOut),
  };
  const f = newVehicleForces();
  const fOut = newVehicleForces();
  const sw = new Float64Array(VEHICLE_SWITCH_COUNT);
  const deadbands = [0, 1].flatMap(() => Array.from({ length: SWITCH_COUNT }, (_, k) => DEFAULT_DEADBANDS[Math.min(k, DEFAULT_DEADBANDS.length - 1)]));
  const tracker = createEventTracker(VEHICLE_SWITCH_COUNT, { deadbands, maxEvents: MAX_EVENTS });
  const breaks = [...new Set([...roads.front.breakpoints, ...roads.rear.breakpoints])].filter((b) => b > 0 && b < T).sort((x, y) => x - y);
  const slack = dtOut * 1e-9;
  // Road under both axles at one time: [zf, vf, zr, vr].
  const rd = new Float64Array(4);
  const rb = new Float64Array(2);
  const roadAt = (t: number, out: Float64Array) => {
    roads.front.sample(t, rb);
    out[0] = rb[0];
    out[1] = rb[1];
    roads.rear.sample(t, rb);
    out[2] = rb[0];
    out[3] = rb[1];
  };
  const roadOnGrid = (j: number, out: Float64Array) => {
    out[0] = sf.z[j];
    out[1] = sf.v[j];
    out[2] = sr.z[j];
    out[3] = sr.v[j];
  };

  const y0 = new Float64Array(N);
  const d0 = new Float64Array(N);
  const y1 = new Float64Array(N);
  const d1 = new Float64Array(N);
  const yi = new Float64Array(N);
  const ys = new Float64Array(N);
  const k2 = new Float64Array(N);
  const k3 = new Float64Array(N);
  const k4 = new Float64Array(N);
  const rm = new Float64Array(4);
  const re = new Float64Array(4);
  let evals = 0;

  /** Derivative at y with the road r into dy; forces left in `forces`. */
  const deriv = (y: Float64Array, r: Float64Array, dy: Float64Array, forces: VehicleForces) => {
    model.evaluate(y, r[0], r[1], r[2], r[3], forces);
    dy[0] = y[1];
    dy[1] = forces.heaveAccel;
    dy[2] = y[3];
    dy[3] = forces.pitchAccel;
    dy[4] = y[5];
    dy[5] = forces.front.wheelAccel;
    dy[6] = y[7];
    dy[7] = forces.rear.wheelAccel;
    evals++;
  };

  const put = (i: number, forces: VehicleForces, r: Float64Array) => {
    trace.heaveAccel[i] = forces.heaveAccel;
    trace.pitchAccel[i] = forces.pitchAccel;
    writeSample(trace.front, i, forces.front, r[0]);
    writeSample(trace.rear, i, forces.rear, r[2]);
  };

  if (opts.initial) y0.set(opts.initial);
  roadOnGrid(0, rd);
  deriv(y0, rd, d0, f);
  put(0, f, rd);
  model.switches(y0, rd[0], rd[1], rd[2], rd[3], sw);
  tracker.start(sw);

  /** One RK4 step of length H from (y0, d0), road at the middle rm and end re, into (y1, d1). */
  const step = (H: number) => {
    const H2 = H / 2;
    for (let c = 0; c < N; c++) ys[c] = y0[c] + H2 * d0[c];
    deriv(ys, rm, k2, f);
    for (let c = 0; c < N; c++) ys[c] = y0[c] + H2 * k2[c];
    deriv(ys, rm, k3, f);
    for (let c = 0; c < N; c++) ys[c] = y0[c] + H * k3[c];
    deriv(ys, re, k4, f);
    const H6 = H / 6;
    for (let c = 0; c < N; c++) y1[c] = y0[c] + H6 * (d0[c] + 2 * k2[c] + 2 * k3[c] + k4[c]);
    deriv(y1, re, d1, f);
  };

  const hermite = (u: number, H: number) => {
    const u2 = u * u;
    const u3 = u2 * u;
    const h00 = 2 * u3 - 3 * u2 + 1;
    const h10 = (u3 - 2 * u2 + u) * H;
    const h01 = 1 - h00;
    const h11 = (u3 - u2) * H;
    for (let c = 0; c < N; c++) yi[c] = h00 * y0[c] + h10 * d0[c] + h01 * y1[c] + h11 * d1[c];
  };

  let pieceStart = 0;
  let pieceLength = h;
  const rs = new Float64Array(4);
  const switchAt = (k: number, t: number) => {
    hermite((t - pieceStart) / pieceLength, pieceLength);
    roadAt(t, rs);
    model.switches(yi, rs[0], rs[1], rs[2], rs[3], sw);
    return sw[k];
  };

  let next = 1;
  const wide = plan.outputsPerStep === 2;
  const ro = new Float64Array(4);
  const dOut = new Float64Array(N);
  const emit = (ta: number, tb: number, mid: number) => {
    const H = tb - ta;
    while (next < nOut && next * dtOut < tb - slack) {
      const t = next * dtOut;
      hermite((t - ta) / H, H);
      if (mid >= 0 && wide) roadOnGrid(mid, ro);
      else roadAt(t, ro);
      deriv(yi, ro, dOut, fOut);
      put(next++, fOut, ro);
    }
    if (next < nOut && next * dtOut <= tb + slack) put(next++, f, re);
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
      const k = Math.floor((t - s * h) / hFine + 1e-9) + 1;
      if (k < CONTACT_PIECES) tb = s * h + k * hFine;
    }
    let atBreak = false;
    if (bi < breaks.length && breaks[bi] < tb - slack) {
      tb = breaks[bi];
      atBreak = true;
    }
    let whole = onGrid && tb === gridEnd;
    if (whole) {
      roadOnGrid(j + 1, rm);
      roadOnGrid(j + 2, re);
    } else {
      roadAt((t + tb) / 2, rm);
      if (tb === gridEnd) roadOnGrid(j + 2, re);
      else roadAt(tb, re);
    }
    step(tb - t);
    pieces++;
    model.switches(y1, re[0], re[1], re[2], re[3], sw);
    let event = false;
    if (tracker.changed(sw)) {
      pieceStart = t;
      pieceLength = tb - t;
      if (tracker.locate(switchAt, t, tb)) {
        rejected++;
        tb = tracker.pending!.time;
        atBreak = false;
        whole = false;
        event = true;
        roadAt((t + tb) / 2, rm);
        roadAt(tb, re);
        step(tb - t);
        pieces++;
      }
    }
    emit(t, tb, whole ? j + 1 : -1);
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
    if (!(Math.abs(y1[0]) < DIVERGED && Math.abs(y1[2]) < 1 && Math.abs(y1[4]) < DIVERGED && Math.abs(y1[6]) < DIVERGED)) {
      return { ok: false, reason: `the motion diverged near t = ${tb.toFixed(3)} s: the vehicle may be unstable or far too stiff for its masses` };
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
    stats: { steps: pieces - rejected, rejectedSteps: rejected, rhsEvaluations: evals, segments, integrateMs: performance.now() - started },
  };
}
