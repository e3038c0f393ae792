import type { Setup } from '../../schemas/setup.ts';
import type { SeatPosition, VehicleSetup } from '../../schemas/vehicle-setup.ts';
import { cornerModel, newCornerForces, staticEquilibrium, SWITCH_COUNT, type CornerForces, type CornerModel, type StaticState } from '../quarter-car.ts';

/**
 * The pitch-plane vehicle: a rigid body (heave z, pitch θ) on two axles, each axle two
 * identical corners of its setup (schemas/vehicle-setup.ts). The corner's own force code
 * (damper tables, gas, stops, end-of-stroke limits, tyre with lift-off) gives each axle's
 * forces; this file only places the corners under the body and adds up what they push.
 *
 * States [z, ż, θ, θ̇, zf, żf, zr, żr]: heave (m, up), pitch (rad, nose up), front and rear
 * wheel displacement (m, up), all from static equilibrium. The body moves z + a·θ over the
 * front axle and z − b·θ over the rear, a point x metres ahead of the CG z + x·θ.
 */

export const VEHICLE_STATE_COUNT = 8;
/** Regime switches: the corner's five at the front, then the five at the rear. */
export const VEHICLE_SWITCH_COUNT = 2 * SWITCH_COUNT;

export interface VehicleGeometry {
  /** Body mass, kg. */
  mass: number;
  /** Pitch inertia about the CG, kg·m². */
  inertia: number;
  /** CG to front axle, m. */
  a: number;
  /** CG to rear axle, m. */
  b: number;
  wheelbase: number;
}

/** Dynamic index k² / (a·b): 1 when the two axles move independently. */
export const dynamicIndex = (g: VehicleGeometry): number => g.inertia / (g.mass * g.a * g.b);

/** Seats as given, or a driver at 0.45·L and a rear passenger at 0.9·L. */
export function seatsOf(vehicle: VehicleSetup): SeatPosition[] {
  if (vehicle.seats) return vehicle.seats;
  const L = vehicle.wheelbase;
  return [
    { name: 'driver', behindFrontAxle: (0.45 * L) as SeatPosition['behindFrontAxle'] },
    { name: 'rear passenger', behindFrontAxle: (0.9 * L) as SeatPosition['behindFrontAxle'] },
  ];
}

/** Mass, CG and inertia, from the body fields or from the corners (see the schema's convention). */
export function vehicleGeometry(vehicle: VehicleSetup): VehicleGeometry {
  const L = vehicle.wheelbase;
  const mass = vehicle.bodyMass ?? 2 * (vehicle.front.sprungMass + vehicle.rear.sprungMass);
  const a = vehicle.cgToFrontAxle ?? (L * vehicle.rear.sprungMass) / (vehicle.front.sprungMass + vehicle.rear.sprungMass);
  const inertia = vehicle.pitchInertia ?? mass * vehicle.pitchRadiusOfGyration! ** 2;
  return { mass, inertia, a, b: L - a, wheelbase: L };
}

/** Each axle's setup with its corner's sprung mass set to the body's static share. */
export function axleSetups(vehicle: VehicleSetup, g: VehicleGeometry): { front: Setup; rear: Setup } {
  const share = (m: number) => m as Setup['sprungMass'];
  return {
    front: { ...vehicle.front, sprungMass: share((g.mass * g.b) / (2 * g.wheelbase)) },
    rear: { ...vehicle.rear, sprungMass: share((g.mass * g.a) / (2 * g.wheelbase)) },
  };
}

export interface VehicleStatics {
  geometry: VehicleGeometry;
  front: StaticState;
  rear: StaticState;
  frontSetup: Setup;
  rearSetup: Setup;
}

export type VehicleStaticOutcome = { ok: true; statics: VehicleStatics } | { ok: false; reason: string };

/** Static equilibrium of both axles (a corner the gas would lift fails, naming its axle). */
export function vehicleStatics(vehicle: VehicleSetup): VehicleStaticOutcome {
  const geometry = vehicleGeometry(vehicle);
  const setups = axleSetups(vehicle, geometry);
  const front = staticEquilibrium(setups.front);
  if (!front.ok) return { ok: false, reason: `front.${front.reason}` };
  const rear = staticEquilibrium(setups.rear);
  if (!rear.ok) return { ok: false, reason: `rear.${rear.reason}` };
  return { ok: true, statics: { geometry, front: front.state, rear: rear.state, frontSetup: setups.front, rearSetup: setups.rear } };
}

/** Forces at one instant. Each axle's `bodyAccel` is the body's vertical acceleration over that axle. */
export interface VehicleForces {
  heaveAccel: number;
  pitchAccel: number;
  front: CornerForces;
  rear: CornerForces;
}

export const newVehicleForces = (): VehicleForces => ({ heaveAccel: 0, pitchAccel: 0, front: newCornerForces(), rear: newCornerForces() });

export interface VehicleModel {
  statics: VehicleStatics;
  front: CornerModel;
  rear: CornerModel;
  /** Equations of motion at state y with the road under each axle (elevation, rate); allocates nothing. */
  evaluate(y: ArrayLike<number>, zf: number, vf: number, zr: number, vr: number, out: VehicleForces): void;
  /** The front corner's switches in out[0..4], the rear's in out[5..9]. */
  switches(y: ArrayLike<number>, zf: number, vf: number, zr: number, vr: number, out: Float64Array): void;
}

export function vehicleModel(statics: VehicleStatics): VehicleModel {
  const { mass, inertia, a, b } = statics.geometry;
  const front = cornerModel(statics.frontSetup, statics.front);
  const rear = cornerModel(statics.rearSetup, statics.rear);
  // A corner reports its suspension force as its body acceleration times its sprung mass; two per axle.
  const frontShare = 2 * statics.frontSetup.sprungMass;
  const rearShare = 2 * statics.rearSetup.sprungMass;
  const swFront = new Float64Array(SWITCH_COUNT);
  const swRear = new Float64Array(SWITCH_COUNT);
  return {
    statics,
    front,
    rear,
    evaluate(y, zf, vf, zr, vr, out) {
      const ff = out.front;
      const fr = out.rear;
      front.evaluate(y[0] + a * y[2], y[1] + a * y[3], y[4], y[5], zf, vf, ff);
      rear.evaluate(y[0] - b * y[2], y[1] - b * y[3], y[6], y[7], zr, vr, fr);
      const forceFront = frontShare * ff.bodyAccel;
      const forceRear = rearShare * fr.bodyAccel;
      const heave = (forceFront + forceRear) / mass;
      const pitch = (a * forceFront - b * forceRear) / inertia;
      out.heaveAccel = heave;
      out.pitchAccel = pitch;
      ff.bodyAccel = heave + a * pitch;
      fr.bodyAccel = heave - b * pitch;
    },
    switches(y, zf, vf, zr, vr, out) {
      front.switches(y[0] + a * y[2], y[1] + a * y[3], y[4], y[5], zf, vf, swFront);
      rear.switches(y[0] - b * y[2], y[1] - b * y[3], y[6], y[7], zr, vr, swRear);
      out.set(swFront, 0);
      out.set(swRear, SWITCH_COUNT);
    },
  };
}
