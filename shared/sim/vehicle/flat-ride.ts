import { FLAT_RIDE_RATIO_BAND } from '../../schemas/vehicle.ts';
import { modalAnalysis } from '../linear/modal.ts';
import { linearCorner } from '../quarter-car.ts';
import type { VehicleModes } from './vehicle-linear.ts';
import type { VehicleStatics } from './vehicle-model.ts';

/**
 * The flat-ride checks engineers apply to a front/rear pair (common practice, rules of thumb,
 * not a standard): the front end's body frequency below the rear's, so the rear catches up with
 * the front's motion after a bump and the body settles level; the rear-over-front ratio within
 * a modest band; pitch and heave frequencies close together (within 20 %), so neither motion
 * stands out. Each end's frequency is its corner's body mode at the corner's share of the body.
 */
export const PITCH_HEAVE_BAND = 0.2;

export interface FlatRideChecks {
  frontHz: number;
  rearHz: number;
  /** rearHz / frontHz. */
  ratio: number;
  ratioBand: { low: number; high: number };
  frontBelowRear: boolean;
  ratioInBand: boolean;
  /** Pitch over heave natural frequency. */
  pitchOverHeave: number;
  pitchNearHeave: boolean;
}

export function flatRideChecks(statics: VehicleStatics, modes: VehicleModes): FlatRideChecks {
  const frontHz = modalAnalysis(linearCorner(statics.frontSetup)).body.naturalHz;
  const rearHz = modalAnalysis(linearCorner(statics.rearSetup)).body.naturalHz;
  const ratio = rearHz / frontHz;
  const pitchOverHeave = modes.modes.pitch.naturalHz / modes.modes.heave.naturalHz;
  return {
    frontHz,
    rearHz,
    ratio,
    ratioBand: { ...FLAT_RIDE_RATIO_BAND },
    frontBelowRear: frontHz < rearHz,
    ratioInBand: ratio >= FLAT_RIDE_RATIO_BAND.low && ratio <= FLAT_RIDE_RATIO_BAND.high,
    pitchOverHeave,
    pitchNearHeave: Math.abs(pitchOverHeave - 1) <= PITCH_HEAVE_BAND,
  };
}
