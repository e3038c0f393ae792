import type { MeasuredRoad } from '../../schemas/road.ts';
import { atSpeed, type RoadExcitation } from './excitation.ts';
import { gridSpline } from './spline.ts';

/** Largest resampled grid accepted (memory and spline cost stay moderate). */
const MAX_SAMPLES = 2_000_000;
/**
 * Resampling may add detail between measured points, within reason: at most this many samples
 * per given point (or 100 000 samples in all for short files), so a two-point "profile" cannot
 * ask for millions of samples.
 */
export const SAMPLES_PER_POINT = 4;
const SMALL_PROFILE_SAMPLES = 100_000;

/** Most samples a profile of `points` points may be resampled to. */
export function sampleCap(points: number): number {
  return Math.min(MAX_SAMPLES, Math.max(SAMPLES_PER_POINT * points, SMALL_PROFILE_SAMPLES));
}

/** A measured profile on an even grid starting at distance 0 (the first point). */
export interface ResampledProfile {
  dx: number;
  z: Float64Array;
  /** m. */
  length: number;
}

export type ResampleOutcome = { ok: true; profile: ResampledProfile } | { ok: false; reason: string };

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const mid = s.length >> 1;
  return s.length % 2 ? s[mid] : (s[mid - 1] + s[mid]) / 2;
}

/**
 * Resamples the points onto an even grid by linear interpolation (exact for evenly spaced
 * points at the default step), then removes the mean or least-squares line as asked.
 */
export function resampleMeasured(road: MeasuredRoad): ResampleOutcome {
  const pts = road.points;
  const x0 = pts[0][0];
  const length = pts[pts.length - 1][0] - x0;
  const gaps: number[] = [];
  for (let i = 1; i < pts.length; i++) gaps.push(pts[i][0] - pts[i - 1][0]);
  // The default step is the median spacing, nudged so a whole number of steps spans the
  // profile (evenly spaced points then land exactly on the grid).
  const dx = road.spacing ?? length / Math.max(1, Math.round(length / median(gaps)));
  const n = Math.floor(length / dx + 1e-9) + 1;
  const cap = sampleCap(pts.length);
  if (n > cap) {
    return { ok: false, reason: `road.spacing: ${dx} m over ${length.toFixed(1)} m makes ${n} samples from ${pts.length} points; at most ${cap} (${SAMPLES_PER_POINT} per point, or ${SMALL_PROFILE_SAMPLES} in all, up to ${MAX_SAMPLES})` };
  }
  if (n < 4) return { ok: false, reason: 'road.points: the profile needs at least 4 samples at its spacing' };
  const z = new Float64Array(n);
  let j = 0;
  for (let i = 0; i < n; i++) {
    const x = x0 + i * dx;
    while (j < pts.length - 2 && pts[j + 1][0] < x) j++;
    const [xa, za] = pts[j];
    const [xb, zb] = pts[j + 1];
    z[i] = za + ((zb - za) * (x - xa)) / (xb - xa);
  }
  detrend(z, road.detrend ?? 'linear');
  return { ok: true, profile: { dx, z, length: (n - 1) * dx } };
}

function detrend(z: Float64Array, how: 'none' | 'mean' | 'linear'): void {
  if (how === 'none') return;
  const n = z.length;
  let sz = 0;
  let sxz = 0;
  for (let i = 0; i < n; i++) {
    sz += z[i];
    sxz += i * z[i];
  }
  const mean = sz / n;
  const im = (n - 1) / 2;
  // Least squares over i = 0..n−1: slope = Σ(i − ī)(z − z̄) / Σ(i − ī)², Σ(i − ī)² = n(n²−1)/12.
  const slope = how === 'linear' ? (sxz - im * sz) / ((n * (n * n - 1)) / 12) : 0;
  for (let i = 0; i < n; i++) z[i] -= mean + slope * (i - im);
}

/** Moving average over `footprint` metres (window clipped at the ends), via a running integral. */
export function movingAverage(z: Float64Array, dx: number, footprint: number): Float64Array {
  const n = z.length;
  const c = new Float64Array(n);
  for (let i = 1; i < n; i++) c[i] = c[i - 1] + ((z[i - 1] + z[i]) * dx) / 2;
  const cumAt = (x: number) => {
    if (x <= 0) return c[0];
    const s = x / dx;
    const i = Math.floor(s);
    if (i >= n - 1) return c[n - 1];
    return c[i] + (c[i + 1] - c[i]) * (s - i);
  };
  const half = footprint / 2;
  const out = new Float64Array(n);
  const end = (n - 1) * dx;
  for (let i = 0; i < n; i++) {
    const a = Math.max(0, i * dx - half);
    const b = Math.min(end, i * dx + half);
    out[i] = b > a ? (cumAt(b) - cumAt(a)) / (b - a) : z[i];
  }
  return out;
}

/** The profile as a time input; fails when the run would drive past its end. */
export function measuredExcitation(
  road: MeasuredRoad,
  speed: number,
  duration: number,
  footprint?: number,
): { ok: true; road: RoadExcitation } | { ok: false; reason: string } {
  const res = resampleMeasured(road);
  if (!res.ok) return res;
  const { dx, length } = res.profile;
  const distance = speed * duration;
  if (distance > length + 1e-9) {
    return {
      ok: false,
      reason: `road.points: the profile is ${length.toFixed(1)} m long but ${duration} s at ${speed} m/s covers ${distance.toFixed(1)} m (at most ${(length / speed).toFixed(2)} s at this speed)`,
    };
  }
  const raw = footprint ? movingAverage(res.profile.z, dx, footprint) : res.profile.z;
  // Start at zero elevation under the tyre: the corner starts in static equilibrium.
  const z0 = raw[0];
  const z = raw.map((v) => v - z0);
  const spline = gridSpline(z, dx, false);
  return {
    ok: true,
    road: atSpeed({ at: spline.at, kinks: [] }, speed, duration, {
      kind: 'measured',
      name: road.name,
      length,
      spacing: dx,
      distance,
    }),
  };
}
