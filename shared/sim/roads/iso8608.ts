import FFT from 'fft.js';
import seedrandom from 'seedrandom';
import type { Iso8608Road, IsoClass } from '../../schemas/road.ts';
import type { RoadSummary } from '../../schemas/run.ts';
import { atSpeed, footprintGain, type RoadExcitation } from './excitation.ts';
import { gridSpline, type GridSpline } from './spline.ts';

/**
 * ISO 8608 random road (ISO 8608:2016; class values from memory, docs/model.md §3): displacement PSD
 * Gd(n) = Gd(n0)·(n/n0)^−w, n0 = 0.1 cycle/m, one-sided, m³.
 *
 * Generation: harmonic superposition with seeded random phases,
 * z(x) = Σk Ak·cos(2π·nk·x + φk), nk = k/L, Ak = √(2·Gd(nk)·Δn), Δn = 1/L, summed by one
 * inverse FFT on a power-of-two grid. With `amplitudes: 'random'` each Ak is also multiplied
 * by a Rayleigh variate Rk = √(−ln Uk) (E[Rk²] = 1, so the PSD's expectation is unchanged):
 * random phase with Rayleigh amplitude makes each Fourier coefficient a complex Gaussian, i.e.
 * the road a Gaussian process whose mean square differs from seed to seed (a standard result
 * of random-vibration texts, from memory). The amplitude draws come from their own seeded
 * stream, so the phases of a seed are the same whichever amplitudes are chosen. The profile is periodic with period L (default 1024 m),
 * so it does not depend on speed or run length: the same (class, seed, band, waviness, L)
 * is the same road at any speed and on every machine. Phases are drawn for k = 1, 2, … in
 * order from seedrandom's ARC4 generator keyed by the seed, so widening the band keeps the
 * harmonics already present.
 */

export const ISO_N0 = 0.1;
export const DEFAULT_BAND = { nMin: 0.011, nMax: 2.83 } as const;
export const DEFAULT_PERIOD = 1024;
export const DEFAULT_WAVINESS = 2;

/** Geometric mean Gd(n0) of each class, m³ (ISO 8608, from memory; ×4 per class). */
export const isoClassRoughness: Record<IsoClass, number> = {
  A: 16e-6,
  B: 64e-6,
  C: 256e-6,
  D: 1024e-6,
  E: 4096e-6,
  F: 16384e-6,
  G: 65536e-6,
  H: 262144e-6,
};

/** Grid points per shortest wavelength at least; the spline error there is then below 0.1 %. */
const MIN_POINTS_PER_WAVELENGTH = 10;
const MAX_GRID = 1 << 21;

export interface IsoProfile {
  /** Distance of sample 0, m (always 0). */
  x0: number;
  /** Grid step, m. */
  dx: number;
  /** Elevation, m, one period (z[N] would equal z[0]); zero mean. */
  z: Float64Array;
  /** Lowest and highest harmonic actually present, cycle/m. */
  nMin: number;
  nMax: number;
  /** Period, m. */
  length: number;
  /** Number of harmonics. */
  harmonics: number;
  /** Gd(n0) of the class, m³. */
  roughness: number;
  waviness: number;
}

/** FFT objects hold their twiddle tables; building one is a large part of a road's cost. */
const ffts = new Map<number, FFT>();
function fftOfSize(size: number): FFT {
  let f = ffts.get(size);
  if (!f) {
    if (ffts.size > 4) ffts.clear();
    f = new FFT(size);
    ffts.set(size, f);
  }
  return f;
}

/** One-sided displacement PSD of a road's class at spatial frequency n, m³. */
export function isoPsd(road: Pick<Iso8608Road, 'class' | 'waviness'>, n: number): number {
  return isoClassRoughness[road.class] * (n / ISO_N0) ** -(road.waviness ?? DEFAULT_WAVINESS);
}

/**
 * Elevation of an ISO 8608 road on its periodic grid. `footprint` (m) applies the tyre's
 * moving average exactly, as the gain sin(πnL)/(πnL) on each harmonic.
 */
