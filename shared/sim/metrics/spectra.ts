import FFT from 'fft.js';

/** One-sided power spectral density: `psd[k]` in unit²/Hz (or unit²/(cycle/m) for profiles) at `freq[k]`. */
export interface Psd {
  freq: Float64Array;
  psd: Float64Array;
}

export interface WelchOptions {
  /** Samples per segment, a power of two ≥ 16; default the largest power of two ≤ n/4 (≈ 7 segments). */
  segmentLength?: number;
  /** First sample used; default 0. */
  from?: number;
}

/** Largest power of two ≤ x (x ≥ 1). */
export function floorPow2(x: number): number {
  return 2 ** Math.floor(Math.log2(Math.max(1, x)));
}

/** Segment length a signal of n samples gets by default: about seven half-overlapping segments. */
export function defaultSegmentLength(n: number): number {
  return Math.max(16, floorPow2(n / 4));
}

/**
 * Welch estimator for one segment length and sample step, reusable over several signals of the
 * same run: Hann window (periodic), 50 % overlap, mean removed per segment, one-sided density
 * scaled so that Σ psd·Δf equals the mean square of the (mean-removed) signal.
 */
export function createWelch(segmentLength: number, dt: number) {
  const n = segmentLength;
  if (!(n >= 16 && (n & (n - 1)) === 0)) throw new Error(`createWelch: segment length must be a power of two ≥ 16, got ${n}`);
  const fft = new FFT(n);
  const window = new Float64Array(n);
  let windowPower = 0;
  for (let i = 0; i < n; i++) {
    window[i] = 0.5 - 0.5 * Math.cos((2 * Math.PI * i) / n);
    windowPower += window[i] * window[i];
  }
  const segment = new Float64Array(n);
  const spectrum = new Float64Array(2 * n);
  const bins = n / 2 + 1;
  const freq = new Float64Array(bins);
  for (let k = 0; k < bins; k++) freq[k] = k / (n * dt);
  const scale = (2 * dt) / windowPower;

  /** PSD of x[from..]; segments that do not fit whole are dropped (at most n/2 − 1 samples). */
  function psd(x: Float64Array, from = 0): Float64Array {
    const out = new Float64Array(bins);
    const step = n / 2;
    let count = 0;
    for (let start = from; start + n <= x.length; start += step) {
      let mean = 0;
      for (let i = 0; i < n; i++) mean += x[start + i];
      mean /= n;
      for (let i = 0; i < n; i++) segment[i] = (x[start + i] - mean) * window[i];
      fft.realTransform(spectrum, segment);
      for (let k = 0; k < bins; k++) {
        const re = spectrum[2 * k];
        const im = spectrum[2 * k + 1];
        out[k] += re * re + im * im;
      }
      count++;
    }
    if (count === 0) throw new Error(`welch: ${x.length - from} samples do not fill one segment of ${n}`);
    for (let k = 0; k < bins; k++) out[k] *= scale / count;
    // DC and Nyquist have no mirror image in the one-sided spectrum.
    out[0] /= 2;
    out[bins - 1] /= 2;
    return out;
  }

  return { segmentLength: n, freq, psd };
}

/** Welch PSD of one signal sampled every `dt`. */
export function welchPsd(x: Float64Array, dt: number, opts: WelchOptions = {}): Psd {
  const from = opts.from ?? 0;
  const n = opts.segmentLength ?? defaultSegmentLength(x.length - from);
  const welch = createWelch(n, dt);
  return { freq: welch.freq, psd: welch.psd(x, from) };
}
