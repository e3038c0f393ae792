import { z } from 'zod';

/**
 * A corner reduced to linear elements at static equilibrium, everything at the wheel:
 * kg, N/m and N·s/m. Stops and lift-off are absent; a non-linear damper enters as its
 * equivalent linear coefficient (the caller states how it was obtained).
 */
export const LinearCorner = z.object({
  sprungMass: z.number().positive(),
  unsprungMass: z.number().positive(),
  /** Wheel rate ks, N/m. */
  wheelRate: z.number().positive(),
  /** Damping at the wheel c, N·s/m (damper coefficient × MR²). */
  wheelDamping: z.number().nonnegative(),
  tyreRate: z.number().positive(),
  tyreDamping: z.number().nonnegative(),
  /** Top mount in series with the damper, at the wheel (rate × MR²), N/m; absent: rigid. */
  mountRate: z.number().positive().optional(),
  /** Damping in parallel with the mount's rate, at the wheel, N·s/m. */
  mountDamping: z.number().nonnegative().optional(),
  /** Damping from the body to a fixed point (skyhook gain × MR²), N·s/m. */
  skyDamping: z.number().nonnegative().optional(),
  /** Damping from the wheel to the ground (groundhook gain × MR²), N·s/m. */
  groundDamping: z.number().nonnegative().optional(),
});
export type LinearCorner = z.infer<typeof LinearCorner>;
