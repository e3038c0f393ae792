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
});
export type LinearCorner = z.infer<typeof LinearCorner>;
