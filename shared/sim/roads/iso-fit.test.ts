import FFT from 'fft.js';
import seedrandom from 'seedrandom';
import { describe, expect, it } from 'vitest';
import { classOf, fitIso8608, isoClassBounds } from './iso-fit.ts';

/** Profile with Gd(n) = gdn0·(n/0.1)^−w on nLo..nHi, by one complex FFT of random-phase harmonics. */
function syntheticProfile(gdn0: number, w: number, seed: string, dx = 0.05, N = 1 << 15, nLo = 0.005, nHi = 5): Float64Array {
  const rng = seedrandom(seed);
  const fft = new FFT(N);
  const spec = new Float64Array(2 * N);
  const dn = 1 / (N * dx);
  for (let k = 1; k < N / 2; k++) {
    const n = k * dn;
    if (n < nLo || n > nHi) continue;
    const amp = Math.sqrt(2 * gdn0 * (n / 0.1) ** -w * dn);
    const phase = 2 * Math.PI * rng();
    spec[2 * k] = amp * Math.cos(phase);
    spec[2 * k + 1] = -amp * Math.sin(phase);
  }
  const out = new Float64Array(2 * N);
  fft.transform(out, spec);
  return Float64Array.from({ length: N }, (_, i) => out[2 * i]);
}

describe('ISO 8608 class bounds (ISO 8608:2016, from memory)', () => {
  it('gives class C a geometric mean of 256e-6 m³ spanning a factor 4', () => {
    const c = isoClassBounds('C');
    expect(c.mean).toBeCloseTo(256e-6, 15);
    expect(c.lower).toBeCloseTo(128e-6, 15);
    expect(c.upper).toBeCloseTo(512e-6, 15);
    expect(isoClassBounds('H').mean).toBeCloseTo(262144e-6, 12);
  });

  it('classifies by the geometric-mean bands and clamps beyond A and H', () => {
    expect(classOf(16e-6)).toBe('A');
    expect(classOf(64e-6)).toBe('B');
    expect(classOf(0.99 * 512e-6)).toBe('C');
    expect(classOf(1.01 * 512e-6)).toBe('D');
    expect(classOf(1e-9)).toBe('A');
    expect(classOf(10)).toBe('H');
  });
});

describe('fitIso8608', () => {
  it('recovers class, level and waviness of a synthetic class C profile (w = 2)', () => {
    const fit = fitIso8608({ dx: 0.05, z: syntheticProfile(256e-6, 2, 'road-c') });
    if (!fit.ok) throw new Error(fit.reason);
    expect(fit.className).toBe('C');
    expect(fit.gdn0 / 256e-6).toBeGreaterThan(0.9);
    expect(fit.gdn0 / 256e-6).toBeLessThan(1.1);
    expect(fit.waviness).toBeGreaterThan(1.95);
    expect(fit.waviness).toBeLessThan(2.05);
    expect(fit.band.nMin).toBeGreaterThanOrEqual(0.011);
    expect(fit.band.nMax).toBeCloseTo(2.83, 12);
  });

  it('recovers a waviness of 2.5 and holds it fixed when asked', () => {
    const z = syntheticProfile(1024e-6, 2.5, 'road-d');
    const free = fitIso8608({ dx: 0.05, z });
    if (!free.ok) throw new Error(free.reason);
    expect(free.waviness).toBeGreaterThan(2.4);
    expect(free.waviness).toBeLessThan(2.6);
    expect(free.className).toBe('D');
    const fixed = fitIso8608({ dx: 0.05, z }, { waviness: 2 });
    if (!fixed.ok) throw new Error(fixed.reason);
    expect(fixed.waviness).toBe(2);
  });

  it('cuts the band at a quarter of the sampling rate for a coarse profile', () => {
    const fit = fitIso8608({ dx: 0.25, z: syntheticProfile(64e-6, 2, 'coarse', 0.25, 1 << 13, 0.005, 1.9) });
    if (!fit.ok) throw new Error(fit.reason);
    expect(fit.band.nMax).toBeCloseTo(1, 12);
    expect(fit.className).toBe('B');
  });

  it('returns a reason instead of a fit for a profile too short to resolve an octave', () => {
    const short = fitIso8608({ dx: 0.05, z: new Float64Array(40) });
    expect(short.ok).toBe(false);
    const narrow = fitIso8608({ dx: 1, z: syntheticProfile(256e-6, 2, 'x', 1, 64, 0.01, 0.4) });
    expect(narrow).toEqual({ ok: false, reason: expect.stringMatching(/octave|lines/) });
  });
});
