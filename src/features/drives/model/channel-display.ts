import type { DriveChannel } from '../../../../shared/schemas/drive.ts';
import type { DisplayUnit } from '../../../lib/format.ts';
import type { ChosenUnits } from '../../../lib/units/unit-table.ts';

const accel: DisplayUnit = { symbol: 'm/s²', fromSI: (x) => x, toSI: (x) => x };

/** How a drive signal is named and shown: accelerations in m/s², travels in the chosen length unit. */
export function channelDisplay(channel: DriveChannel, units: ChosenUnits): { label: string; unit: DisplayUnit } {
  switch (channel) {
    case 'bodyAccel':
      return { label: 'Body acceleration', unit: accel };
    case 'wheelAccel':
      return { label: 'Wheel acceleration', unit: accel };
    case 'damperTravel':
      return { label: 'Damper travel', unit: units.length };
    case 'wheelTravel':
      return { label: 'Wheel travel', unit: units.length };
  }
}
