import type { SineRoad } from '../../schemas/road.ts';
import { atSpeed, footprintGain, smoothstep, smoothstepSlope, type RoadExcitation } from './excitation.ts';

/** Wavelengths over which the sine fades in; the quintic fade keeps the input C². */
const FADE_WAVELENGTHS = 2;

/**
 * Endless sine z = A·s(x/(2λ))·sin(2πx/λ), s the quintic smoothstep. With a footprint the
 * amplitude carries the moving-average gain sin(πL/λ)/(πL/λ) (exact once faded in).
 */
export function sineExcitation(road: SineRoad, speed: number, duration: number, footprint?: number): RoadExcitation {
  const lambda = road.wavelength;
  const amp = road.amplitude * footprintGain(1 / lambda, footprint);
  const k = (2 * Math.PI) / lambda;
  const fade = FADE_WAVELENGTHS * lambda;
  return atSpeed(
    {
      at(x, out) {
        const u = x / fade;
        const s = smoothstep(u);
        const ds = smoothstepSlope(u) / fade;
        const sn = Math.sin(k * x);
        out[0] = amp * s * sn;
        out[1] = amp * (ds * sn + s * k * Math.cos(k * x));
      },
      kinks: [],
    },
    speed,
    duration,
    { kind: 'sine', name: road.name, distance: speed * duration },
  );
}
