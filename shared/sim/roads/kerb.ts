import type { KerbRoad } from '../../schemas/road.ts';
import { envelopedProfile } from './envelope.ts';
import { atSpeed, type RoadExcitation } from './excitation.ts';
import { eventProfile, ramp } from './event-shape.ts';

/**
 * Kerb step up or down with a straight ramp. The ramp makes the road's slope jump at both of
 * its ends; the integrator restarts there. A short ramp at speed gives a large road velocity,
 * which the tyre damping passes straight on: a tyre footprint in the setup softens it.
 */
export function kerbExcitation(road: KerbRoad, speed: number, duration: number, footprint?: number, tyreRadius?: number): RoadExcitation {
  const shape = ramp(road.height, road.rampLength, road.at);
  const profile = tyreRadius ? envelopedProfile(shape, tyreRadius) : eventProfile(shape, footprint);
  return atSpeed(profile, speed, duration, { kind: 'kerb', name: road.name, distance: speed * duration });
}
