import { z } from 'zod';
import type { Damper, DamperCurve } from '../schemas/setup.ts';
import { equivalentDampingLeastSquares, type LeastSquaresRange } from './damper-equivalent.ts';

/**
 * Damper curves from a few numbers, and the scalings a sweep applies to a curve.
 *
 * A direction is described by its bleed slope below the knee, the knee speed, the slope just
 * above the knee and the shape of the curve above it:
 *   F(v) = cLow·v                                          for v ≤ vKnee
 *   F(v) = Fk + cHigh·vKnee·((1 + u/vKnee)^e − 1)/e       for v > vKnee, u = v − vKnee
 * with Fk = cLow·vKnee. The slope above the knee starts at cHigh for every shape and then
 * falls (digressive, e = 0.5, the slope halves by three knee speeds past the knee), stays
 * (linear, e = 1) or grows (progressive, e = 2, a square law like an orifice). So above the
 * knee digressive ≤ linear ≤ progressive, and all three agree below it.
 */

export const damperShapes = ['digressive', 'linear', 'progressive'] as const;
export const DamperShape = z.enum(damperShapes);
export type DamperShape = z.infer<typeof DamperShape>;

const shapeExponent: Record<DamperShape, number> = { digressive: 0.5, linear: 1, progressive: 2 };

/** Parameters of one direction, at the damper. */
export const CurveParameters = z.strictObject({
  /** Slope below the knee (bleed), N·s/m. */
  lowSpeedSlope: z.number().positive().max(1e6),
  /** Piston speed where the valve opens, m/s. */
  kneeVelocity: z.number().positive().max(5),
  /** Slope just above the knee, N·s/m. */
  highSpeedSlope: z.number().nonnegative().max(1e6),
  shape: DamperShape,
});
export type CurveParameters = z.infer<typeof CurveParameters>;

/** Piston speeds of a built table, m/s (the knee is added). Common dyno speeds; no standard. */
export const DEFAULT_TABLE_VELOCITIES = [0.025, 0.05, 0.1, 0.15, 0.2, 0.3, 0.5, 0.75, 1.0] as const;

/** Force of the parametric law at piston speed v ≥ 0, N. */
export function parametricForce(p: CurveParameters, v: number): number {
  const vk = p.kneeVelocity;
  if (v <= vk) return p.lowSpeedSlope * v;
  const e = shapeExponent[p.shape];
  const u = v - vk;
  return p.lowSpeedSlope * vk + (p.highSpeedSlope * vk * ((1 + u / vk) ** e - 1)) / e;
}

/** The table the parameters generate, sampled at `velocities` plus the knee. */
export function curveFromParameters(p: CurveParameters, velocities: readonly number[] = DEFAULT_TABLE_VELOCITIES): DamperCurve {
  const vs = [...velocities.filter((v) => v > 0), p.kneeVelocity].sort((a, b) => a - b);
  const unique = vs.filter((v, i) => i === 0 || v - vs[i - 1] > 1e-9);
  return unique.map((v) => [v, parametricForce(p, v)] as const) as unknown as DamperCurve;
}

/** Every force of a curve times `factor` (> 0). */
export function scaleCurve(curve: DamperCurve, factor: number): DamperCurve {
  return curve.map(([v, f]) => [v, f * factor] as const) as unknown as DamperCurve;
}

/** Both directions scaled; the gas charge is a pressure, not damping, and stays. */
export function scaleDamper(damper: Damper, factor: number): Damper {
  return { ...damper, compression: scaleCurve(damper.compression, factor), rebound: scaleCurve(damper.rebound, factor) };
}

/**
 * Re-balances compression against rebound while keeping the overall damping: each direction
 * is scaled so that the ratio of their least-squares equivalent coefficients becomes
 * `reboundToCompression` and their mean stays what it was. Common practice puts the ratio
 * between about 1.5 and 3.
 */
export function splitDamper(damper: Damper, reboundToCompression: number, range: LeastSquaresRange = {}): Damper {
  const eq = equivalentDampingLeastSquares(damper, range);
  const r = reboundToCompression;
  const targetCompression = (2 * eq.coefficient) / (1 + r);
  const targetRebound = (2 * eq.coefficient * r) / (1 + r);
  return {
    ...damper,
    compression: scaleCurve(damper.compression, targetCompression / eq.compression),
    rebound: scaleCurve(damper.rebound, targetRebound / eq.rebound),
  };
}
