import type { RoadSummary } from '../../schemas/run.ts';

/**
 * A road as the integrator sees it: elevation under the tyre and its rate of change, as
 * functions of time. `sample` must allocate nothing: it runs inside the equations of motion.
 */
export interface RoadExcitation {
  /** Writes elevation (m, up positive) to out[0] and its time derivative (m/s) to out[1]. */
  sample(t: number, out: Float64Array): void;
  /**
   * Times (s, ascending, inside the run) where the input's slope jumps. The integrator stops
   * and restarts there instead of stepping across the kink.
   */
  breakpoints: number[];
  summary: RoadSummary;
}

/** A profile along the road: z(x) in out[0], dz/dx in out[1]; kinks listed by distance. */
export interface DistanceProfile {
  at(x: number, out: Float64Array): void;
  kinks: number[];
}

/** Drives a distance profile at constant speed: z(t) = p(V·t), ż = V·p'(V·t). */
export function atSpeed(profile: DistanceProfile, speed: number, duration: number, summary: RoadSummary): RoadExcitation {
  const kinkTimes = profile.kinks
    .map((x) => x / speed)
    .filter((t) => t > 0 && t < duration)
    .sort((a, b) => a - b);
  return {
    sample(t, out) {
      profile.at(speed * t, out);
      out[1] *= speed;
    },
    breakpoints: kinkTimes,
    summary,
  };
}

/** Quintic smoothstep 6u⁵ − 15u⁴ + 10u³ and its derivative: C² fades that add no kinks. */
export function smoothstep(u: number): number {
  if (u <= 0) return 0;
  if (u >= 1) return 1;
  return u * u * u * (10 + u * (-15 + 6 * u));
}
export function smoothstepSlope(u: number): number {
  if (u <= 0 || u >= 1) return 0;
  const v = u * (1 - u);
  return 30 * v * v;
}

/** Gain of a moving average of length L on a harmonic of wavelength 1/n: sin(πnL)/(πnL). */
export function footprintGain(n: number, footprint: number | undefined): number {
  if (!footprint) return 1;
  const a = Math.PI * n * footprint;
  return a < 1e-9 ? 1 : Math.sin(a) / a;
}
