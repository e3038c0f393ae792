import FFT from 'fft.js';
import { floorPow2 } from '../sim/metrics/spectra.ts';

/** Mean-removed copy of x[from..]. */
export function centred(x: ArrayLike<number>, from: number): Float64Array {
  const n = x.length - from;
  let mean = 0;
  for (let i = from; i < x.length; i++) mean += x[i];
  mean /= n;
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) out[i] = x[from + i] - mean;
  return out;
}

export const rms = (x: Float64Array): number => Math.sqrt(x.reduce((s, v) => s + v * v, 0) / x.length);

/** rms(measured − model) / rms(measured), both mean-removed: 0 is a perfect fit, 1 as bad as a flat line. */
export function normalisedError(measured: Float64Array, model: Float64Array): number {
  let e = 0;
  let m = 0;
  for (let i = 0; i < measured.length; i++) {
    e += (measured[i] - model[i]) ** 2;
    m += measured[i] ** 2;
  }
  return m > 0 ? Math.sqrt(e / m) : Infinity;
}

export interface PairSpectra {
  freq: Float64Array;
  /** One-sided PSDs, unit²/Hz. */
  measured: Float64Array;
  model: Float64Array;
  /** Magnitude-squared coherence |Pxy|²/(Pxx·Pyy), 0..1. */
  coherence: Float64Array;
}

/** Segments the coherence is averaged over at least: with one segment it would read 1 everywhere. */
const MIN_SEGMENTS = 8;

/**
 * Welch estimates (Hann window, 50 % overlap, mean removed per segment; Welch 1967) of both
 * PSDs and their cross spectrum, and from them the magnitude-squared coherence (Bendat and
 * Piersol, Random Data, ch. 5; from memory). The segment is the largest power of two giving at
 * least eight half-overlapping segments.
 */
export function pairSpectra(x: Float64Array, y: Float64Array, dt: number): PairSpectra {
  const n = Math.max(16, floorPow2((2 * x.length) / (MIN_SEGMENTS + 1)));
  const fft = new FFT(n);
  const w = new Float64Array(n);
  let wp = 0;
  for (let i = 0; i < n; i++) {
    w[i] = 0.5 - 0.5 * Math.cos((2 * Math.PI * i) / n);
    wp += w[i] * w[i];
  }
  const bins = n / 2 + 1;
  const pxx = new Float64Array(bins);
  const pyy = new Float64Array(bins);
  const re = new Float64Array(bins);
  const im = new Float64Array(bins);
  const sx = new Float64Array(n);
  const sy = new Float64Array(n);
  const fx = fft.createComplexArray() as number[];
  const fy = fft.createComplexArray() as number[];
  let count = 0;
  for (let start = 0; start + n <= x.length; start += n / 2) {
    let mx = 0;
    let my = 0;
    for (let i = 0; i < n; i++) {
      mx += x[start + i];
      my += y[start + i];
    }
    mx /= n;
    my /= n;
    for (let i = 0; i < n; i++) {
      sx[i] = (x[start + i] - mx) * w[i];
      sy[i] = (y[start + i] - my) * w[i];
    }
    fft.realTransform(fx, sx);
    fft.realTransform(fy, sy);
    for (let k = 0; k < bins; k++) {
      const a = fx[2 * k];
      const b = fx[2 * k + 1];
      const c = fy[2 * k];
      const d = fy[2 * k + 1];
      pxx[k] += a * a + b * b;
      pyy[k] += c * c + d * d;
      // X·conj(Y)
      re[k] += a * c + b * d;
      im[k] += b * c - a * d;
    }
    count++;
  }
  const scale = (2 * dt) / (wp * Math.max(1, count));
  const freq = new Float64Array(bins);
  const coherence = new Float64Array(bins);
  for (let k = 0; k < bins; k++) {
    freq[k] = k / (n * dt);
    const den = pxx[k] * pyy[k];
    coherence[k] = den > 0 ? (re[k] * re[k] + im[k] * im[k]) / den : 0;
    pxx[k] *= scale;
    pyy[k] *= scale;
  }
  return { freq, measured: pxx, model: pyy, coherence };
}

/** Band the fit is judged over, Hz: body and wheel modes of a road car (common practice). */
export const JUDGED_BAND = { low: 0.5, high: 20 } as const;

/** Mean coherence over the judged band (up to 80 % of Nyquist when that is lower). */
export function bandCoherence(s: PairSpectra, dt: number): number {
  const high = Math.min(JUDGED_BAND.high, 0.4 / dt);
  let sum = 0;
  let n = 0;
  for (let k = 0; k < s.freq.length; k++) {
    if (s.freq[k] >= JUDGED_BAND.low && s.freq[k] <= high) {
      sum += s.coherence[k];
      n++;
    }
  }
  return n ? sum / n : 0;
}
