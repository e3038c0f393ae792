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

/** Allocates the trace columns for n samples. */
export function allocateTrace(n: number, dt: number): TraceColumns {
  return {
    dt,
    bodyAccel: new Float64Array(n),
    travel: new Float64Array(n),
    tyreLoad: new Float64Array(n),
    damperVelocity: new Float64Array(n),
    damperForce: new Float64Array(n),
    bumpStopForce: new Float64Array(n),
    reboundStopForce: new Float64Array(n),
    road: new Float64Array(n),
  };
}

/** What one trace sample is made of: the model's forces at an instant (`CornerForces` fits). */
export interface SampleForces {
  bodyAccel: number;
  travel: number;
  tyreLoad: number;
  damperVelocity: number;
  damperForce: number;
  bumpStopForce: number;
  reboundStopForce: number;
}

/** Writes sample i of a trace from the forces evaluated there and the road elevation under the tyre. */
export function writeSample(trace: TraceColumns, i: number, f: SampleForces, zRoad: number): void {
  trace.bodyAccel[i] = f.bodyAccel;
  trace.travel[i] = f.travel;
  trace.tyreLoad[i] = f.tyreLoad;
  trace.damperVelocity[i] = f.damperVelocity;
  trace.damperForce[i] = f.damperForce;
  trace.bumpStopForce[i] = f.bumpStopForce;
  trace.reboundStopForce[i] = f.reboundStopForce;
  trace.road[i] = zRoad;
}
