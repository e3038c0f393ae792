import type { DamperCurve, Setup } from '../schemas/setup.ts';
import type { TargetPoint, TargetSheetContent } from '../schemas/target-sheet.ts';
import { curveForce } from '../sim/damper-force.ts';
import { staticGasForce } from '../sim/damper-gas.ts';

/**
 * Default reference piston speeds, m/s: a spread from the bleed range through the knee to high
 * speed, denser at the low end where ride is decided (common practice for damper
 * specifications; the team edits them per sheet).
 */
export const defaultReferenceSpeeds: readonly number[] = [0.025, 0.05, 0.1, 0.2, 0.3, 0.5, 1.0];

/**
 * Default band: ±10 % with a 20 N floor (common practice for production damper tolerances; the
 * floor keeps the band workable at the slowest speeds). Editable per point.
 */
export const defaultTolerance = { tolPct: 10, floorN: 20 } as const;

/**
 * Reference points of one direction read off a damper curve (the simulation's own table lookup),
 * forces rounded to the nearest newton as a sheet states them.
 */
export function targetPointsFromCurve(
  curve: DamperCurve,
  speeds: readonly number[] = defaultReferenceSpeeds,
  tolerance: { tolPct: number; floorN: number } = defaultTolerance,
): TargetPoint[] {
  return [...speeds]
    .sort((a, b) => a - b)
    .map((velocity) => ({ velocity, force: Math.round(curveForce(curve, velocity)), tolPct: tolerance.tolPct, floorN: tolerance.floorN }));
}

/** A new sheet's body from a setup: both directions at the same speeds, its static gas force, no notes. */
export function targetSheetContentFromSetup(
  setup: Pick<Setup, 'damper'>,
  speeds: readonly number[] = defaultReferenceSpeeds,
  tolerance: { tolPct: number; floorN: number } = defaultTolerance,
): TargetSheetContent {
  return {
    compression: targetPointsFromCurve(setup.damper.compression, speeds, tolerance),
    rebound: targetPointsFromCurve(setup.damper.rebound, speeds, tolerance),
    gasForce: Math.round(staticGasForce(setup.damper.gas)),
    notes: '',
  };
}
