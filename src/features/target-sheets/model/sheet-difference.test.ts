import { describe, expect, it } from 'vitest';
import { directionDifference } from './sheet-difference.ts';

describe('directionDifference', () => {
  it('lines up both sheets by speed, marks new, dropped and changed points, and gives the change of target in per cent', () => {
    const before = [
      { velocity: 0.05, force: 200, tolPct: 10, floorN: 20 },
      { velocity: 0.1, force: 400, tolPct: 10, floorN: 20 },
    ];
    const after = [
      { velocity: 0.1, force: 400, tolPct: 10, floorN: 20 },
      { velocity: 0.2, force: 700, tolPct: 8, floorN: 20 },
      { velocity: 0.05, force: 150, tolPct: 10, floorN: 20 },
    ];
    const rows = directionDifference(before, after);
    expect(rows.map((r) => r.velocity)).toEqual([0.05, 0.1, 0.2]);
    // 150 against 200: −25 % (hand-worked); at 150 N, 10 % is 15 N, under the 20 N floor, so the band is ±20 N.
    expect(rows[0]).toMatchObject({ changed: true, forceChangePct: -25, before: { force: 200, lower: 180, upper: 220 }, after: { force: 150, lower: 130, upper: 170 } });
    expect(rows[1]).toMatchObject({ changed: false, forceChangePct: 0 });
    expect(rows[2]).toMatchObject({ changed: true, before: null, forceChangePct: null });
  });
});
