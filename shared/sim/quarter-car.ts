import type { Setup } from '../schemas/setup.ts';
import type { LinearCorner } from './linear/linear-corner.ts';
import { cornerModelWithParts, hasStrutParts } from './corner-parts.ts';
import { compileDamperForce, compileGasChange } from './damper-compiled.ts';
import { type EquivalentDamping, equivalentDampingLeastSquares } from './damper-equivalent.ts';
import { staticGasForce } from './damper-gas.ts';
import { compileStop } from './stops.ts';

/** Standard gravity used throughout, m/s² (docs/model.md §1). */
export const GRAVITY = 9.81;

/**
 * Two-mass corner. States are [zs, vs, zu, vu]: body and wheel displacement (m, positive up)
 * and velocity (m/s), all measured from static equilibrium. Travel x = zu − zs is positive in
 * compression; the damper moves MR·x and its force acts at the wheel times MR. The spring and
 * the tyre are linear; the tyre only pushes (its force is clipped at zero: lift-off).
 */

/** The corner at rest on a flat road. */
export interface StaticState {
  /** Fz0 = (ms + mu)·g, N. */
  tyreLoad: number;
  /** Tyre compression at rest, m. */
  tyreDeflection: number;
  /** Gas force at the damper at rest, N. */
  gasForce: number;
  /** Spring force at the wheel at rest (body weight less the gas share), N. */
  springForceAtWheel: number;
  /** Spring compression at rest measured at the wheel, m (at the spring: × motionRatio). */
  springDeflection: number;
  /** How far the body sits below where it would float without gravity, m. */
  bodySag: number;
  /** The same for the wheel, m. */
  wheelSag: number;
}

export type StaticOutcome = { ok: true; state: StaticState } | { ok: false; reason: string };

/** Wheel rate ks = springRate·MR², N/m. */
export const wheelRate = (setup: Setup): number => setup.springRate * setup.motionRatio ** 2;

/**
 * Static equilibrium. Positions are defined from the static ride position (stop clearances
 * and gas pressure are given there), so the spring carries what the gas does not; stops
 * touch at most with zero force. Fails when the gas alone would lift the body.
 */
export function staticEquilibrium(setup: Setup): StaticOutcome {
  const ms = setup.sprungMass;
  const mu = setup.unsprungMass;
  const tyreLoad = (ms + mu) * GRAVITY;
  const gas = staticGasForce(setup.damper.gas);
  const springForceAtWheel = ms * GRAVITY - setup.motionRatio * gas;
  if (springForceAtWheel < 0) {
    return {
      ok: false,
      reason: `damper.gas: the gas force at the wheel (${(setup.motionRatio * gas).toFixed(0)} N) exceeds the body weight on this corner (${(ms * GRAVITY).toFixed(0)} N)`,
    };
  }
  const springDeflection = springForceAtWheel / wheelRate(setup);
  const tyreDeflection = tyreLoad / setup.tyreRate;
  return {
    ok: true,
    state: {
      tyreLoad,
      tyreDeflection,
      gasForce: gas,
      springForceAtWheel,
      springDeflection,
      bodySag: springDeflection + tyreDeflection,
      wheelSag: tyreDeflection,
    },
  };
}

/** Forces and accelerations at one instant, filled in place by `CornerModel.evaluate`. */
export interface CornerForces {
  bodyAccel: number;
  wheelAccel: number;
  travel: number;
  damperVelocity: number;
  /** At the damper, N, positive resisting compression. */
  damperForce: number;
  /** At the wheel, N ≥ 0. */
  bumpStopForce: number;
  reboundStopForce: number;
  /** Contact force, N ≥ 0. */
  tyreLoad: number;
}

export const newCornerForces = (): CornerForces => ({
  bodyAccel: 0,
  wheelAccel: 0,
  travel: 0,
  damperVelocity: 0,
  damperForce: 0,
  bumpStopForce: 0,
  reboundStopForce: 0,
  tyreLoad: 0,
});

/**
 * Number of regime switches watched by the integrator: tyre contact, bump stop, rebound stop,
 * and the hard limits at the two ends of the stroke.
 */
export const SWITCH_COUNT = 5;

/** Default stiffness of the end-of-stroke limits, as a multiple of the tyre rate. */
export const END_OF_STROKE_RATE_PER_TYRE_RATE = 20;

/** Stiffness of the hard limits at the ends of the stroke, N/m at the wheel. */
export const endOfStrokeRate = (setup: Setup): number => setup.stroke?.limitRate ?? END_OF_STROKE_RATE_PER_TYRE_RATE * setup.tyreRate;

export interface CornerModel {
  setup: Setup;
  statics: StaticState;
  /** Evaluates the equations of motion; allocates nothing. */
  evaluate(zs: number, vs: number, zu: number, vu: number, zRoad: number, vRoad: number, out: CornerForces): void;
  /**
   * Writes one value per regime switch whose sign tells the regime: [tyre force before
   * clipping (N; > 0 in contact), bump-stop engagement (m; > 0 touching), rebound-stop
   * engagement (m), travel beyond the compression end of the stroke (m), beyond the extension
   * end (m)]. An absent stop or stroke reads −1 everywhere, so it never switches.
   */
  switches(zs: number, vs: number, zu: number, vu: number, zRoad: number, vRoad: number, out: Float64Array): void;
  /**
   * States beyond the four of the bare corner: a top mount's deflection, a lagging control's
   * setting (corner-parts.ts). Absent or 0 for a corner without them; `evaluate` then is all.
   */
  extraStates?: number;
  /** Typical size of each extra state (for the integrators' absolute tolerances). */
  extraScales?: readonly number[];
  /**
   * `evaluate` with the extra states read from the full state vector `x` (they follow the four
   * at index 4, 5, …) and their rates written at the same places of `dx`.
   */
  evaluateExtra?(zs: number, vs: number, zu: number, vu: number, zRoad: number, vRoad: number, x: ArrayLike<number>, dx: { [i: number]: number }, out: CornerForces): void;
}

