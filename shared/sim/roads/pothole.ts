import type { PotholeRoad } from '../../schemas/road.ts';
import { envelopedProfile } from './envelope.ts';
import { atSpeed, type RoadExcitation } from './excitation.ts';
import { eventProfile, halfSine } from './event-shape.ts';

/** Half-sine dip on a level road; the integrator restarts at its edges. */
export function potholeExcitation(road: PotholeRoad, speed: number, duration: number, footprint?: number, tyreRadius?: number): RoadExcitation {
  const shape = halfSine(-road.depth, road.length, road.at);
  const profile = tyreRadius ? envelopedProfile(shape, tyreRadius) : eventProfile(shape, footprint);
  return atSpeed(profile, speed, duration, { kind: 'pothole', name: road.name, distance: speed * duration });
}
