import type uPlot from 'uplot';
import { formatTick } from './chart-theme.ts';

/**
 * Scale and axis helpers for charts whose x is not a calendar date (uPlot defaults to time) and
 * for spectra / frequency responses drawn on log axes.
 */

/** Linear x scale in physical units (seconds from zero, metres, m/s …). */
export const linearX: uPlot.Scale = { time: false };

/** Base-10 log scale; data must be > 0 (drop DC bins before plotting a PSD). */
export function logScale(range?: [number, number]): uPlot.Scale {
  const scale: uPlot.Scale = { time: false, distr: 3, log: 10 };
  if (range) scale.range = () => range;
  return scale;
}

/** Powers of ten that lie within [min, max]. */
export function decadesIn(min: number, max: number): number[] {
  if (!(min > 0) || !(max > 0) || max < min) return [];
  const out: number[] = [];
  for (let e = Math.floor(Math.log10(min)); e <= Math.ceil(Math.log10(max)); e++) {
    const v = 10 ** e;
    if (v >= min * (1 - 1e-9) && v <= max * (1 + 1e-9)) out.push(v);
  }
  return out;
}

/**
 * Tick labels for a log axis: label the decades and the 2× and 5× steps only when there are few
 * decades, so the axis never crowds.
 */
export function logTickValues(_u: uPlot, splits: number[]): string[] {
  const lo = splits[0] ?? 1;
  const hi = splits[splits.length - 1] ?? 1;
  const decades = Math.log10(hi / lo);
  return splits.map((v) => {
    const mantissa = Math.round(v / 10 ** Math.floor(Math.log10(v) + 1e-9));
    const keep = mantissa === 1 || (decades <= 3 && (mantissa === 2 || mantissa === 5));
    return keep ? formatTick(v) : '';
  });
}

/**
 * Axis splits for a log scale: the decades only, plus 2× and 5× when the range spans fewer than
 * three decades. Keeps the grid of a many-decade spectrum light.
 */
export function logSplits(_u: uPlot, _axis: number, min: number, max: number): number[] {
  const decades = decadesIn(min, max);
  if (decades.length >= 3) return decades;
  const out: number[] = [];
  for (let e = Math.floor(Math.log10(min)); e <= Math.ceil(Math.log10(max)); e++) {
    for (const m of [1, 2, 5]) {
      const v = m * 10 ** e;
      if (v >= min * (1 - 1e-9) && v <= max * (1 + 1e-9)) out.push(v);
    }
  }
  return out;
}

/** Log-log scales (x and y), e.g. a spatial PSD in m³ against wavenumber in cycles/m. */
export function logLogScales(xRange?: [number, number], yRange?: [number, number]): uPlot.Options['scales'] {
  return { x: logScale(xRange), y: logScale(yRange) };
}

/**
 * A log scale range in whole decades holding the positive values, at most `maxDecades` below the
 * highest. Use it (and leave values below it out as null) for spectra: uPlot's log tick
 * generator can loop without end on ranges reaching far below 1e−16, which a Welch PSD with
 * leakage easily does.
 */
export function logDecadeRange(values: ArrayLike<number>, maxDecades = 8): [number, number] {
  let max = 0;
  let min = Number.POSITIVE_INFINITY;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (v > 0 && Number.isFinite(v)) {
      if (v > max) max = v;
      if (v < min) min = v;
    }
  }
  if (!(max > 0)) return [0.1, 1];
  const hi = 10 ** Math.ceil(Math.log10(max));
  const lo = Math.max(10 ** Math.floor(Math.log10(min)), hi / 10 ** maxDecades);
  return [lo, hi];
}
