import type { Damper } from '../schemas/setup.ts';
import { curveForce, tableForce, type ForceTable } from './damper-force.ts';

/**
 * One linear coefficient standing in for a non-linear damper, for the linear analysis and the
 * figures shown beside a setup. Two definitions are offered; each result carries the sentence
 * the UI shows so a reader knows which one produced the figure.
 */

/** Options of the least-squares equivalent coefficient. */
export interface LeastSquaresRange {
  /** Upper piston speed of the fit, m/s; default 0.3. */
  maxSpeed?: number;
}

/** An equivalent linear damping coefficient at the damper, with the words that define it. */
export interface EquivalentDamping {
  /** Mean of the two directions, N·s/m at the damper. */
  coefficient: number;
  compression: number;
  rebound: number;
  /** One sentence for the UI saying how the figure was obtained. */
  definition: string;
}

/** Upper piston speed of the least-squares fit when none is chosen, m/s. */
export const DEFAULT_FIT_MAX_SPEED = 0.3;

/**
 * The sentence defining the least-squares coefficient; `upTo` is the fit's upper piston speed as
 * the reader sees it ("0.3 m/s", "300 mm/s"), so a page can say it in the reader's unit.
 */
export const leastSquaresWords = (upTo: string) => `least-squares slope through the origin of each curve over 0–${upTo} piston speed, mean of compression and rebound`;

/**
 * Least-squares slope through the origin of one table over speeds 0…vMax, treating the table
 * as a continuous curve: c = ∫F·v dv / ∫v² dv. Exact for the piecewise-linear law (each segment
 * is integrated in closed form), so no sampling choice enters the figure.
 */
export function leastSquaresSlope(table: ForceTable, vMax: number): number {
  const knots: Array<[number, number]> = [[0, 0]];
  for (const [v, f] of table) if (v > 0 && v < vMax) knots.push([v, f]);
  knots.push([vMax, tableForce(table, vMax)]);
  let num = 0;
  for (let i = 1; i < knots.length; i++) {
    const [a, fa] = knots[i - 1];
    const [b, fb] = knots[i];
    if (b <= a) continue;
    // ∫_a^b F(v)·v dv with F linear between (a, fa) and (b, fb).
    const s = (fb - fa) / (b - a);
    const f0 = fa - s * a;
    num += (f0 * (b * b - a * a)) / 2 + (s * (b ** 3 - a ** 3)) / 3;
  }
  return num / (vMax ** 3 / 3);
}

/**
 * Equivalent linear coefficient as the least-squares slope through the origin over piston
 * speeds 0…maxSpeed (default 0.3 m/s), averaged over compression and rebound. Averaging the
 * two directions matches the energy a symmetric oscillation dissipates per cycle.
 */
export function equivalentDampingLeastSquares(damper: Damper, range: LeastSquaresRange = {}): EquivalentDamping {
  const vMax = range.maxSpeed ?? DEFAULT_FIT_MAX_SPEED;
  const compression = leastSquaresSlope(damper.compression, vMax);
  const rebound = leastSquaresSlope(damper.rebound, vMax);
  return {
    coefficient: (compression + rebound) / 2,
    compression,
    rebound,
    definition: leastSquaresWords(`${vMax} m/s`),
  };
}

/**
 * Equivalent linear coefficient as the secant at a reference piston speed (default 0.1 m/s):
 * c = F(vRef) / vRef per direction, averaged over compression and rebound.
 */
export function equivalentDampingSecant(damper: Damper, referenceSpeed = 0.1): EquivalentDamping {
  const compression = curveForce(damper.compression, referenceSpeed) / referenceSpeed;
  const rebound = curveForce(damper.rebound, referenceSpeed) / referenceSpeed;
  return {
    coefficient: (compression + rebound) / 2,
    compression,
    rebound,
    definition: `secant force/speed at ${referenceSpeed} m/s piston speed, mean of compression and rebound`,
  };
}