/** Compiles a setup into its equations of motion (after `staticEquilibrium` succeeded). */
export function cornerModel(setup: Setup, statics: StaticState): CornerModel {
  if (hasStrutParts(setup)) return cornerModelWithParts(setup, statics, endOfStrokeRate(setup));
  const ms = setup.sprungMass;
  const mu = setup.unsprungMass;
  const mr = setup.motionRatio;
  const ks = wheelRate(setup);
  const kt = setup.tyreRate;
  const ct = setup.tyreDamping;
  const fz0 = statics.tyreLoad;
  const damper = compileDamperForce(setup.damper);
  const gasChange = compileGasChange(setup.damper.gas);
  const bump = compileStop(setup.bumpStop, 'bump');
  const rebound = compileStop(setup.reboundStop, 'rebound');
  // The ends of the stroke: a hard linear limit beyond the travel the corner has. Absent
  // without a stroke (the travel is then unbounded, as before strokes were given).
  const stroke = setup.stroke;
  const limitRate = endOfStrokeRate(setup);
  const compressionEnd = stroke ? stroke.compression : Infinity;
  const extensionEnd = stroke ? -stroke.extension : -Infinity;

  return {
    setup,
    statics,
    evaluate(zs, vs, zu, vu, zRoad, vRoad, out) {
      const x = zu - zs;
      const vd = mr * (vu - vs);
      const fd = damper(vd);
      const fb = bump === null ? 0 : bump(x);
      const fr = rebound === null ? 0 : rebound(x);
      const limit = x > compressionEnd ? limitRate * (x - compressionEnd) : x < extensionEnd ? limitRate * (x - extensionEnd) : 0;
      // Gas preload is already in the static balance; only its change with stroke acts here.
      const fg = gasChange === null ? 0 : gasChange(mr * x);
      // Suspension force on the body beyond its static share (up positive).
      const fs = ks * x + mr * (fd + fg) + fb - fr + limit;
      // Tyre force change from static, clipped where the total would go negative. Written
      // relative to Fz0 (kt × static deflection = Fz0) so that near rest no rounding noise of Fz0
      // enters the wheel acceleration: that noise once starved odex dense-output error
      // estimate into ever smaller steps.
      const dyn = kt * (zRoad - zu) + ct * (vRoad - vu);
      const change = dyn > -fz0 ? dyn : -fz0;
      out.bodyAccel = fs / ms;
      out.wheelAccel = (change - fs) / mu;
      out.travel = x;
      out.damperVelocity = vd;
      out.damperForce = fd;
      out.bumpStopForce = fb;
      out.reboundStopForce = fr;
      out.tyreLoad = fz0 + change;
    },
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

/**
 * Rate the polytropic gas adds at static, at the wheel, N/m: d/dx of MR·F(MR·x) at x = 0,
 * MR²·n·F0·A/V0. Zero for a constant gas force.
 */
export function gasRateAtWheel(setup: Setup): number {
  const gas = setup.damper.gas;
  if (!gas?.polytropic || gas.rodArea === undefined) return 0;
  return (setup.motionRatio ** 2 * gas.polytropic.exponent * staticGasForce(gas) * gas.rodArea) / gas.polytropic.volume;
}

/**
 * The corner reduced to linear elements at the wheel for the modal and frequency-response
 * analysis: ks = springRate·MR² (plus the gas rate at static), c = c_eq·MR² with c_eq from the
 * damper curves (least squares over 0–0.3 m/s unless another definition is passed in).
 * Optional parts: a top mount enters as its rate and damping × MR² in series with the damper;
 * a controlled damper as its soft tables plus the law's gains acting without bounds or delay
 * (skyhook on the body, groundhook on the wheel, each × MR², weighted by the blend); friction is
 * left out (a Coulomb force has no linear equivalent that holds at every amplitude).
 */
export function linearCorner(setup: Setup, equivalent: EquivalentDamping = equivalentDampingLeastSquares(setup.damper)): LinearCorner {
  const mr2 = setup.motionRatio ** 2;
  return {
    sprungMass: setup.sprungMass,
    unsprungMass: setup.unsprungMass,
    wheelRate: wheelRate(setup) + gasRateAtWheel(setup),
    wheelDamping: equivalent.coefficient * mr2,
    tyreRate: setup.tyreRate,
    tyreDamping: setup.tyreDamping,
    ...linearParts(setup),
  };
}

function linearParts(setup: Setup): Partial<LinearCorner> {
  const mr2 = setup.motionRatio ** 2;
  const out: Partial<LinearCorner> = {};
  if (setup.topMount) {
    out.mountRate = setup.topMount.rate * mr2;
    out.mountDamping = setup.topMount.damping * mr2;
  }
  const law = setup.damper.control?.law;
  if (law) {
    const sky = law.kind === 'skyhook' ? law.gain : law.kind === 'blend' ? law.blend * law.skyGain : 0;
    const ground = law.kind === 'groundhook' ? law.gain : law.kind === 'blend' ? (1 - law.blend) * law.groundGain : 0;
    out.skyDamping = sky * mr2;
    out.groundDamping = ground * mr2;
  }
  return out;
}
