import { describe, expect, it } from 'vitest';
import { countAbove, dot, extremes, mean, rms, summary } from './stats.ts';

const x = Float64Array.from([10, -10, 3, -4, 0, 5]);

describe('stats over a sample range', () => {
  it('rms about zero and about a level, from an index', () => {
    expect(rms(x, 2)).toBeCloseTo(Math.sqrt((9 + 16 + 0 + 25) / 4), 12);
    expect(rms(x, 2, 1)).toBeCloseTo(Math.sqrt((4 + 25 + 1 + 16) / 4), 12);
  });

  it('mean, extremes and peak from an index', () => {
    expect(mean(x, 2)).toBeCloseTo(1, 12);
    expect(extremes(x, 2)).toEqual({ min: -4, max: 5, peak: 5 });
    expect(extremes(x)).toEqual({ min: -10, max: 10, peak: 10 });
  });

  it('counts samples strictly above a threshold and sums products', () => {
    expect(countAbove(x, 0, 1)).toBe(2);
    expect(dot(x, x, 4)).toBe(25);
  });

  it('summary gives the same RMS and extremes in one pass', () => {
    expect(summary(x, 1, 2)).toEqual({ ...extremes(x, 1), rms: expect.closeTo(rms(x, 1, 2), 12) });
  });

  it('returns zeros on an empty range', () => {
    expect(summary(x, 6)).toEqual({ min: 0, max: 0, peak: 0, rms: 0 });
    expect(rms(x, 6)).toBe(0);
    expect(extremes(x, 6)).toEqual({ min: 0, max: 0, peak: 0 });
  });
});
