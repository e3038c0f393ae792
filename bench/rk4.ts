import { allocateTrace } from '../shared/sim/integrate.ts';
import { newCornerForces, type CornerModel } from '../shared/sim/quarter-car.ts';
import type { RoadExcitation } from '../shared/sim/roads/excitation.ts';
import type { TraceColumns } from '../shared/sim/trace.ts';

/**
 * Baseline for the benchmark only: the classic fixed-step fourth-order Runge–Kutta method
 * on the same equations of motion and road, no error control, no event handling. Samples
 * every `stride` steps (1 kHz steps, stride 2 = the runner's 500 Hz grid).
 */
export function rk4Corner(model: CornerModel, road: RoadExcitation, duration: number, step = 1e-3, stride = 2): { trace: TraceColumns; rhsEvaluations: number } {
  const nSteps = Math.round(duration / step);
  const trace = allocateTrace(Math.floor(nSteps / stride) + 1, step * stride);
  const f = newCornerForces();
  const rb = new Float64Array(2);
  let evals = 0;
  const k = new Float64Array(16);
  const deriv = (t: number, zs: number, vs: number, zu: number, vu: number, o: number) => {
    evals++;
    road.sample(t, rb);
    model.evaluate(zs, vs, zu, vu, rb[0], rb[1], f);
    k[o] = vs;
    k[o + 1] = f.bodyAccel;
    k[o + 2] = vu;
    k[o + 3] = f.wheelAccel;
  };
  let zs = 0;
  let vs = 0;
  let zu = 0;
  let vu = 0;
  const sample = (i: number, t: number) => {
    road.sample(t, rb);
    model.evaluate(zs, vs, zu, vu, rb[0], rb[1], f);
    trace.bodyAccel[i] = f.bodyAccel;
    trace.travel[i] = f.travel;
    trace.tyreLoad[i] = f.tyreLoad;
    trace.damperVelocity[i] = f.damperVelocity;
    trace.damperForce[i] = f.damperForce;
    trace.bumpStopForce[i] = f.bumpStopForce;
    trace.reboundStopForce[i] = f.reboundStopForce;
    trace.road[i] = rb[0];
  };
  sample(0, 0);
  const h = step;
  for (let n = 0; n < nSteps; n++) {
    const t = n * h;
    deriv(t, zs, vs, zu, vu, 0);
    deriv(t + h / 2, zs + (h / 2) * k[0], vs + (h / 2) * k[1], zu + (h / 2) * k[2], vu + (h / 2) * k[3], 4);
    deriv(t + h / 2, zs + (h / 2) * k[4], vs + (h / 2) * k[5], zu + (h / 2) * k[6], vu + (h / 2) * k[7], 8);
    deriv(t + h, zs + h * k[8], vs + h * k[9], zu + h * k[10], vu + h * k[11], 12);
    zs += (h / 6) * (k[0] + 2 * k[4] + 2 * k[8] + k[12]);
    vs += (h / 6) * (k[1] + 2 * k[5] + 2 * k[9] + k[13]);
    zu += (h / 6) * (k[2] + 2 * k[6] + 2 * k[10] + k[14]);
    vu += (h / 6) * (k[3] + 2 * k[7] + 2 * k[11] + k[15]);
    if ((n + 1) % stride === 0) sample((n + 1) / stride, (n + 1) * h);
  }
  return { trace, rhsEvaluations: evals };
}
