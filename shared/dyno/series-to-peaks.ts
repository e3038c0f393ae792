import type { DynoHalfCycle, DynoPeakPoints, DynoPoint, DynoSeriesAnalysis, DynoTimeSeries } from '../schemas/dyno.ts';
import { directionSanityWarning } from './peak-points.ts';

export interface SeriesToPeaksOptions {
  /**
   * Half-width h of the central difference, samples; default 2. The derivative is
   * v_i = (x_{i+h} − x_{i−h}) / (t_{i+h} − t_{i−h}): on an even grid, the mean of the 2h
   * one-step slopes around i. It scales a sine of angular frequency ω by sin(ωhΔt)/(ωhΔt), so
   * peaks read low by about (ωhΔt)²/6 (0.01 % at 2 Hz sampled at 1 kHz with h = 2).
   */
  halfWindow?: number;
  /** |velocity| below which the direction is not trusted, m/s; default max(0.001, 0.5 % of the peak). */
  deadband?: number;
  /**
   * `peak-per-half-cycle` (default): the force at the highest speed of each half-cycle, the
   * usual reading of sine tests at a set of strokes or frequencies. `velocity-bins`: mean force
   * of all samples per speed bin and direction, for a record with few cycles (continuous ramps).
   */
  method?: 'peak-per-half-cycle' | 'velocity-bins';
  /** Number of equal speed bins from 0 to the peak speed for `velocity-bins`; default 20. */
  bins?: number;
  /** Most samples kept in the plotted loop; default 4000. */
  maxLoopPoints?: number;
}

/** Velocity by the smoothed central difference described in `SeriesToPeaksOptions.halfWindow`. */
export function centralDifferenceVelocity(time: readonly number[], x: readonly number[], halfWindow = 2): number[] {
  const n = time.length;
  const v = new Array<number>(n);
  for (let i = 0; i < n; i++) {
    const h = Math.min(halfWindow, i, n - 1 - i);
    const a = h > 0 ? i - h : Math.max(0, i - 1);
    const b = h > 0 ? i + h : Math.min(n - 1, i + 1);
    v[i] = b > a ? (x[b] - x[a]) / (time[b] - time[a]) : 0;
  }
  return v;
}

/**
 * Half-cycles by sign of velocity with a deadband (hysteresis): the direction changes only once
 * |v| passes the deadband the other way, so noise at reversal does not split a stroke. A stretch
 * cut by the start or end of the record is dropped unless its speed had fallen below half its
 * peak by the edge (then the peak was seen).
 */
export function findHalfCycles(velocity: readonly number[], force: readonly number[], deadband: number, halfWindow: number): DynoHalfCycle[] {
  const out: DynoHalfCycle[] = [];
  const n = velocity.length;
  let state = 0;
  let start = 0;
  const close = (end: number) => {
    if (state === 0) return;
    let peak = start;
    for (let i = start; i <= end; i++) if (state * velocity[i] > state * velocity[peak]) peak = i;
    const speed = state * velocity[peak];
    // A stroke cut by the record's edge counts only if its speed had clearly peaked inside.
    const cutAt = (i: number) => Math.abs(velocity[i]) > deadband && (Math.abs(velocity[i]) >= 0.5 * speed || Math.abs(peak - i) <= halfWindow);
    const partial = (start === 0 && cutAt(0)) || (end === n - 1 && cutAt(n - 1));
    if (partial || speed < 2 * deadband) return;
    // Mean force over ±h samples at the peak, where speed is flat, to quieten force noise.
    const a = Math.max(start, peak - halfWindow);
    const b = Math.min(end, peak + halfWindow);
    let sum = 0;
    for (let i = a; i <= b; i++) sum += force[i];
    out.push({ direction: state > 0 ? 'compression' : 'rebound', start, end, peakIndex: peak, velocity: speed, force: (state * sum) / (b - a + 1) });
  };
  for (let i = 0; i < n; i++) {
    const s = velocity[i] > deadband ? 1 : velocity[i] < -deadband ? -1 : 0;
    if (s !== 0 && s !== state) {
      close(i - 1);
      state = s;
      start = i;
    }
  }
  close(n - 1);
  return out;
}

