import type { RoadFigures } from '../schemas/road-record.ts';
import type { Road } from '../schemas/road.ts';
import { fitIso8608 } from '../sim/roads/iso-fit.ts';
import { sampleRoadProfile } from './sample-profile.ts';

export type RoadFiguresOutcome = { ok: true; figures: RoadFigures } | { ok: false; reason: string };

/**
 * Figures kept beside a road in the library: length, grid step, point count and, for gridded
 * profiles (ISO 8608 and measured), the ISO 8608 class and waviness fitted to the Welch PSD of
 * the profile (`fitIso8608`: ISO default band cut to what the profile resolves). A profile too
 * short for a fit still saves; `note` says why the class is missing.
 */
export function roadFigures(road: Road): RoadFiguresOutcome {
  const sampled = sampleRoadProfile(road);
  if (!sampled.ok) return sampled;
  const { profile } = sampled;
  const span = (profile.z.length - 1) * profile.step;
  const base: RoadFigures = {
    length: road.kind === 'sweep' ? null : road.kind === 'iso8608' ? profile.z.length * profile.step : span,
    spacing: profile.spectral ? profile.step : null,
    points: road.kind === 'measured' ? road.points.length : null,
    iso: null,
    note: null,
  };
  if (!profile.spectral) return { ok: true, figures: base };
  const fit = fitIso8608({ dx: profile.step, z: profile.z });
  if (!fit.ok) return { ok: true, figures: { ...base, note: `no ISO 8608 class: ${fit.reason}` } };
  return {
    ok: true,
    figures: {
      ...base,
      iso: { className: fit.className, gdn0: fit.gdn0, waviness: fit.waviness, nMin: fit.band.nMin, nMax: fit.band.nMax },
    },
  };
}
