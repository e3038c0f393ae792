import type { DriveChannel } from '../schemas/drive.ts';
import type { IntegratorName } from '../schemas/run.ts';
import type { Setup } from '../schemas/setup.ts';
import { integrateCorner } from '../sim/integrate.ts';
import { cornerModel, staticEquilibrium } from '../sim/quarter-car.ts';
import type { RoadExcitation } from '../sim/roads/excitation.ts';

export type ModelChannels = Record<DriveChannel, Float64Array>;
export type DriveSimOutcome = { ok: true; channels: ModelChannels } | { ok: false; reason: string };

/**
 * The corner driven over a road given on the drive's time grid, from rest in static equilibrium,
 * sampled on the same grid: the signals a drive log holds. The wheel's acceleration follows from
 * the two force balances (mu·au = tyre force change − ms·as); damper travel is the wheel travel
 * times the motion ratio.
 */
export function simulateDrive(setup: Setup, road: RoadExcitation, samples: number, dt: number, integrator: IntegratorName = 'rk4', tolerance?: number): DriveSimOutcome {
  const statics = staticEquilibrium(setup);
  if (!statics.ok) return statics;
  const duration = (samples - 1) * dt;
  const run = integrateCorner(cornerModel(setup, statics.state), road, { duration, outputRate: 1 / dt, integrator, tolerance });
  if (!run.ok) return run;
  const { trace } = run;
  const n = Math.min(samples, trace.bodyAccel.length);
  const fz0 = statics.state.tyreLoad;
  const wheelAccel = new Float64Array(samples);
  const damperTravel = new Float64Array(samples);
  const bodyAccel = new Float64Array(samples);
  const wheelTravel = new Float64Array(samples);
  for (let i = 0; i < n; i++) {
    bodyAccel[i] = trace.bodyAccel[i];
    wheelTravel[i] = trace.travel[i];
    wheelAccel[i] = (trace.tyreLoad[i] - fz0 - setup.sprungMass * trace.bodyAccel[i]) / setup.unsprungMass;
    damperTravel[i] = setup.motionRatio * trace.travel[i];
  }
  return { ok: true, channels: { bodyAccel, wheelAccel, damperTravel, wheelTravel } };
}
