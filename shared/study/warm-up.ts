import { Setup } from '../schemas/setup.ts';
import { createStudyRunner } from './run-jobs.ts';

/** An invented mid-size front corner, only for warming the study code up. */
const corner = Setup.parse({
  name: 'Warm-up corner',
  sprungMass: 300,
  unsprungMass: 36,
  springRate: 30000,
  motionRatio: 0.95,
  tyreRate: 200000,
  damper: {
    compression: [[0.05, 80], [0.2, 200], [1, 500]],
    rebound: [[0.05, 180], [0.2, 460], [1, 1150]],
    gas: { pressure: 1.1e6, rodArea: 2e-4, polytropic: { volume: 1.2e-4, exponent: 1.2 } },
  },
  bumpStop: { clearance: 0.05, law: { kind: 'polynomial', coefficients: [20000, 0, 4e7] } },
  reboundStop: { clearance: 0.07, law: { kind: 'table', points: [[0.005, 1500], [0.02, 20000]] } },
  stroke: { compression: 0.08, extension: 0.09 },
});

/**
 * A few short runs so the integrator and the metrics are compiled before the first real batch:
 * a cold worker otherwise runs its first batches several times slower. A few tens of milliseconds.
 */
export function warmUpStudyCode(): void {
  const runner = createStudyRunner({ base: corner, roads: [{ kind: 'iso8608', class: 'C', seed: 1 }], duration: 8 });
  for (let i = 0; i < 10; i++) runner.run({ pointIndex: i, values: { damperScale: 0.6 + 0.1 * i }, roadIndex: 0, speed: 20 });
}
