import type { Road } from '../schemas/road.ts';
import { buildRoad } from '../sim/roads/index.ts';
import { generateIso8608Profile } from '../sim/roads/iso8608.ts';
import { resampleMeasured } from '../sim/roads/measured.ts';

/**
 * A road's elevation on an even grid, for previews and library figures. Distance-defined roads
 * come out over distance (m); the sweep is defined in time, so it comes out over time (s).
 */
export interface SampledProfile {
  axis: 'distance' | 'time';
  /** Abscissa of sample 0, m (or s). */
  x0: number;
  /** Grid step, m (or s for a sweep). */
  step: number;
  /** Elevation, m. */
  z: Float64Array;
  /** True for a gridded profile the library can take a PSD of (ISO and measured roads). */
  spectral: boolean;
}

export type SampleOutcome = { ok: true; profile: SampledProfile } | { ok: false; reason: string };

/** Samples drawn for closed-form shapes (events, sines, sweeps). */
const SHAPE_SAMPLES = 2000;
/** Level road shown either side of an event, as a share of the event's length (at least 1 m). */
const EVENT_MARGIN = 0.5;

/** Stretch previewed for roads without a natural length, as [start, end] in m (or s). */
function shapeSpan(road: Exclude<Road, { kind: 'iso8608' | 'measured' }>): [number, number] {
  switch (road.kind) {
    case 'sine':
      return [0, 8 * road.wavelength];
    case 'sweep':
      return [0, road.duration];
    case 'kerb': {
      const m = Math.max(1, road.rampLength * 4);
      return [Math.max(0, road.at - m), road.at + road.rampLength + m];
    }
    case 'bump':
    case 'pothole': {
      const m = Math.max(1, road.length * EVENT_MARGIN * 2);
      return [Math.max(0, road.at - m), road.at + road.length + m];
    }
  }
}

/**
 * Samples a road: the generated period of an ISO road, the resampled (and detrended) measured
 * profile, or a stretch of a closed-form road. The closed-form roads are read through the
 * simulation's own road builder driven at 1 m/s, so time in the builder equals distance and the
 * preview shows exactly what a run would drive over (point contact).
 */
export function sampleRoadProfile(road: Road): SampleOutcome {
  if (road.kind === 'iso8608') {
    const p = generateIso8608Profile(road);
    return { ok: true, profile: { axis: 'distance', x0: 0, step: p.dx, z: p.z, spectral: true } };
  }
  if (road.kind === 'measured') {
    const r = resampleMeasured(road);
    if (!r.ok) return r;
    return { ok: true, profile: { axis: 'distance', x0: 0, step: r.profile.dx, z: r.profile.z, spectral: true } };
  }
  const [from, to] = shapeSpan(road);
  const built = buildRoad(road, 1, to);
  if (!built.ok) return built;
  const step = (to - from) / (SHAPE_SAMPLES - 1);
  const z = new Float64Array(SHAPE_SAMPLES);
  const out = new Float64Array(2);
  for (let i = 0; i < SHAPE_SAMPLES; i++) {
    built.road.sample(from + i * step, out);
    z[i] = out[0];
  }
  return { ok: true, profile: { axis: road.kind === 'sweep' ? 'time' : 'distance', x0: from, step, z, spectral: false } };
}
