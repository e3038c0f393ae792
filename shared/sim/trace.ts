/**
 * Columns of one simulated run on a uniform time grid (sample i is at t = i * dt).
 * Produced by the integrator (shared/sim/integrate.ts), consumed by the metrics
 * (shared/sim/metrics/). SI units; z positive upward; travel positive in compression.
 */
export interface TraceColumns {
  /** Output step in s. */
  dt: number;
  /** Body (sprung mass) vertical acceleration, m/s². */
  bodyAccel: Float64Array;
  /** Suspension travel at the wheel, m, positive in compression, zero at static equilibrium. */
  travel: Float64Array;
  /** Tyre contact force, N, never negative (zero while the wheel is off the road). */
  tyreLoad: Float64Array;
  /** Damper piston velocity, m/s, positive in compression. */
  damperVelocity: Float64Array;
  /** Damper force at the damper, N, positive resisting compression. */
  damperForce: Float64Array;
  /** Bump stop force at the wheel, N (≥ 0). */
  bumpStopForce: Float64Array;
  /** Rebound stop force at the wheel, N (≥ 0). */
  reboundStopForce: Float64Array;
  /** Road elevation under the tyre, m. */
  road: Float64Array;
}
