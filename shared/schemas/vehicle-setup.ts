import { z } from 'zod';
import { kilograms, meters } from '../units.ts';
import { plainLine, plainLineMessage, plainText, plainTextMessage } from './fields.ts';
import { Setup } from './setup.ts';

/**
 * A whole vehicle in the pitch plane, as read by `npm run sim -- --vehicle` (plain JSON, SI).
 *
 * Convention: each axle is two identical corners of its setup (left and right move together,
 * the road is the same under both), so an axle's rates, damping and unsprung mass are twice
 * its corner's. The body's mass and centre of gravity, when given, replace the corners'
 * sprung masses: each front corner then carries mass·b/(2L) and each rear corner mass·a/(2L),
 * with a and b the CG's distances to the front and rear axle and L = a + b. When they are
 * omitted, they follow from the corners: mass = 2·(front + rear sprung mass) and the CG where
 * those loads balance. Pitch inertia is given directly or as a radius of gyration k
 * (I = mass·k²); k² / (a·b) is the dynamic index.
 */

/** Inertia in kg·m². */
const kilogramSquareMeters = z.number().brand<'KilogramSquareMeters'>();

/** A place on the body where the vertical motion is read, measured rearwards from the front axle. */
export const SeatPosition = z.strictObject({
  name: z.string().trim().min(1).max(60).regex(plainLine, plainLineMessage),
  /** m behind the front axle (negative: ahead of it). */
  behindFrontAxle: meters.min(-3).max(8),
});
export type SeatPosition = z.infer<typeof SeatPosition>;

export const VehicleSetup = z
  .strictObject({
    name: z.string().trim().min(1).max(120).regex(plainLine, plainLineMessage),
    /** L, m. */
    wheelbase: meters.min(0.5).max(8),
    /** Sprung (body) mass of the whole vehicle, kg; default 2·(front + rear corner sprung mass). */
    bodyMass: kilograms.positive().max(40000).optional(),
    /** a: CG to front axle, m; default where the corners' sprung masses balance. */
    cgToFrontAxle: meters.positive().optional(),
    /** Body pitch inertia about the CG, kg·m². Give this or `pitchRadiusOfGyration`. */
    pitchInertia: kilogramSquareMeters.positive().max(1e6).optional(),
    /** k, m: I = bodyMass·k². */
    pitchRadiusOfGyration: meters.positive().max(8).optional(),
    /** Where seat figures are read; default a driver at 0.45·L and a rear passenger at 0.9·L behind the front axle. */
    seats: z.array(SeatPosition).min(1).max(6).optional(),
    front: Setup,
    rear: Setup,
    notes: z.string().max(4000).regex(plainText, plainTextMessage).optional(),
  })
  .superRefine((v, ctx) => {
    if ((v.pitchInertia === undefined) === (v.pitchRadiusOfGyration === undefined)) {
      ctx.addIssue({ code: 'custom', path: ['pitchInertia'], message: 'give exactly one of pitchInertia and pitchRadiusOfGyration' });
    }
    if (v.cgToFrontAxle !== undefined && v.cgToFrontAxle >= v.wheelbase) {
      ctx.addIssue({ code: 'custom', path: ['cgToFrontAxle'], message: 'the centre of gravity must lie between the axles' });
    }
    if ((v.bodyMass === undefined) !== (v.cgToFrontAxle === undefined)) {
      ctx.addIssue({ code: 'custom', path: [v.bodyMass === undefined ? 'bodyMass' : 'cgToFrontAxle'], message: 'give bodyMass and cgToFrontAxle together, or neither' });
    }
  });
export type VehicleSetup = z.infer<typeof VehicleSetup>;
export type VehicleSetupInput = z.input<typeof VehicleSetup>;
