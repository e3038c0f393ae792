import { sampleRoadProfile } from '../../../../shared/road-library/sample-profile.ts';
import type { RoadIsoFigures } from '../../../../shared/schemas/road-record.ts';
import type { Road } from '../../../../shared/schemas/road.ts';
import { welchPsd } from '../../../../shared/sim/metrics/spectra.ts';
import { ISO_N0 } from '../../../../shared/sim/roads/iso8608.ts';

/** Points drawn for a profile: enough to show every bump on a chart a page wide. */
const MAX_PROFILE_POINTS = 4000;

export interface ProfilePreview {
  axis: 'distance' | 'time';
  x: Float64Array;
  /** Elevation, mm. */
  z: Float64Array;
}

export interface PsdPreview {
  /** Spatial frequency, cycle/m (DC left out). */
  n: Float64Array;
  /** Displacement PSD, m³. */
  psd: Float64Array;
  /** The fitted ISO line over its band, when there is a fit. */
  fit: Float64Array | null;
}

export type RoadPreview = { ok: true; profile: ProfilePreview; psd: PsdPreview | null } | { ok: false; reason: string };

/**
 * Profile over distance (bucketed to min and max so thinning never hides a bump) and, for
 * gridded roads, the Welch displacement PSD against spatial frequency with the fitted ISO line.
 */
export function roadPreview(road: Road, iso: RoadIsoFigures | null): RoadPreview {
  const sampled = sampleRoadProfile(road);
  if (!sampled.ok) return sampled;
  const { z, step, x0, axis, spectral } = sampled.profile;
  const profile = thinProfile(z, step, x0, axis);
  if (!spectral || z.length < 64) return { ok: true, profile, psd: null };
  const { freq, psd } = welchPsd(z, step);
  const n = freq.subarray(1);
  const g = psd.subarray(1);
  const fit = iso ? n.map((ni) => (ni >= iso.nMin && ni <= iso.nMax ? iso.gdn0 * (ni / ISO_N0) ** -iso.waviness : Number.NaN)) : null;
  return { ok: true, profile, psd: { n, psd: g, fit } };
}

function thinProfile(z: Float64Array, step: number, x0: number, axis: 'distance' | 'time'): ProfilePreview {
  if (z.length <= MAX_PROFILE_POINTS) {
    return { axis, x: Float64Array.from(z, (_, i) => x0 + i * step), z: Float64Array.from(z, (v) => v * 1000) };
  }
  const buckets = MAX_PROFILE_POINTS / 2;
  const per = z.length / buckets;
  const x = new Float64Array(2 * buckets);
  const out = new Float64Array(2 * buckets);
  for (let b = 0; b < buckets; b++) {
    const a = Math.floor(b * per);
    const e = Math.min(z.length, Math.floor((b + 1) * per));
    let lo = a;
    let hi = a;
    for (let i = a; i < e; i++) {
      if (z[i] < z[lo]) lo = i;
      if (z[i] > z[hi]) hi = i;
    }
    const [first, second] = lo <= hi ? [lo, hi] : [hi, lo];
    x[2 * b] = x0 + first * step;
    out[2 * b] = z[first] * 1000;
    x[2 * b + 1] = x0 + (second === first ? first + 0.5 : second) * step;
    out[2 * b + 1] = z[second] * 1000;
  }
  return { axis, x, z: out };
}