export function generateIso8608Profile(road: Iso8608Road, options: { footprint?: number } = {}): IsoProfile {
  const length = road.length ?? DEFAULT_PERIOD;
  const nLo = road.nMin ?? DEFAULT_BAND.nMin;
  const nHi = road.nMax ?? DEFAULT_BAND.nMax;
  const w = road.waviness ?? DEFAULT_WAVINESS;
  let size = 16;
  while (size < length * nHi * MIN_POINTS_PER_WAVELENGTH && size < MAX_GRID) size *= 2;
  const dn = 1 / length;
  const kMin = Math.max(1, Math.ceil(nLo * length - 1e-9));
  // Keep the highest harmonic below a tenth of the grid rate even when the grid is capped.
  const kMax = Math.min(Math.floor(nHi * length + 1e-9), Math.floor(size / MIN_POINTS_PER_WAVELENGTH));
  const gd0 = isoClassRoughness[road.class];
  const rng = seedrandom(`iso8608:${road.seed}`);
  const amplitudeRng = road.amplitudes === 'random' ? seedrandom(`iso8608-amplitude:${road.seed}`) : null;
  const fft = fftOfSize(size);
  const spectrum = new Float64Array(2 * size);
  for (let k = 1; k <= kMax; k++) {
    const phase = 2 * Math.PI * rng();
    // 1 − U lies in (0, 1]: never the log of zero
    const rayleigh = amplitudeRng ? Math.sqrt(-Math.log(1 - amplitudeRng())) : 1;
    if (k < kMin) continue;
    const n = k * dn;
    const amp = rayleigh * Math.sqrt(2 * gd0 * (n / ISO_N0) ** -w * dn) * footprintGain(n, options.footprint);
    // Only positive frequencies, scaled by N: the real part of the inverse transform
    // (which divides by N) is then Σ Ak·cos(2π k j/N + φk).
    spectrum[2 * k] = size * amp * Math.cos(phase);
    spectrum[2 * k + 1] = size * amp * Math.sin(phase);
  }
  const out = new Float64Array(2 * size);
  fft.inverseTransform(out, spectrum);
  const z = new Float64Array(size);
  for (let j = 0; j < size; j++) z[j] = out[2 * j];
  return {
    x0: 0,
    dx: length / size,
    z,
    nMin: kMin * dn,
    nMax: kMax * dn,
    length,
    harmonics: Math.max(0, kMax - kMin + 1),
    roughness: gd0,
    waviness: w,
  };
}

/**
 * Recently built ISO roads, keyed by everything that shapes them. A study drives hundreds of
 * setups over the same road; generating it once per worker saves an FFT and a spline solve
 * per run. The profile is a pure function of the key, so a cached one is the same road.
 */
const splineCache = new Map<string, { at: GridSpline['at']; profile: IsoProfile }>();
const CACHE_SIZE = 4;

/** Forgets cached roads (the benchmark uses it to time generation from scratch). */
export function clearIsoRoadCache(): void {
  splineCache.clear();
}

function cachedSpline(road: Iso8608Road, footprint: number | undefined) {
  const key = JSON.stringify([road.class, road.seed, road.nMin, road.nMax, road.waviness, road.length, road.amplitudes, footprint]);
  let hit = splineCache.get(key);
  if (!hit) {
    const profile = generateIso8608Profile(road, { footprint });
    // Shifted so the tyre starts at zero elevation: the corner starts in static equilibrium
    // on a level road (docs/model.md §1); a constant offset changes nothing else.
    const z0 = profile.z[0];
    const shifted = new Float64Array(profile.z.length);
    for (let i = 0; i < shifted.length; i++) shifted[i] = profile.z[i] - z0;
    hit = { at: gridSpline(shifted, profile.dx, true).at, profile };
    if (splineCache.size >= CACHE_SIZE) splineCache.delete(splineCache.keys().next().value as string);
    splineCache.set(key, hit);
  }
  return hit;
}

/** The road as a time input at `speed` (m/s) for a run of `duration` (s). */
export function iso8608Excitation(road: Iso8608Road, speed: number, duration: number, footprint?: number): RoadExcitation {
  const { at, profile: p } = cachedSpline(road, footprint);
  const summary: RoadSummary = {
    kind: 'iso8608',
    name: road.name,
    nMin: p.nMin,
    nMax: p.nMax,
    roughness: p.roughness,
    seed: road.seed,
    length: p.length,
    spacing: p.dx,
    distance: speed * duration,
  };
  return atSpeed({ at, kinks: [] }, speed, duration, summary);
}
