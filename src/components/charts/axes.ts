import type uPlot from 'uplot';
import { formatTick } from './tick-format.ts';

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

const SUPERSCRIPT: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

/** `powerOfTen(2, -5)` → "2×10⁻⁵"; a mantissa of 1 is left out ("10⁻⁵"). */
function powerOfTen(mantissa: number, exponent: number): string {
  const power = `10${String(exponent).replace(/./g, (c) => SUPERSCRIPT[c] ?? c)}`;
  return mantissa === 1 ? power : `${mantissa}×${power}`;
}

/** Plain decimals read best between 0.001 and 10 000; beyond that every label is a power of ten. */
const PLAIN_MIN = 1e-3;
const PLAIN_MAX = 1e4;

/**
 * Tick labels for a log axis: label the decades and the 2× and 5× steps only when there are few
 * decades, so the axis never crowds. One notation per axis: plain decimals when every label fits
 * them, powers of ten ("10⁻⁵", "2×10⁻⁵") for all labels otherwise, never a mix. uPlot may hand
 * null for a split it filtered out; it gets an empty label.
 */
export function logTickValues(_u: uPlot, splits: (number | null)[]): string[] {
  const shown = splits.filter((v): v is number => v != null && v > 0);
  const lo = shown[0] ?? 1;
  const hi = shown[shown.length - 1] ?? 1;
  const decades = Math.log10(hi / lo);
  const plain = lo >= PLAIN_MIN * (1 - 1e-9) && hi <= PLAIN_MAX * (1 + 1e-9);
  return splits.map((v) => {
    if (v == null || !(v > 0)) return '';
    const exponent = Math.floor(Math.log10(v) + 1e-9);
    const mantissa = Math.round(v / 10 ** exponent);
    const keep = mantissa === 1 || (decades <= 3 && (mantissa === 2 || mantissa === 5));
    if (!keep) return '';
    return plain ? formatTick(v) : powerOfTen(mantissa, exponent);
  });
}

/** uPlot's own log filter blanks splits it judges crowded (as null); ours already chose them. */
export function keepAllSplits(_u: uPlot, splits: number[]): number[] {
  return splits;
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