function binnedPoints(velocity: readonly number[], force: readonly number[], vMax: number, bins: number, deadband: number): DynoPeakPoints {
  const out: DynoPeakPoints = { compression: [], rebound: [] };
  for (const [dir, sign] of [['compression', 1], ['rebound', -1]] as const) {
    const sv = new Array<number>(bins).fill(0);
    const sf = new Array<number>(bins).fill(0);
    const count = new Array<number>(bins).fill(0);
    velocity.forEach((v, i) => {
      const speed = sign * v;
      if (speed <= deadband) return;
      const k = Math.min(bins - 1, Math.floor((speed / vMax) * bins));
      sv[k] += speed;
      sf[k] += sign * force[i];
      count[k]++;
    });
    for (let k = 0; k < bins; k++) if (count[k] >= 3) out[dir].push({ velocity: sv[k] / count[k], force: sf[k] / count[k] });
  }
  return out;
}

function thin(series: DynoTimeSeries, velocity: number[], maxPoints: number) {
  const stride = Math.max(1, Math.ceil(series.time.length / maxPoints));
  const pick = (a: readonly number[]) => a.filter((_, i) => i % stride === 0);
  return { time: pick(series.time), displacement: pick(series.displacement), velocity: pick(velocity), force: pick(series.force) };
}

const byVelocity = (a: DynoPoint, b: DynoPoint) => a.velocity - b.velocity;

/**
 * From a raw record (SI, compression positive, as `parseDynoCsv` returns it): the velocity (the
 * file's own column, else the smoothed central difference), the force-velocity loop for
 * plotting, the half-cycles and the peak points per direction (sorted by speed).
 */
export function seriesToPeaks(series: DynoTimeSeries, opts: SeriesToPeaksOptions = {}): DynoSeriesAnalysis {
  const fromFile = series.velocity !== undefined;
  const h = fromFile ? 0 : Math.max(1, Math.round(opts.halfWindow ?? 2));
  const velocity = series.velocity ? [...series.velocity] : centralDifferenceVelocity(series.time, series.displacement, h);
  const vMax = velocity.reduce((m, v) => Math.max(m, Math.abs(v)), 0);
  const deadband = opts.deadband ?? Math.max(0.001, 0.005 * vMax);
  const method = opts.method ?? 'peak-per-half-cycle';
  const warnings: string[] = [];
  const halfCycles = findHalfCycles(velocity, series.force, deadband, Math.max(h, 1));
  let peaks: DynoPeakPoints;
  if (method === 'velocity-bins') {
    peaks = vMax > 0 ? binnedPoints(velocity, series.force, vMax, Math.max(2, Math.round(opts.bins ?? 20)), deadband) : { compression: [], rebound: [] };
  } else {
    peaks = {
      compression: halfCycles.filter((c) => c.direction === 'compression').map(({ velocity: v, force }) => ({ velocity: v, force })).sort(byVelocity),
      rebound: halfCycles.filter((c) => c.direction === 'rebound').map(({ velocity: v, force }) => ({ velocity: v, force })).sort(byVelocity),
    };
  }
  if (vMax === 0) warnings.push('the rod does not move: no velocity in the record');
  else if (peaks.compression.length + peaks.rebound.length === 0) warnings.push('no complete stroke found; the record may be too short or start and end mid-stroke');
  let against = 0;
  let moving = 0;
  velocity.forEach((v, i) => {
    if (Math.abs(v) <= deadband) return;
    moving++;
    if (v * series.force[i] < 0) against++;
  });
  if (moving > 0 && against > moving / 2) warnings.push('force mostly helps the motion: force and displacement seem to use opposite sign conventions');
  const sanity = directionSanityWarning(peaks.compression, peaks.rebound);
  if (sanity) warnings.push(sanity);
  return {
    velocitySource: fromFile ? 'file' : 'central-difference',
    halfWindow: h,
    method,
    loop: thin(series, velocity, opts.maxLoopPoints ?? 4000),
    halfCycles,
    peaks,
    warnings,
  };
}
