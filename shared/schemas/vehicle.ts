import { z } from 'zod';
import { Id, IsoDateTime, plainLine, plainLineMessage, plainText, plainTextMessage } from './fields.ts';
import { ModalResult } from './modal.ts';
import { SetupSummary } from './setup-record.ts';

/** A vehicle groups one front and one rear corner setup so their frequencies can be compared. */

export const VehicleName = z.string().trim().min(1, 'Required').max(120, 'At most 120 characters').regex(plainLine, plainLineMessage);
export const VehicleNotes = z.string().trim().max(4000, 'At most 4000 characters').regex(plainText, plainTextMessage);

/** The setup in one corner slot: id, name and latest revision. */
export const CornerSlot = z.object({ id: Id, name: z.string(), latestRevision: z.number().int().positive() });
export type CornerSlot = z.infer<typeof CornerSlot>;

/**
 * Rear body frequency over front (both the body mode's natural frequency |λ|/2π).
 * Null until both corners are set.
 */
export const BodyRatio = z.number().positive().nullable();

export const VehicleSummary = z.object({
  id: Id,
  name: z.string(),
  notes: z.string(),
  createdAt: IsoDateTime,
  updatedAt: IsoDateTime,
  front: CornerSlot.nullable(),
  rear: CornerSlot.nullable(),
  bodyRatio: BodyRatio,
});
export type VehicleSummary = z.infer<typeof VehicleSummary>;

/** Linear analysis of one corner's latest revision. */
export const CornerAnalysis = z.object({
  setup: SetupSummary,
  modal: ModalResult,
  /** Wheel rate used by the analysis (spring × MR², plus the gas rate at static), N/m. */
  wheelRate: z.number(),
  /** Sprung mass of the corner, kg (so the page can show what the frequency rests on). */
  sprungMass: z.number(),
});
export type CornerAnalysis = z.infer<typeof CornerAnalysis>;

/** GET /vehicles/:vehicleId */
export const VehicleDetail = VehicleSummary.extend({
  analysis: z.object({ front: CornerAnalysis.nullable(), rear: CornerAnalysis.nullable() }),
});
export type VehicleDetail = z.infer<typeof VehicleDetail>;

export const VehiclesResponse = z.object({ vehicles: z.array(VehicleSummary) });
export type VehiclesResponse = z.infer<typeof VehiclesResponse>;

/** POST /vehicles. A setup given for a slot moves there (and leaves any vehicle it was in). */
export const CreateVehicleInput = z.object({
  name: VehicleName,
  notes: VehicleNotes.default(''),
  frontSetupId: Id.nullable().optional(),
  rearSetupId: Id.nullable().optional(),
});
export type CreateVehicleInput = z.infer<typeof CreateVehicleInput>;

/** PATCH /vehicles/:vehicleId. `null` empties a slot; a missing key leaves it alone. */
export const UpdateVehicleInput = z
  .object({
    name: VehicleName.optional(),
    notes: VehicleNotes.optional(),
    frontSetupId: Id.nullable().optional(),
    rearSetupId: Id.nullable().optional(),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), { message: 'Nothing to change', path: [] });
export type UpdateVehicleInput = z.infer<typeof UpdateVehicleInput>;

/**
 * Flat-ride practice (common practice, no source): the rear body frequency a little above the
 * front, so the rear catches up with the front's motion over a bump. The band is a rule of
 * thumb shown beside the ratio, not a check.
 */
export const FLAT_RIDE_RATIO_BAND = { low: 1.0, high: 1.2 } as const;
