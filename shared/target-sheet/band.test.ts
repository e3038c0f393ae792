import { describe, expect, it } from 'vitest';
import { toleranceBand, withinBand } from './band.ts';

describe('toleranceBand', () => {
  it('is ± the percentage when that is wider than the floor', () => {
    expect(toleranceBand({ force: 1000, tolPct: 10, floorN: 20 })).toEqual({ lower: 900, upper: 1100, halfWidth: 100, floorGoverns: false });
  });

  it('is ± the floor at low force, where the percentage would be tighter', () => {
    // 10 % of 120 N is 12 N, below the 20 N floor
    expect(toleranceBand({ force: 120, tolPct: 10, floorN: 20 })).toEqual({ lower: 100, upper: 140, halfWidth: 20, floorGoverns: true });
  });

  it('keeps a lower edge below zero when the floor exceeds the target', () => {
    expect(toleranceBand({ force: 5, tolPct: 10, floorN: 20 }).lower).toBe(-15);
  });

  it('treats both edges as inside, and the smallest step past them as outside', () => {
    const b = toleranceBand({ force: 650, tolPct: 8, floorN: 25 }); // ±52 N
    expect([b.lower, b.upper]).toEqual([598, 702]);
    expect(withinBand(b, 598)).toBe(true);
    expect(withinBand(b, 702)).toBe(true);
    expect(withinBand(b, 701.999)).toBe(true);
    expect(withinBand(b, 702.001)).toBe(false);
    expect(withinBand(b, 597.999)).toBe(false);
  });
});
