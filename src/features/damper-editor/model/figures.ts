import type { Damper } from '../../../../shared/schemas/setup.ts';
import { equivalentDampingLeastSquares } from '../../../../shared/sim/damper-equivalent.ts';
import { modalAnalysis } from '../../../../shared/sim/linear/modal.ts';

/** The corner figures the damping ratio needs (SI). */
export interface CornerContext {
  motionRatio: number;
  sprungMass: number;
  /** Wheel rate, N/m (spring rate × MR², plus any gas rate the caller includes). */
  wheelRate: number;
  /** With these two the exact body damping ratio of the two-mass corner is shown too. */
  unsprungMass?: number;
  tyreRate?: number;
  tyreDamping?: number;
}

export interface DampingFigures {
  /** Least-squares equivalent coefficient at the damper, N·s/m, and per direction. */
  atDamper: number;
  compression: number;
  rebound: number;
  /** Rebound over compression of the equivalent coefficients. */
  split: number;
  /** At the wheel, N·s/m: atDamper × MR². */
  atWheel: number;
  /** ζ ≈ c / (2√(ks·ms)), single mass on the wheel rate. */
  classicZeta: number;
  /** Body-mode ζ from the eigenvalues of the linear two-mass corner, when the tyre is known. */
  exactZeta: number | null;
}

/**
 * Live figures of a damper on a corner. The equivalent coefficient is the one the simulation
 * core uses for the linear corner (`equivalentDampingLeastSquares` over its default range,
 * DEFAULT_FIT_MAX_SPEED), so these match the modal figures of a run.
 */
export function dampingFigures(damper: Damper, corner: CornerContext): DampingFigures {
  const eq = equivalentDampingLeastSquares(damper);
  const atWheel = eq.coefficient * corner.motionRatio ** 2;
  const classicZeta = atWheel / (2 * Math.sqrt(corner.wheelRate * corner.sprungMass));
  let exactZeta: number | null = null;
  if (corner.unsprungMass !== undefined && corner.tyreRate !== undefined) {
    const modal = modalAnalysis(
      {
        sprungMass: corner.sprungMass,
        unsprungMass: corner.unsprungMass,
        wheelRate: corner.wheelRate,
        wheelDamping: atWheel,
        tyreRate: corner.tyreRate,
        tyreDamping: corner.tyreDamping ?? 0,
      },
      eq.definition,
    );
    exactZeta = modal.body.dampingRatio;
  }
  return {
    atDamper: eq.coefficient,
    compression: eq.compression,
    rebound: eq.rebound,
    split: eq.rebound / eq.compression,
    atWheel,
    classicZeta,
    exactZeta,
  };
}
