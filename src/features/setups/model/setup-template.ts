import type { SetupInput } from '../../../../shared/schemas/setup.ts';
import { curveFromParameters } from '../../../../shared/sim/damper-builder.ts';

/**
 * What a new setup starts from: a plain small-car front corner (body near 1.2 Hz, rebound
 * twice compression, common practice), to be changed on the bench. Invented numbers.
 */
export function newSetupTemplate(name: string): SetupInput {
  const curve = (bleed: number) =>
    curveFromParameters({ lowSpeedSlope: bleed, kneeVelocity: 0.08, highSpeedSlope: 0.35 * bleed, shape: 'digressive' }).map(([v, f]) => [v, Math.round(f)] as [number, number]);
  return {
    name,
    sprungMass: 300,
    unsprungMass: 36,
    springRate: 20000,
    motionRatio: 0.95,
    tyreRate: 210000,
    tyreDamping: 50,
    damper: { compression: curve(2100), rebound: curve(4200), gas: { force: 250 } },
    bumpStop: { clearance: 0.055, law: { kind: 'polynomial', coefficients: [20000, 0, 4e7] } },
    reboundStop: { clearance: 0.075, law: { kind: 'table', points: [[0.005, 1500], [0.01, 5000], [0.02, 20000]] } },
    stroke: { compression: 0.085, extension: 0.095 },
  };
}
