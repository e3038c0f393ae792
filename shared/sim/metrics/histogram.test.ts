import { describe, expect, it } from 'vitest';
import { niceHalfWidth, symmetricHistogram, velocityBands } from './histogram.ts';

describe('damper velocity histogram', () => {
  it('bins symmetric about zero and clamps values beyond the range into the end bins', () => {
    const v = Float64Array.from([-0.3, -0.05, 0.01, 0.04, 0.06, 0.2, 0.9]);
    const h = symmetricHistogram(v, 0.2, 4);
    expect(h.edges).toEqual([-0.2, -0.1, 0, 0.1, 0.2]);
    expect(h.counts).toEqual([1, 1, 3, 2]);
    expect(h.counts.reduce((a, b) => a + b, 0)).toBe(v.length);
  });

  it('rounds the range up to 1, 2 or 5 × 10ⁿ', () => {
    expect(niceHalfWidth(0.37)).toBe(0.5);
    expect(niceHalfWidth(0.11)).toBeCloseTo(0.2, 12);
    expect(niceHalfWidth(1)).toBe(1);
    expect(niceHalfWidth(0)).toBe(0.01);
  });
});

describe('velocity band shares', () => {
  it('splits |v| at the edges and counts compression time', () => {
    const v = Float64Array.from([0.01, -0.02, 0.1, -0.2, 0.3, -0.5, 0.05, 0.25]);
    const b = velocityBands(v, 0.05, 0.25);
    expect(b.low).toBeCloseTo(2 / 8, 12);
    expect(b.mid).toBeCloseTo(3 / 8, 12);
    expect(b.high).toBeCloseTo(3 / 8, 12);
    expect(b.compression).toBeCloseTo(5 / 8, 12);
    expect([b.lowEdge, b.highEdge]).toEqual([0.05, 0.25]);
  });

  it('rejects edges out of order', () => {
    expect(() => velocityBands(new Float64Array(2), 0.3, 0.1)).toThrow(/low < high/);
  });
});
