import type { SweepRoad } from '../../schemas/road.ts';
import { footprintGain, smoothstep, smoothstepSlope, type RoadExcitation } from './excitation.ts';

/** Fade length at each end: two periods of the local frequency, at most a quarter of the sweep. */
const FADE_CYCLES = 2;

/**
 * Swept sine in time (independent of speed): z(t) = a(t)·g(t)·sin φ(t), φ' = 2π f(t), with
 * f rising (or falling) logarithmically or linearly from startFrequency to endFrequency over
 * `duration`, g a quintic fade-in and fade-out, and a(t) the displacement amplitude (constant,
 * or velocityAmplitude / 2πf(t)). Level after the sweep. With a footprint each instant's
 * amplitude carries the moving-average gain at wavelength speed/f(t) (quasi-static, good while
 * the frequency changes slowly over one footprint crossing).
 */
export function sweepExcitation(road: SweepRoad, speed: number, duration: number, footprint?: number): RoadExcitation {
  const T = road.duration;
  const f0 = road.startFrequency;
  const f1 = road.endFrequency;
  const log = (road.law ?? 'log') === 'log' && f0 !== f1;
  const ratio = f1 / f0;
  const lnr = Math.log(ratio);
  const fadeIn = Math.min(FADE_CYCLES / f0, T / 4);
  const fadeOut = Math.min(FADE_CYCLES / f1, T / 4);
  const freq = (t: number) => (log ? f0 * ratio ** (t / T) : f0 + ((f1 - f0) * t) / T);
  const dfreq = (t: number) => (log ? (freq(t) * lnr) / T : (f1 - f0) / T);
  const phase = (t: number) =>
    log ? ((2 * Math.PI * f0 * T) / lnr) * (ratio ** (t / T) - 1) : 2 * Math.PI * (f0 * t + ((f1 - f0) * t * t) / (2 * T));
  const byVelocity = road.velocityAmplitude !== undefined;
  const a0 = road.amplitude ?? 0;
  const v0 = road.velocityAmplitude ?? 0;

  return {
    sample(t, out) {
      if (t <= 0 || t >= T) {
        out[0] = 0;
        out[1] = 0;
        return;
      }
      const f = freq(t);
      const gain = footprintGain(f / speed, footprint);
      // Amplitude and its time derivative.
      let a = byVelocity ? v0 / (2 * Math.PI * f) : a0;
      let da = byVelocity ? (-a * dfreq(t)) / f : 0;
      a *= gain;
      da *= gain;
      const gIn = smoothstep(t / fadeIn);
      const gOut = smoothstep((T - t) / fadeOut);
      const g = gIn * gOut;
      const dg = (smoothstepSlope(t / fadeIn) / fadeIn) * gOut - gIn * (smoothstepSlope((T - t) / fadeOut) / fadeOut);
      const ph = phase(t);
      const s = Math.sin(ph);
      out[0] = a * g * s;
      out[1] = (da * g + a * dg) * s + a * g * 2 * Math.PI * f * Math.cos(ph);
    },
    breakpoints: T < duration ? [T] : [],
    summary: { kind: 'sweep', name: road.name, distance: speed * duration },
  };
}
