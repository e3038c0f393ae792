import { isoClasses, type IsoClass } from '../../schemas/road.ts';
import { defaultSegmentLength, welchPsd } from '../metrics/spectra.ts';
import { ISO_N0, isoClassRoughness } from './iso8608.ts';

/**
 * Class bounds on Gd(n0) in m³ (ISO 8608:2016, from memory): around the geometric means
 * (16·4^k × 10⁻⁶ for A..H), each class spanning a factor 4, from half to twice its mean.
 */
export function isoClassBounds(className: IsoClass): { lower: number; mean: number; upper: number } {
  const mean = isoClassRoughness[className];
  return { lower: mean / 2, mean, upper: mean * 2 };
}

/** The class whose band holds gdn0 (m³); values beyond A or H fall into A or H. */
export function classOf(gdn0: number): IsoClass {
  const k = Math.round(Math.log(gdn0 / isoClassRoughness.A) / Math.log(4));
  return isoClasses[Math.min(isoClasses.length - 1, Math.max(0, k))];
}

export interface IsoFitOptions {
  /** Band fitted, cycle/m; defaults: the ISO default band cut to what the profile resolves. */
  nMin?: number;
  nMax?: number;
  /** Hold the waviness at this value instead of fitting it (e.g. 2). */
  waviness?: number;
  /** Welch segment length in samples (power of two). */
  segmentLength?: number;
}

export type IsoFit =
  | { ok: true; gdn0: number; waviness: number; className: IsoClass; band: { nMin: number; nMax: number }; bins: number }
  | { ok: false; reason: string };

/**
 * ISO 8608 class of a profile sampled every dx metres: Welch PSD (m³), then a least-squares
 * line through log Gd against log(n/n0) over the band, each bin weighted by 1/n so every
 * octave counts equally (the bins are evenly spaced in n). The band defaults to 0.011–2.83
 * cycle/m, raised to two Welch bins above zero (the window smears the lowest bins) and lowered
 * to a quarter of the sampling rate (resampling and anti-alias filtering bend the top).
 */
export function fitIso8608(profile: { dx: number; z: Float64Array }, opts: IsoFitOptions = {}): IsoFit {
  const { dx, z } = profile;
  if (!(dx > 0)) return { ok: false, reason: `sample spacing must be positive, got ${dx} m` };
  if (z.length < 64) return { ok: false, reason: `profile too short for a PSD: ${z.length} samples, need at least 64` };
  const segmentLength = opts.segmentLength ?? defaultSegmentLength(z.length);
  const { freq, psd } = welchPsd(z, dx, { segmentLength });
  const resolution = freq[1];
  const nMin = Math.max(opts.nMin ?? 0.011, 2 * resolution);
  const nMax = Math.min(opts.nMax ?? 2.83, 0.25 / dx);
  if (!(nMax > nMin * 2)) {
    return { ok: false, reason: `profile resolves ${nMin.toFixed(3)}–${nMax.toFixed(3)} cycle/m, less than an octave inside the band` };
  }
  // Weighted least squares y = a + b·x with x = log(n/n0), y = log Gd.
  let sw = 0;
  let sx = 0;
  let sy = 0;
  let sxx = 0;
  let sxy = 0;
  let bins = 0;
  for (let k = 1; k < freq.length; k++) {
    const n = freq[k];
    if (n < nMin || n > nMax || !(psd[k] > 0)) continue;
    const w = 1 / n;
    const x = Math.log(n / ISO_N0);
    const y = Math.log(psd[k]);
    sw += w;
    sx += w * x;
    sy += w * y;
    sxx += w * x * x;
    sxy += w * x * y;
    bins++;
  }
  if (bins < 3) return { ok: false, reason: `only ${bins} spectral lines inside ${nMin.toFixed(3)}–${nMax.toFixed(3)} cycle/m` };
  let slope: number;
  let intercept: number;
  if (opts.waviness !== undefined) {
    slope = -opts.waviness;
    intercept = (sy - slope * sx) / sw;
  } else {
    slope = (sw * sxy - sx * sy) / (sw * sxx - sx * sx);
    intercept = (sy - slope * sx) / sw;
  }
  const gdn0 = Math.exp(intercept);
  return { ok: true, gdn0, waviness: -slope, className: classOf(gdn0), band: { nMin, nMax }, bins };
}
