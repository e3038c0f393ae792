import type { Road } from '../../schemas/road.ts';
import { VehicleRunRequest, type VehicleLinearResult, type VehicleRunRequestInput, type VehicleRunResult } from '../../schemas/vehicle-run.ts';
import type { FieldIssue } from '../../errors.ts';
import { integrateVehicle } from '../integrate.ts';
import { buildRoad } from '../roads/index.ts';
import { fieldIssues } from '../run-corner.ts';
import { flatRideChecks } from './flat-ride.ts';
import { axleRoads, type VehicleTrace } from './integrate-vehicle.ts';
import { vehicleFigures } from './vehicle-figures.ts';
import { linearVehicle, vehicleModes } from './vehicle-linear.ts';
import { seatsOf, vehicleModel, vehicleStatics, type VehicleStatics } from './vehicle-model.ts';
import { wheelbaseFilterZeros } from './vehicle-response.ts';

export type VehicleRunOutcome =
  | { ok: true; result: VehicleRunResult; trace: VehicleTrace }
  | { ok: false; stage: 'input' | 'integration'; reason: string; issues?: FieldIssue[] };

const DEFAULT_OUTPUT_RATE = 500;
const DEFAULT_SETTLE = 2;
/** Highest wheelbase-filter frequency listed, Hz (above the wheel hops of a car). */
const FILTER_LIST_HZ = 30;

/** Linear figures of the vehicle at a speed (no integration). */
export function vehicleLinearResult(statics: VehicleStatics, speed: number): VehicleLinearResult {
  const modes = vehicleModes(linearVehicle(statics));
  return {
    modes: modes.modes,
    dynamicIndex: modes.dynamicIndex,
    geometry: statics.geometry,
    flatRide: flatRideChecks(statics, modes),
    wheelbaseFilter: wheelbaseFilterZeros(statics.geometry.wheelbase, speed, FILTER_LIST_HZ),
  };
}

/**
 * One vehicle run: validate, find both axles' statics, build the road under each axle (the
 * rear a wheelbase behind the front), integrate, compute the seat and axle figures and the
 * linear analysis. Expected failures come back as values, as for a corner run.
 */
export function runVehicle(input: VehicleRunRequestInput): VehicleRunOutcome {
  const started = performance.now();
  const parsed = VehicleRunRequest.safeParse(input);
  if (!parsed.success) {
    const issues = fieldIssues(parsed.error);
    return { ok: false, stage: 'input', reason: `${issues[0].path}: ${issues[0].message}`, issues };
  }
  const req = parsed.data;
  const { vehicle, speed, duration } = req;
  const st = vehicleStatics(vehicle);
  if (!st.ok) return { ok: false, stage: 'input', reason: `vehicle.${st.reason}` };
  const statics = st.statics;

  const road: Road = req.road.kind === 'iso8608' && req.seed !== undefined ? { ...req.road, seed: req.seed } : req.road;
  const delay = statics.geometry.wheelbase / speed;
  const f = vehicle.front;
  const r = vehicle.rear;
  const rearBuilt = buildRoad(road, speed, duration + delay, r.tyreFootprint, r.tyreRadius);
  if (!rearBuilt.ok) return { ok: false, stage: 'input', reason: rearBuilt.reason };
  const sameTyre = f.tyreFootprint === r.tyreFootprint && f.tyreRadius === r.tyreRadius;
  const frontBuilt = sameTyre ? rearBuilt : buildRoad(road, speed, duration + delay, f.tyreFootprint, f.tyreRadius);
  if (!frontBuilt.ok) return { ok: false, stage: 'input', reason: frontBuilt.reason };

  const outputRate = req.outputRate ?? DEFAULT_OUTPUT_RATE;
  const transient = road.kind === 'iso8608' || road.kind === 'measured' || road.kind === 'sine';
  const settleTime = req.settleTime ?? (transient ? Math.min(DEFAULT_SETTLE, duration / 4) : 0);
  if (duration - settleTime < 4 / outputRate) return { ok: false, stage: 'input', reason: 'settleTime: leaves too little of the run to analyse' };

  const integrated = integrateVehicle(vehicleModel(statics), axleRoads(rearBuilt.road, delay, frontBuilt.road), { duration, outputRate });
  if (!integrated.ok) return { ok: false, stage: 'integration', reason: integrated.reason };
  const { trace, stats } = integrated;
  const summary = { ...rearBuilt.road.summary, distance: speed * duration };
  const result: VehicleRunResult = {
    vehicleName: vehicle.name,
    road: summary,
    speed,
    duration,
    settleTime,
    outputRate,
    wheelbaseDelay: delay,
    linear: vehicleLinearResult(statics, speed),
    figures: vehicleFigures(trace, statics, seatsOf(vehicle), settleTime),
    timing: {
      integrateMs: stats.integrateMs,
      totalMs: performance.now() - started,
      steps: stats.steps,
      rejectedSteps: stats.rejectedSteps,
      rhsEvaluations: stats.rhsEvaluations,
      segments: stats.segments,
    },
  };
  return { ok: true, result, trace };
}
