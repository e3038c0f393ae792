import { complexGains } from '../../shared/sim/linear/frequency-response.ts';
import type { LinearCorner } from '../../shared/sim/linear/linear-corner.ts';
import { wkResponse } from '../../shared/sim/metrics/iso2631.ts';

/**
 * Band-limited mean squares ∫ |H(f)|²·G(f) df over [f0, f1] for an ISO 8608 road with waviness 2
 * at speed V: G(f) = Gd(f/V)/V = Gd(n0)·n0²·V / f² (one-sided, m²/Hz). Uses the project's
 * frequency response; trapezoid rule in ln f on `points` nodes.
 */
export function bandMeanSquares(corner: LinearCorner, gdn0: number, speed: number, f0: number, f1: number, points = 20001) {
  const sums = { bodyAccel: 0, weighted: 0, travel: 0, tyreLoad: 0 };
  const h = Math.log(f1 / f0) / (points - 1);
  for (let i = 0; i < points; i++) {
    const f = f0 * Math.exp(i * h);
    const g = (gdn0 * 0.01 * speed) / (f * f);
    const wgt = (i === 0 || i === points - 1 ? 0.5 : 1) * h * f * g;
    const [acc, trv, load] = complexGains(corner, f);
    const acc2 = acc[0] ** 2 + acc[1] ** 2;
    sums.bodyAccel += wgt * acc2;
    sums.weighted += wgt * acc2 * wkResponse(f) ** 2;
    sums.travel += wgt * (trv[0] ** 2 + trv[1] ** 2);
    sums.tyreLoad += wgt * (load[0] ** 2 + load[1] ** 2);
  }
  return sums;
}
