import seedrandom from 'seedrandom';
import { describe, expect, it } from 'vitest';
import { createWelch, defaultSegmentLength, welchPsd } from './spectra.ts';

function gaussian(n: number, seed: string): Float64Array {
  const rng = seedrandom(seed);
  const out = new Float64Array(n);
  for (let i = 0; i < n; i += 2) {
    const r = Math.sqrt(-2 * Math.log(1 - rng()));
    const t = 2 * Math.PI * rng();
    out[i] = r * Math.cos(t);
    if (i + 1 < n) out[i + 1] = r * Math.sin(t);
  }
  return out;
}

describe('Welch PSD', () => {
  it('puts a sine at its frequency with its mean square A²/2 under the peak', () => {
    const dt = 1 / 256;
    const A = 0.3;
    const f = 8; // on a bin for 1024-sample segments
    const x = Float64Array.from({ length: 16384 }, (_, i) => A * Math.sin(2 * Math.PI * f * i * dt));
    const { freq, psd } = welchPsd(x, dt, { segmentLength: 1024 });
    const df = freq[1];
    const peak = psd.indexOf(Math.max(...psd));
    expect(freq[peak]).toBeCloseTo(f, 9);
    let power = 0;
    for (let k = peak - 3; k <= peak + 3; k++) power += psd[k] * df;
    expect(power).toBeCloseTo((A * A) / 2, 6);
  });

  it('gives white noise of variance σ² the one-sided level 2σ²·dt', () => {
    const dt = 0.01;
    const sigma = 2;
    const x = gaussian(1 << 17, 'white').map((v) => sigma * v);
    const { psd } = welchPsd(x, dt, { segmentLength: 256 });
    const inner = psd.slice(2, -2);
    const level = inner.reduce((a, b) => a + b, 0) / inner.length;
    // ~1000 segments × 126 lines: the mean level is known to well under 1 %.
    expect(level / (2 * sigma * sigma * dt)).toBeGreaterThan(0.98);
    expect(level / (2 * sigma * sigma * dt)).toBeLessThan(1.02);
  });

  it('satisfies Parseval: Σ psd·Δf equals the variance of noise within 2 %', () => {
    const dt = 0.005;
    const x = gaussian(1 << 15, 'parseval').map((v) => 0.5 * v + 3);
    const { freq, psd } = welchPsd(x, dt);
    const total = psd.reduce((a, b) => a + b, 0) * freq[1];
    expect(total / 0.25).toBeGreaterThan(0.98);
    expect(total / 0.25).toBeLessThan(1.02);
  });

  it('starts at `from` and defaults to about seven half-overlapping segments', () => {
    expect(defaultSegmentLength(24000)).toBe(4096);
    const x = new Float64Array(3000);
    x.fill(100, 0, 1000);
    for (let i = 1000; i < 3000; i++) x[i] = Math.sin(i);
    const skip = welchPsd(x, 1, { from: 1000, segmentLength: 256 });
    const whole = welchPsd(x, 1, { segmentLength: 256 });
    expect(skip.psd[1]).toBeLessThan(whole.psd[1] / 10);
  });

  it('rejects a segment length that is not a power of two', () => {
    expect(() => createWelch(1000, 0.01)).toThrow(/power of two/);
  });
});
