import { describe, expect, it } from 'vitest';
import { bandPlotColumns } from './band-plot-data.ts';

const sheet = {
  compression: [
    { velocity: 0.05, force: 150, tolPct: 10, floorN: 20 },
    { velocity: 0.1, force: 400, tolPct: 10, floorN: 20 },
  ],
  rebound: [{ velocity: 0.1, force: 800, tolPct: 10, floorN: 20 }],
};

describe('bandPlotColumns', () => {
  it('signs rebound negative, keeps upper above lower, and breaks the lines at zero speed', () => {
    const c = bandPlotColumns(sheet);
    expect(c.x).toEqual([-0.1, 0, 0.05, 0.1]);
    expect(c.target).toEqual([-800, null, 150, 400]);
    // rebound 800 ± 80 → signed band −880 … −720
    expect(c.upper).toEqual([-720, null, 170, 440]);
    expect(c.lower).toEqual([-880, null, 130, 360]);
  });

  it('merges measured speeds onto the same x, leaving other series undefined there', () => {
    const c = bandPlotColumns(sheet, [
      { compression: [{ velocity: 0.08, force: 300 }], rebound: [{ velocity: 0.1, force: 790 }, { velocity: 0, force: 3 }] },
      { compression: [{ velocity: 0.05, force: 160 }], rebound: [] },
    ]);
    expect(c.x).toEqual([-0.1, 0, 0.05, 0.08, 0.1]);
    expect(c.target[3]).toBeUndefined();
    expect(c.measured[0]).toEqual([-790, null, undefined, 300, undefined]);
    expect(c.measured[1]).toEqual([undefined, null, 160, undefined, undefined]);
  });
});
