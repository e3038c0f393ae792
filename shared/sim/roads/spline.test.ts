import { describe, expect, it } from 'vitest';
import { gridSpline } from './spline.ts';

const out = new Float64Array(2);
const at = (s: ReturnType<typeof gridSpline>, x: number) => (s.at(x, out), [out[0], out[1]] as const);

describe('grid spline', () => {
  it('passes through every sample', () => {
    const z = Float64Array.from({ length: 50 }, (_, i) => Math.sin(i * 0.7) + 0.1 * i);
    const s = gridSpline(z, 0.2, false);
    for (let i = 0; i < 50; i++) expect(at(s, i * 0.2)[0]).toBeCloseTo(z[i], 12);
  });

  it('reproduces a sampled sine and its slope at ten points per wavelength', () => {
    // One period over 64 samples, evaluated between samples: the spline error at ~10 points
    // per wavelength is below 0.1 % of the amplitude (value) and 1 % (slope).
    const n = 640;
    const dx = 0.01;
    const k = (2 * Math.PI) / (10 * dx);
    const z = Float64Array.from({ length: n }, (_, i) => Math.sin(k * i * dx));
    const s = gridSpline(z, dx, true);
    for (const x of [0.0137, 1.2345, 3.3333, 6.3999]) {
      const [v, d] = at(s, x);
      expect(Math.abs(v - Math.sin(k * x))).toBeLessThan(1e-3);
      expect(Math.abs(d / k - Math.cos(k * x))).toBeLessThan(1e-2);
    }
  });

  it('a periodic spline wraps smoothly: value and slope agree across the period', () => {
    const n = 256;
    const z = Float64Array.from({ length: n }, (_, i) => Math.cos((2 * Math.PI * 3 * i) / n) + 0.3 * Math.sin((2 * Math.PI * 7 * i) / n));
    const s = gridSpline(z, 0.5, true);
    const L = n * 0.5;
    const [v1, d1] = at(s, L - 1e-9);
    const [v2, d2] = at(s, 1e-9);
    expect(v1).toBeCloseTo(v2, 6);
    expect(d1).toBeCloseTo(d2, 6);
    const [v3] = at(s, L + 12.3);
    expect(v3).toBeCloseTo(at(s, 12.3)[0], 12);
  });

  it('is C²: the second difference of the slope shows no jump at a sample', () => {
    const z = Float64Array.from({ length: 40 }, (_, i) => Math.exp(-((i - 20) ** 2) / 30) + (i % 3) * 0.01);
    const s = gridSpline(z, 1, false);
    const h = 1e-5;
    for (const xi of [10, 17, 25]) {
      const curvLeft = (at(s, xi - h)[1] - at(s, xi - 2 * h)[1]) / h;
      const curvRight = (at(s, xi + 2 * h)[1] - at(s, xi + h)[1]) / h;
      expect(Math.abs(curvLeft - curvRight)).toBeLessThan(1e-3);
    }
  });

  it('holds the end values flat outside a non-periodic profile', () => {
    const z = Float64Array.from([0, 1, 0.5, 2]);
    const s = gridSpline(z, 1, false);
    expect(at(s, -3)).toEqual([0, 0]);
    expect(at(s, 9)).toEqual([2, 0]);
  });
});
