import type { ModalResult } from '../../../../shared/schemas/modal.ts';
import type { Setup } from '../../../../shared/schemas/setup.ts';
import { type EquivalentDamping, equivalentDampingLeastSquares } from '../../../../shared/sim/damper-equivalent.ts';
import { modalAnalysis } from '../../../../shared/sim/linear/modal.ts';
import { linearCorner, wheelRate } from '../../../../shared/sim/quarter-car.ts';

export interface DraftFigures {
  modal: ModalResult;
  equivalent: EquivalentDamping;
  /** Spring rate × MR², N/m (without the gas rate). */
  springWheelRate: number;
  /** What the linear analysis uses: spring wheel rate plus the gas rate at static, N/m. */
  analysisWheelRate: number;
}

/** The simulation core's linear analysis of a (valid) draft, the same reduction a run reports. */
export function draftFigures(setup: Setup): DraftFigures {
  const equivalent = equivalentDampingLeastSquares(setup.damper);
  const corner = linearCorner(setup, equivalent);
  return { modal: modalAnalysis(corner, equivalent.definition), equivalent, springWheelRate: wheelRate(setup), analysisWheelRate: corner.wheelRate };
}
