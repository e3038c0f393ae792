import type { CornerModel } from './quarter-car.ts';
import type { RoadExcitation } from './roads/excitation.ts';
import { integrateOdex } from './integrate-odex.ts';
import { integrateRk4 } from './integrate-rk4.ts';
import { DEFAULT_INTEGRATOR, type IntegrationOptions, type IntegrationOutcome } from './integration-options.ts';
import { integrateVehicleRk4, type AxleRoads, type VehicleIntegrationOptions, type VehicleIntegrationOutcome } from './vehicle/integrate-vehicle.ts';
import type { VehicleModel } from './vehicle/vehicle-model.ts';

/**
 * Time integration of the corner, sampled on a uniform output grid, by one of two methods:
 * - `rk4` (the default for single runs, live runs and studies): classic Runge–Kutta 4 at a
 *   step chosen from the corner's fastest dynamics, on the road sampled once, with every regime
 *   switch located on the step's cubic Hermite interpolant and restarted at
 *   (integrate-rk4.ts, step choice in step-plan.ts);
 * - `odex` (the reference): Gragg–Bulirsch–Stoer extrapolation with error control at a
 *   relative tolerance, the same switch location on its dense output (integrate-odex.ts).
 * Both start from the same state, fill the same trace columns and report the same statistics.
 */

export function integrateCorner(model: CornerModel, road: RoadExcitation, opts: IntegrationOptions): IntegrationOutcome {
  return (opts.integrator ?? DEFAULT_INTEGRATOR) === 'odex' ? integrateOdex(model, road, opts) : integrateRk4(model, road, opts);
}

/**
 * Time integration of the pitch-plane vehicle (vehicle/vehicle-model.ts) by the corner's
 * default method, fixed-step RK4 with located switches, on both axles at once
 * (vehicle/integrate-vehicle.ts). The odex reference is corner-only for now.
 */
export function integrateVehicle(model: VehicleModel, roads: AxleRoads, opts: VehicleIntegrationOptions): VehicleIntegrationOutcome {
  return integrateVehicleRk4(model, roads, opts);
}
