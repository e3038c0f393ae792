import type { EndStop, StopLaw } from '../schemas/setup.ts';
import { compileTableForce } from './damper-compiled.ts';
import { tableForce } from './damper-force.ts';

/**
 * End stops at the wheel. Travel x is positive in compression and measured from the static
 * position; a bump stop pushes once x exceeds its clearance, a rebound stop once −x does.
 * Forces returned here are magnitudes (≥ 0); the equations of motion give them their sign.
 */

/** Force of a stop law at deflection δ ≥ 0 beyond the clearance, N. */
export function stopLawForce(law: StopLaw, deflection: number): number {
  if (deflection <= 0) return 0;
  if (law.kind === 'table') return tableForce(law.points, deflection);
  let f = 0;
  let p = deflection;
  for (const c of law.coefficients) {
    f += c * p;
    p *= deflection;
  }
  return f;
}

/** Bump stop force at travel x (positive compression), N ≥ 0. */
export function bumpStopForce(stop: EndStop | undefined, travel: number): number {
  return stop ? stopLawForce(stop.law, travel - stop.clearance) : 0;
}

/** Rebound stop force at travel x (negative in extension), N ≥ 0. */
export function reboundStopForce(stop: EndStop | undefined, travel: number): number {
  return stop ? stopLawForce(stop.law, -travel - stop.clearance) : 0;
}

/**
 * Energy stored in a stop law at deflection δ, J: ∫0^δ F. Closed form for the polynomial,
 * trapezoids for the piecewise-linear table (exact there). Used by the energy checks.
 */
export function stopLawEnergy(law: StopLaw, deflection: number): number {
  if (deflection <= 0) return 0;
  if (law.kind === 'polynomial') {
    let e = 0;
    law.coefficients.forEach((c, i) => (e += (c * deflection ** (i + 2)) / (i + 2)));
    return e;
  }
  let e = 0;
  let d0 = 0;
  let f0 = 0;
  for (const [d1] of law.points) {
    const d = Math.min(d1, deflection);
    const f = tableForce(law.points, d);
    e += ((f0 + f) * (d - d0)) / 2;
    d0 = d;
    f0 = f;
    if (d1 >= deflection) return e;
  }
  return e + ((f0 + tableForce(law.points, deflection)) * (deflection - d0)) / 2;
}

/** Compiled stop (travel → force ≥ 0) for the equations of motion; `null` when absent. */
export function compileStop(stop: EndStop | undefined, side: 'bump' | 'rebound'): ((travel: number) => number) | null {
  if (!stop) return null;
  const sign = side === 'bump' ? 1 : -1;
  const clearance = stop.clearance;
  const law = stop.law;
  if (law.kind === 'table') {
    const f = compileTableForce(law.points);
    return (travel) => {
      const d = sign * travel - clearance;
      return d > 0 ? f(d) : 0;
    };
  }
  const c = Float64Array.from(law.coefficients);
  return (travel) => {
    const d = sign * travel - clearance;
    if (d <= 0) return 0;
    let force = 0;
    for (let i = c.length - 1; i >= 0; i--) force = (force + c[i]) * d;
    return force;
  };
}
