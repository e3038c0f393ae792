import type { RoadListItem } from '../../../../shared/schemas/road-record.ts';
import type { RoadKind } from '../../../../shared/schemas/road.ts';
import { formatSig } from '../../../lib/format.ts';

export const kindWords: Record<RoadKind, string> = {
  iso8608: 'ISO 8608 random',
  measured: 'Measured profile',
  sine: 'Sine',
  sweep: 'Swept sine',
  bump: 'Bump',
  pothole: 'Pothole',
  kerb: 'Kerb step',
};

/** The fitted ISO class as listed: "C (w 2.01)". */
export function isoText(road: Pick<RoadListItem, 'figures'>): string {
  const iso = road.figures.iso;
  return iso ? `${iso.className} (w ${formatSig(iso.waviness, 3)})` : '—';
}
