import { z } from 'zod';
import { newtonSecondsPerMeter } from '../units.ts';

/**
 * How a controlled damper chooses its force. Gains are at the damper, like the force tables
 * (N·s/m per m/s of the body or wheel velocity projected on the damper, i.e. × motion ratio);
 * at the wheel they count × MR², as the passive coefficient does.
 * - `skyhook` asks for −gain × body velocity: a damper hung from a fixed point in the sky
 *   (Karnopp, Crosby and Harwood, 1974).
 * - `groundhook` asks for −gain × wheel velocity on the wheel: a damper tied to the ground.
 * - `blend` asks for `blend` × the skyhook force + (1 − `blend`) × the groundhook force.
 * `mode`: `continuous` delivers the asked force where the tables allow it (clipped to the
 * nearer table); `onOff` chooses the firm table whenever the asked force would resist the
 * strut's motion, else the soft one.
 */
export const ControlLaw = z.discriminatedUnion('kind', [
  z.strictObject({
    kind: z.literal('skyhook'),
    mode: z.enum(['continuous', 'onOff']).default('continuous'),
    gain: newtonSecondsPerMeter.nonnegative().max(1e6),
  }),
  z.strictObject({
    kind: z.literal('groundhook'),
    mode: z.enum(['continuous', 'onOff']).default('continuous'),
    gain: newtonSecondsPerMeter.nonnegative().max(1e6),
  }),
  z.strictObject({
    kind: z.literal('blend'),
    mode: z.enum(['continuous', 'onOff']).default('continuous'),
    skyGain: newtonSecondsPerMeter.nonnegative().max(1e6),
    groundGain: newtonSecondsPerMeter.nonnegative().max(1e6),
    /** Share of the skyhook force, 0 (all groundhook) to 1 (all skyhook). */
    blend: z.number().min(0).max(1),
  }),
]);
export type ControlLaw = z.infer<typeof ControlLaw>;
