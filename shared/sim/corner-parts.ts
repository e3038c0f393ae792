import type { Setup } from '../schemas/setup.ts';
import { compileControlDemand, targetSetting } from './control-law.ts';
import { compileDamperForce, compileDamperSlope, compileGasChange } from './damper-compiled.ts';
import type { CornerForces, CornerModel, StaticState } from './quarter-car.ts';
import { compileStop } from './stops.ts';

/**
 * The corner with the optional strut parts: a top mount in series with the damper (one more
 * state, its deflection δ along the damper, positive compressed), smoothed strut friction, and
 * a controlled damper (one more state, the valve setting or actuator force, when it lags).
 * Without any of them `cornerModel` keeps its own equations, so today's setups give today's
 * numbers to the last digit.
 *
 * With a mount the strut closes at u = MR·(vu − vs) but the piston moves at v = u − δ̇; the
 * mount force km·δ + cm·δ̇ equals the strut force F(v) (tables, friction, control) plus the gas
 * change. Eliminating δ̇ leaves one equation in v, F(v) + cm·v = km·δ + cm·u − F_gas, whose left
 * side rises strictly (the schema asks for rising tables or mount damping), so Newton's method
 * inside a shrinking bracket finds its one root; on the piecewise-linear tables it lands exactly
 * once in the right segment. The control decides from u (sensors sit on body and wheel, not
 * on the piston), so the setting does not depend on v and F stays monotone in v.
 */

/** Extra states: which slot holds what (−1 when absent). */
export interface PartsLayout {
  mount: number;
  control: number;
  count: number;
}

/** Where the extra states sit in the full state vector (after the four of the bare corner). */
export function partsLayout(setup: Setup): PartsLayout {
  let count = 0;
  const mount = setup.topMount ? 4 + count++ : -1;
  const control = setup.damper.control && setup.damper.control.responseTime > 0 ? 4 + count++ : -1;
  return { mount, control, count };
}

/** True when the setup uses any of the optional strut parts. */
export const hasStrutParts = (setup: Setup): boolean => Boolean(setup.topMount || setup.friction || setup.damper.control);

/** Smallest slope of a table's segments from the implied origin, N·s/m. */
export function minSlope(points: readonly (readonly [number, number])[]): number {
  let v0 = 0;
  let f0 = 0;
  let s = Infinity;
  for (const [v, f] of points) {
    if (v > v0) s = Math.min(s, (f - f0) / (v - v0));
    v0 = v;
    f0 = f;
  }
  return s;
}

const NEWTON_LIMIT = 60;

