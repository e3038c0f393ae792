import type { Metrics } from '../../schemas/metrics.ts';
import type { TraceColumns } from '../trace.ts';

/**
 * What the damper did on this road, as a linear engineer would quote it: the energy-equivalent
 * coefficient ΣF·v / Σv² (the viscous damper that takes out the same energy over the same piston
 * motion; for harmonic motion of a square-law damper it is the textbook 8·a·ω·X / 3π), and the
 * mean travel, which an asymmetric damper shifts away from static (a firmer rebound holds the
 * wheel up: the corner sits lower on average).
 */
export function roadDampingFigures(trace: TraceColumns, from: number): Pick<Metrics, 'damperEquivalentOnRoad' | 'travelMean'> {
  let fv = 0;
  let vv = 0;
  let x = 0;
  for (let i = from; i < trace.damperVelocity.length; i++) {
    const v = trace.damperVelocity[i];
    fv += trace.damperForce[i] * v;
    vv += v * v;
    x += trace.travel[i];
  }
  const n = trace.damperVelocity.length - from;
  return { damperEquivalentOnRoad: vv > 0 ? fv / vv : 0, travelMean: n > 0 ? x / n : 0 };
}
