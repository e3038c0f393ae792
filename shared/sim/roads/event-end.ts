import type { Road } from '../../schemas/road.ts';

/**
 * When a single-event road's event is over, s from the start of a run at `speed` (m/s): the
 * tyre's contact (half the footprint ahead of the wheel centre line) has passed the event's last
 * edge. Undefined for roads that are not one event.
 */
export function eventEndTime(road: Road, speed: number, footprint = 0): number | undefined {
  const reach = footprint / 2;
  switch (road.kind) {
    case 'bump':
    case 'pothole':
      return (road.at + road.length + reach) / speed;
    case 'kerb':
      return (road.at + road.rampLength + reach) / speed;
    default:
      return undefined;
  }
}
