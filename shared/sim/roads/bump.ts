import type { BumpRoad } from '../../schemas/road.ts';
import { atSpeed, type RoadExcitation } from './excitation.ts';
import { eventProfile, halfSine } from './event-shape.ts';

/** Half-sine bump on a level road; the integrator restarts at its leading and trailing edges. */
export function bumpExcitation(road: BumpRoad, speed: number, duration: number, footprint?: number): RoadExcitation {
  const profile = eventProfile(halfSine(road.height, road.length, road.at), footprint);
  return atSpeed(profile, speed, duration, { kind: 'bump', name: road.name, distance: speed * duration });
}
