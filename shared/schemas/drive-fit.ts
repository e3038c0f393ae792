import { z } from 'zod';
import { DriveChannel, DriveData } from './drive.ts';
import { MeasuredRoad } from './road.ts';
import { Setup } from './setup.ts';

/** Corner parameters the drive fit can identify (shared/drive/fit-parameters.ts reads and writes them). */
export const fitParameterKeys = ['sprungMass', 'unsprungMass', 'springRate', 'tyreRate', 'compressionScale', 'reboundScale'] as const;
export const FitParameterKey = z.enum(fitParameterKeys);
export type FitParameterKey = z.infer<typeof FitParameterKey>;

/** Where the road under the drive comes from. */
export const DriveRoadChoice = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('profile'),
    road: MeasuredRoad,
    /** Distance into the profile where the drive starts, m. */
    offset: z.number().nonnegative().max(1e6).default(0),
  }),
  z.object({ kind: z.literal('estimated') }),
]);
export type DriveRoadChoice = z.infer<typeof DriveRoadChoice>;

/** One fit, as the drive-fit worker takes it. */
export const DriveFitRequest = z
  .object({
    setup: Setup,
    data: DriveData,
    road: DriveRoadChoice,
    parameters: z.array(FitParameterKey).min(1, 'Choose at least one parameter to fit').max(fitParameterKeys.length),
    /** Signals compared; default every one the drive has. */
    channels: z.array(DriveChannel).min(1).optional(),
    /** Start of the drive left out while the model settles from rest, s. */
    settle: z.number().nonnegative().max(30).default(1),
    maxIterations: z.number().int().min(1).max(100).default(20),
  })
  .superRefine((r, ctx) => {
    if (new Set(r.parameters).size !== r.parameters.length) ctx.addIssue({ code: 'custom', path: ['parameters'], message: 'a parameter is chosen twice' });
  });
export type DriveFitRequest = z.infer<typeof DriveFitRequest>;
export type DriveFitRequestInput = z.input<typeof DriveFitRequest>;
