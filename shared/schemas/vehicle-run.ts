import { z } from 'zod';
import { ComfortGrading } from './metrics.ts';
import { ModeFigures } from './modal.ts';
import { checkRunScenario, RoadSummary, RunTiming, runScenarioFields } from './run.ts';
import { VehicleSetup } from './vehicle-setup.ts';

/** One run of the pitch-plane vehicle over a road at a speed (rk4, the corner's default method). */
export const VehicleRunRequest = z.strictObject({ vehicle: VehicleSetup, ...runScenarioFields }).superRefine(checkRunScenario);
export type VehicleRunRequest = z.infer<typeof VehicleRunRequest>;
export type VehicleRunRequestInput = z.input<typeof VehicleRunRequest>;

export const VehicleModeFigures = ModeFigures.extend({
  /** Shape magnitudes scaled to the largest displacement (heave m, pitch rad, wheels m). */
  shape: z.object({ heave: z.number(), pitch: z.number(), front: z.number(), rear: z.number() }),
  /** Body modes: where the body stands still, m behind the front axle; null if it barely pitches (or a wheel hop). */
  nodeBehindFrontAxle: z.number().nullable(),
});

/** Linear analysis of the vehicle at static equilibrium. */
export const VehicleLinearResult = z.object({
  modes: z.object({ heave: VehicleModeFigures, pitch: VehicleModeFigures, frontHop: VehicleModeFigures, rearHop: VehicleModeFigures }),
  /** k² / (a·b). */
  dynamicIndex: z.number(),
  geometry: z.object({ mass: z.number(), inertia: z.number(), a: z.number(), b: z.number(), wheelbase: z.number() }),
  /** Common practice, not a standard (sim/vehicle/flat-ride.ts). */
  flatRide: z.object({
    frontHz: z.number(),
    rearHz: z.number(),
    ratio: z.number(),
    ratioBand: z.object({ low: z.number(), high: z.number() }),
    frontBelowRear: z.boolean(),
    ratioInBand: z.boolean(),
    pitchOverHeave: z.number(),
    pitchNearHeave: z.boolean(),
  }),
  /** At the run's speed, up to 30 Hz. */
  wheelbaseFilter: z.object({ heaveHz: z.array(z.number()), pitchHz: z.array(z.number()) }),
});
export type VehicleLinearResult = z.infer<typeof VehicleLinearResult>;

export const SeatFigures = z.object({
  name: z.string(),
  behindFrontAxle: z.number(),
  /** Unweighted vertical acceleration RMS and peak, m/s². */
  accelRms: z.number(),
  accelPeak: z.number(),
  /** Wk-weighted vertical RMS (aw) and VDV. */
  verticalWkRms: z.number(),
  verticalVdv: z.number(),
  /** √((1·aw,z)² + (0.40·aw,pitch)²), m/s². */
  pointTotal: z.number(),
  comfort: ComfortGrading,
});
export type SeatFigures = z.infer<typeof SeatFigures>;

export const AxleFigures = z.object({
  tyreLoadStatic: z.number(),
  tyreLoadRms: z.number(),
  /** RMS load variation over static (per corner). */
  tyreLoadRatio: z.number(),
  tyreLoadMin: z.number(),
  liftOffFraction: z.number(),
  travelRms: z.number(),
  travelMaxCompression: z.number(),
  travelMaxExtension: z.number(),
  bumpStopTime: z.number(),
  reboundStopTime: z.number(),
  strokeUsedCompression: z.number().optional(),
  strokeUsedExtension: z.number().optional(),
});
export type AxleFigures = z.infer<typeof AxleFigures>;

export const VehicleFigures = z.object({
  analysedTime: z.number(),
  heaveAccelRms: z.number(),
  heaveAccelPeak: z.number(),
  /** rad/s². */
  pitchAccelRms: z.number(),
  pitchAccelPeak: z.number(),
  /** We-weighted pitch RMS, rad/s² (the same at every seat of a rigid body). */
  pitchWeRms: z.number(),
  seats: z.array(SeatFigures),
  front: AxleFigures,
  rear: AxleFigures,
});
export type VehicleFigures = z.infer<typeof VehicleFigures>;

export const VehicleRunResult = z.object({
  vehicleName: z.string(),
  road: RoadSummary,
  speed: z.number(),
  duration: z.number(),
  settleTime: z.number(),
  outputRate: z.number(),
  /** L / V, s. */
  wheelbaseDelay: z.number(),
  linear: VehicleLinearResult,
  figures: VehicleFigures,
  timing: RunTiming,
});
export type VehicleRunResult = z.infer<typeof VehicleRunResult>;