export function cornerModelWithParts(setup: Setup, statics: StaticState, limitRate: number): CornerModel {
  const ms = setup.sprungMass;
  const mu = setup.unsprungMass;
  const mr = setup.motionRatio;
  const ks = setup.springRate * mr * mr;
  const kt = setup.tyreRate;
  const ct = setup.tyreDamping;
  const fz0 = statics.tyreLoad;
  const soft = compileDamperForce(setup.damper);
  const softSlope = compileDamperSlope(setup.damper);
  const gasChange = compileGasChange(setup.damper.gas);
  const bump = compileStop(setup.bumpStop, 'bump');
  const rebound = compileStop(setup.reboundStop, 'rebound');
  const stroke = setup.stroke;
  const compressionEnd = stroke ? stroke.compression : Infinity;
  const extensionEnd = stroke ? -stroke.extension : -Infinity;

  const layout = partsLayout(setup);
  const mountRate = setup.topMount?.rate ?? 0;
  const mountDamping = setup.topMount?.damping ?? 0;
  const fb0 = setup.friction?.breakaway ?? 0;
  const vf = setup.friction?.smoothingSpeed ?? 1;
  const control = setup.damper.control;
  const firm = control ? compileDamperForce(control.firm) : soft;
  const firmSlope = control ? compileDamperSlope(control.firm) : softSlope;
  const demandOf = control ? compileControlDemand(control.law, mr) : null;
  const bounded = control?.bounds !== 'none';
  const mode = control?.law.mode ?? 'continuous';
  const tau = control?.responseTime ?? 0;
  // Lower bound of dF/dv for the Newton bracket.
  const tables = [setup.damper.compression, setup.damper.rebound, ...(control ? [control.firm.compression, control.firm.rebound] : [])];
  const slopeFloor = Math.min(...tables.map(minSlope)) + mountDamping;

  // Per-call values of the strut law, set by `prepare`.
  let setting = 0;
  let extra = 0;
  const strutForce = (v: number) => {
    const fs = soft(v);
    let f = bounded ? fs + setting * (firm(v) - fs) : fs + extra;
    if (fb0 > 0) f += fb0 * Math.tanh(v / vf);
    return f;
  };
  const strutSlope = (v: number) => {
    const ss = softSlope(v);
    let d = bounded ? ss + setting * (firmSlope(v) - ss) : ss;
    if (fb0 > 0) {
      const c = Math.cosh(v / vf);
      d += fb0 / (vf * c * c);
    }
    return d;
  };

  /** Piston velocity where the strut and the mount carry the same force. */
  const solvePiston = (u: number, rhs: number): number => {
    const g0 = strutForce(u) + mountDamping * u - rhs;
    if (g0 === 0) return u;
    let lo = g0 > 0 ? u - g0 / slopeFloor : u;
    let hi = g0 > 0 ? u : u - g0 / slopeFloor;
    let v = u;
    let g = g0;
    for (let i = 0; i < NEWTON_LIMIT; i++) {
      if (g > 0) hi = v;
      else lo = v;
      const d = strutSlope(v) + mountDamping;
      let next = v - g / d;
      if (!(next > lo && next < hi)) next = (lo + hi) / 2;
      if (Math.abs(next - v) <= 1e-15 * (1 + Math.abs(v))) return next;
      v = next;
      g = strutForce(v) + mountDamping * v - rhs;
      if (g === 0) return v;
    }
    return v;
  };

  /** `states`: false when called without the extra states (see `evaluate` below). */
  const core = (zs: number, vs: number, zu: number, vu: number, zRoad: number, vRoad: number, xe: ArrayLike<number>, dxe: { [i: number]: number }, out: CornerForces, states: boolean) => {
    const controlSlot = states ? layout.control : -1;
    const mountSlot = states ? layout.mount : -1;
    const x = zu - zs;
    const u = mr * (vu - vs);
    if (demandOf) {
      const demand = demandOf(vs, vu);
      if (bounded) {
        const target = targetSetting(mode, demand, u, soft(u), firm(u));
        if (controlSlot >= 0) {
          const s = xe[controlSlot];
          dxe[controlSlot] = (target - s) / tau;
          setting = s < 0 ? 0 : s > 1 ? 1 : s;
        } else {
          setting = target;
        }
      } else if (controlSlot >= 0) {
        extra = xe[controlSlot];
        dxe[controlSlot] = (demand - extra) / tau;
      } else {
        extra = demand;
      }
    }
    let v = u;
    let mountForce: number;
    let fd: number;
    if (mountSlot >= 0) {
      const delta = xe[mountSlot];
      const fg = gasChange === null ? 0 : gasChange(mr * x - delta);
      v = solvePiston(u, mountRate * delta + mountDamping * u - fg);
      dxe[mountSlot] = u - v;
      fd = strutForce(v);
      mountForce = mountRate * delta + mountDamping * (u - v);
    } else {
      fd = strutForce(v);
      mountForce = fd + (gasChange === null ? 0 : gasChange(mr * x));
    }
    const fb = bump === null ? 0 : bump(x);
    const fr = rebound === null ? 0 : rebound(x);
    const limit = x > compressionEnd ? limitRate * (x - compressionEnd) : x < extensionEnd ? limitRate * (x - extensionEnd) : 0;
    const fs = ks * x + mr * mountForce + fb - fr + limit;
    const dyn = kt * (zRoad - zu) + ct * (vRoad - vu);
    const change = dyn > -fz0 ? dyn : -fz0;
    out.bodyAccel = fs / ms;
    out.wheelAccel = (change - fs) / mu;
    out.travel = x;
    out.damperVelocity = v;
    out.damperForce = fd;
    out.bumpStopForce = fb;
    out.reboundStopForce = fr;
    out.tyreLoad = fz0 + change;
  };

  const evaluateExtra = (zs: number, vs: number, zu: number, vu: number, zRoad: number, vRoad: number, xe: ArrayLike<number>, dxe: { [i: number]: number }, out: CornerForces) =>
    core(zs, vs, zu, vu, zRoad, vRoad, xe, dxe, out, true);
  // `evaluate`, for callers that carry only the four states (the vehicle model), takes the
  // mount as rigid and the valve as instant: the parts' forces without their states.
  const none = new Float64Array(0);
  const extraScales = [layout.mount, layout.control].filter((i) => i >= 0).map((i) => (i === layout.mount ? 1e-4 : bounded ? 0.01 : 10));

  return {
    setup,
    statics,
    extraStates: layout.count,
    extraScales,
    evaluate(zs, vs, zu, vu, zRoad, vRoad, out) {
      core(zs, vs, zu, vu, zRoad, vRoad, none, none, out, false);
    },
    evaluateExtra,
    switches(zs, _vs, zu, vu, zRoad, vRoad, out) {
      const x = zu - zs;
      out[0] = fz0 + kt * (zRoad - zu) + ct * (vRoad - vu);
      out[1] = setup.bumpStop ? x - setup.bumpStop.clearance : -1;
      out[2] = setup.reboundStop ? -x - setup.reboundStop.clearance : -1;
      out[3] = stroke ? x - compressionEnd : -1;
      out[4] = stroke ? extensionEnd - x : -1;
    },
  };
}
