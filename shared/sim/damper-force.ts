import type { Damper, DamperCurve } from '../schemas/setup.ts';

/**
 * The damper's force law as the setup states it: one force-velocity table per direction.
 * Sign convention: piston velocity and force are positive in compression (force resisting the
 * wheel moving towards the body); negative velocity is rebound. This is the reference form; the
 * equations of motion use the compiled copy in damper-compiled.ts, held equal to this one by
 * its tests.
 */

/** A force table: ascending (speed or deflection ≥ 0, force) points. */
export type ForceTable = ReadonlyArray<readonly [number, number]>;

/**
 * Force of a table at a speed ≥ 0: piecewise linear from an implied (0, 0), extrapolated past
 * the last point with the last segment's slope. Also used for end-stop tables.
 */
export function tableForce(table: ForceTable, speed: number): number {
  let v0 = 0;
  let f0 = 0;
  for (let i = 0; i < table.length; i++) {
    const [v1, f1] = table[i];
    if (speed <= v1 || i === table.length - 1) {
      if (v1 === v0) return f1;
      return f0 + ((f1 - f0) * (speed - v0)) / (v1 - v0);
    }
    v0 = v1;
    f0 = f1;
  }
  return 0;
}

/** Force of one direction's curve at a piston speed ≥ 0, N. */
export const curveForce = (curve: DamperCurve, speed: number): number => tableForce(curve, speed);

/** Signed damper force at a signed piston velocity (positive = compression), N. */
export function damperForce(damper: Pick<Damper, 'compression' | 'rebound'>, velocity: number): number {
  return velocity >= 0 ? curveForce(damper.compression, velocity) : -curveForce(damper.rebound, -velocity);
}
