import type { BumpRoad } from '../../schemas/road.ts';
import { envelopedProfile } from './envelope.ts';
import { atSpeed, type RoadExcitation } from './excitation.ts';
import { eventProfile, halfSine } from './event-shape.ts';

/** Half-sine bump on a level road; the integrator restarts at its leading and trailing edges. */
export function bumpExcitation(road: BumpRoad, speed: number, duration: number, footprint?: number, tyreRadius?: number): RoadExcitation {
  const shape = halfSine(road.height, road.length, road.at);
  const profile = tyreRadius ? envelopedProfile(shape, tyreRadius) : eventProfile(shape, footprint);
  return atSpeed(profile, speed, duration, { kind: 'bump', name: road.name, distance: speed * duration });
}
