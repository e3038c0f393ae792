import type { Road } from '../../schemas/road.ts';
import { bumpExcitation } from './bump.ts';
import type { RoadExcitation } from './excitation.ts';
import { iso8608Excitation } from './iso8608.ts';
import { kerbExcitation } from './kerb.ts';
import { measuredExcitation } from './measured.ts';
import { potholeExcitation } from './pothole.ts';
import { sineExcitation } from './sine.ts';
import { sweepExcitation } from './sweep.ts';

export type RoadOutcome = { ok: true; road: RoadExcitation } | { ok: false; reason: string };

/**
 * Turns a road document into the time input the integrator samples, for a run at `speed`
 * (m/s) lasting `duration` (s). `footprint` (m) is the tyre's averaging length, if any;
 * `tyreRadius` (m), if any, makes the tyre roll over event roads as a circle (envelope.ts).
 */
export function buildRoad(road: Road, speed: number, duration: number, footprint?: number, tyreRadius?: number): RoadOutcome {
  switch (road.kind) {
    case 'iso8608':
      return { ok: true, road: iso8608Excitation(road, speed, duration, footprint) };
    case 'sine':
      return { ok: true, road: sineExcitation(road, speed, duration, footprint) };
    case 'sweep':
      return { ok: true, road: sweepExcitation(road, speed, duration, footprint) };
    case 'bump':
      return { ok: true, road: bumpExcitation(road, speed, duration, footprint, tyreRadius) };
    case 'pothole':
      return { ok: true, road: potholeExcitation(road, speed, duration, footprint, tyreRadius) };
    case 'kerb':
      return { ok: true, road: kerbExcitation(road, speed, duration, footprint, tyreRadius) };
    case 'measured':
      return measuredExcitation(road, speed, duration, footprint);
  }
}
