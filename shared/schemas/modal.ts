import { z } from 'zod';

/** One mode of the linearised corner, from its eigenvalue pair. */
export const ModeFigures = z.object({
  /** |λ| / 2π, Hz. */
  naturalHz: z.number().nonnegative(),
  /** Im λ / 2π, Hz; 0 for an overdamped (real) pair. */
  dampedHz: z.number().nonnegative(),
  /** −Re λ / |λ|; for an overdamped real pair the equivalent ratio, which is ≥ 1. */
  dampingRatio: z.number(),
});
export type ModeFigures = z.infer<typeof ModeFigures>;

export const Eigenvalue = z.object({ re: z.number(), im: z.number() });
export type Eigenvalue = z.infer<typeof Eigenvalue>;

/**
 * Linear analysis of one corner at static equilibrium. Modes are named by frequency:
 * the lower pair is the body mode, the higher the wheel hop.
 */
export const ModalResult = z.object({
  body: ModeFigures,
  wheel: ModeFigures,
  /** Undamped frequencies from the 2×2 mass and stiffness matrices, Hz. */
  bodyUndampedHz: z.number().positive(),
  wheelUndampedHz: z.number().positive(),
  /** The single-mode hand estimates, shown beside the exact figures. */
  classic: z.object({
    /** (1/2π)·√(k_ride/ms), k_ride = ks·kt/(ks+kt). */
    bodyHz: z.number().positive(),
    /** (1/2π)·√((ks+kt)/mu). */
    wheelHz: z.number().positive(),
    /** c / (2·√(ks·ms)). */
    bodyDampingRatio: z.number().nonnegative(),
  }),
  /** The linear damping used at the wheel and how it was obtained from the damper curves. */
  equivalentDamping: z.object({
    wheelDamping: z.number().nonnegative(),
    definition: z.string(),
  }),
  /** The four eigenvalues of the state matrix, 1/s. */
  eigenvalues: z.array(Eigenvalue).length(4),
});
export type ModalResult = z.infer<typeof ModalResult>;
