/**
 * Single-pass statistics over x[from..end). No allocation besides the small result object, so
 * they can run on every column of a 60 s trace inside the per-run budget.
 */

/** √(mean of (x − about)²). */
export function rms(x: Float64Array, from = 0, about = 0): number {
  const n = x.length - from;
  if (n <= 0) return 0;
  let sum = 0;
  for (let i = from; i < x.length; i++) {
    const d = x[i] - about;
    sum += d * d;
  }
  return Math.sqrt(sum / n);
}

export function mean(x: Float64Array, from = 0): number {
  const n = x.length - from;
  if (n <= 0) return 0;
  let sum = 0;
  for (let i = from; i < x.length; i++) sum += x[i];
  return sum / n;
}

export interface Extremes {
  min: number;
  max: number;
  /** max |x|. */
  peak: number;
}

/** RMS about `about` plus the extremes, in one pass. */
export interface Summary extends Extremes {
  rms: number;
}

export function summary(x: Float64Array, from = 0, about = 0): Summary {
  let min = Infinity;
  let max = -Infinity;
  let sum = 0;
  for (let i = from; i < x.length; i++) {
    const v = x[i];
    min = v < min ? v : min;
    max = v > max ? v : max;
    const d = v - about;
    sum += d * d;
  }
  const n = x.length - from;
  if (n <= 0) return { min: 0, max: 0, peak: 0, rms: 0 };
  return { min, max, peak: Math.max(-min, max), rms: Math.sqrt(sum / n) };
}

export function extremes(x: Float64Array, from = 0): Extremes {
  let min = Infinity;
  let max = -Infinity;
  for (let i = from; i < x.length; i++) {
    const v = x[i];
    if (v < min) min = v;
    if (v > max) max = v;
  }
  if (min > max) return { min: 0, max: 0, peak: 0 };
  return { min, max, peak: Math.max(-min, max) };
}

/** Number of samples with x > threshold. */
export function countAbove(x: Float64Array, threshold: number, from = 0): number {
  let n = 0;
  for (let i = from; i < x.length; i++) if (x[i] > threshold) n++;
  return n;
}

/** Σ a·b over the range (for power and energy). */
export function dot(a: Float64Array, b: Float64Array, from = 0): number {
  let sum = 0;
  const end = Math.min(a.length, b.length);
  for (let i = from; i < end; i++) sum += a[i] * b[i];
  return sum;
}
