import { describe, expect, it } from 'vitest';
import { Iso8608Road } from '../../schemas/road.ts';
import { generateIso8608Profile, isoPsd } from './iso8608.ts';

// Random (Rayleigh) amplitudes against fixed ones. The reference is the textbook property of the
// harmonic-superposition method (random-vibration texts, from memory): with fixed amplitudes the
// mean square over one period is exactly ΣAk²/2 whatever the phases, so seeds do not scatter;
// with Rayleigh amplitudes of E[R²] = 1 the expected mean square is the same, and each Ak² is
// exponentially distributed, so the seed-to-seed coefficient of variation of the mean square is
// √(Σ mk²) / Σ mk with mk = Ak²/2.

const road = (seed: number, amplitudes?: 'fixed' | 'random') => Iso8608Road.parse({ kind: 'iso8608', name: 'C', class: 'C', seed, length: 200, nMin: 0.05, amplitudes });
const meanSquare = (z: Float64Array) => {
  let mean = 0;
  for (const v of z) mean += v;
  mean /= z.length;
  let s = 0;
  for (const v of z) s += (v - mean) ** 2;
  return s / z.length;
};

/** Harmonic k of one period of z: amplitude and phase (direct DFT). */
function harmonic(z: Float64Array, k: number): { amp: number; phase: number } {
  let re = 0;
  let im = 0;
  for (let j = 0; j < z.length; j++) {
    const a = (2 * Math.PI * k * j) / z.length;
    re += z[j] * Math.cos(a);
    im += z[j] * Math.sin(a);
  }
  return { amp: (2 * Math.hypot(re, im)) / z.length, phase: Math.atan2(im, re) };
}

describe('ISO 8608 roads with random amplitudes', () => {
  const seeds = Array.from({ length: 60 }, (_, i) => i + 1);
  const fixed = seeds.map((s) => meanSquare(generateIso8608Profile(road(s)).z));
  const random = seeds.map((s) => meanSquare(generateIso8608Profile(road(s, 'random')).z));
  const p = generateIso8608Profile(road(1));
  const dn = 1 / p.length;
  const mk: number[] = [];
  for (let n = p.nMin; n <= p.nMax + 1e-12; n += dn) mk.push(isoPsd({ class: 'C', waviness: 2 }, n) * dn);
  const expected = mk.reduce((a, b) => a + b, 0);

  it('fixed amplitudes give every seed the same mean square, ΣAk²/2', () => {
    for (const ms of fixed) expect(ms / expected).toBeCloseTo(1, 6);
  });

  it('random amplitudes keep the expected mean square and scatter between seeds as the theory says', () => {
    const mean = random.reduce((a, b) => a + b, 0) / random.length;
    const sd = Math.sqrt(random.reduce((a, b) => a + (b - mean) ** 2, 0) / (random.length - 1));
    const cvTheory = Math.sqrt(mk.reduce((a, b) => a + b * b, 0)) / expected;
    // 60 seeds: the sample mean is within about 2.5 standard errors of the expectation
    expect(Math.abs(mean / expected - 1)).toBeLessThan((2.5 * cvTheory) / Math.sqrt(seeds.length));
    expect(sd / mean / cvTheory).toBeGreaterThan(0.65);
    expect(sd / mean / cvTheory).toBeLessThan(1.35);
  });

  it('keeps each seed\'s phases: only the amplitudes change', () => {
    const a = generateIso8608Profile(road(7)).z;
    const b = generateIso8608Profile(road(7, 'random')).z;
    for (const k of [12, 40, 97]) {
      const ha = harmonic(a, k);
      const hb = harmonic(b, k);
      expect(Math.cos(ha.phase - hb.phase)).toBeCloseTo(1, 6);
      expect(hb.amp / ha.amp).not.toBeCloseTo(1, 3);
    }
  });
});
