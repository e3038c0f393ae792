import { describe, expect, it } from 'vitest';
import { frequencyResponse, logGrid } from './frequency-response.ts';
import type { LinearCorner } from './linear-corner.ts';
import { modalAnalysis } from './modal.ts';

const corner: LinearCorner = { sprungMass: 300, unsprungMass: 40, wheelRate: 20000, wheelDamping: 1500, tyreRate: 200000, tyreDamping: 100 };

describe('frequencyResponse', () => {
  it('defaults to 400 log-spaced points from 0.1 to 50 Hz', () => {
    const g = logGrid();
    expect(g.length).toBe(400);
    expect(g[0]).toBeCloseTo(0.1, 12);
    expect(g[399]).toBeCloseTo(50, 9);
    expect(g[200] / g[199]).toBeCloseTo(g[1] / g[0], 12);
  });

  it('at low frequency the whole car follows the road: body accel ≈ ω², travel ≈ 0, tyre load ≈ (ms+mu)ω²', () => {
    const f = 0.02;
    const w2 = (2 * Math.PI * f) ** 2;
    const r = frequencyResponse(corner, new Float64Array([f]));
    expect(r.bodyAccel.gain[0] / w2).toBeCloseTo(1, 3);
    expect(Math.abs(r.bodyAccel.phase[0])).toBeCloseTo(Math.PI, 2);
    expect(r.travel.gain[0]).toBeLessThan(1e-3);
    expect(r.tyreLoad.gain[0] / (340 * w2)).toBeCloseTo(1, 2);
  });

  it('peaks in body acceleration near the body mode and in tyre load near the wheel hop', () => {
    const m = modalAnalysis(corner);
    const r = frequencyResponse(corner, logGrid(0.5, 3, 600));
    const grid = logGrid(0.5, 3, 600);
    const travelPeak = grid[r.travel.gain.indexOf(Math.max(...r.travel.gain))];
    expect(travelPeak / m.body.naturalHz).toBeGreaterThan(0.8);
    expect(travelPeak / m.body.naturalHz).toBeLessThan(1.25);
    const high = logGrid(5, 30, 600);
    const rh = frequencyResponse(corner, high);
    const loadPeak = high[rh.tyreLoad.gain.indexOf(Math.max(...rh.tyreLoad.gain))];
    expect(loadPeak / m.wheel.naturalHz).toBeGreaterThan(0.8);
    expect(loadPeak / m.wheel.naturalHz).toBeLessThan(1.25);
  });

  it('unwraps the phase: no jump above π between neighbouring points', () => {
    const r = frequencyResponse(corner);
    for (const resp of [r.bodyAccel, r.travel, r.tyreLoad]) {
      for (let i = 1; i < resp.phase.length; i++) expect(Math.abs(resp.phase[i] - resp.phase[i - 1])).toBeLessThan(Math.PI);
    }
    // Travel lags by a further π across the two modes: from +π at rest towards −π above the wheel hop.
    expect(r.travel.phase[0] - r.travel.phase[399]).toBeGreaterThan(Math.PI);
  });
});
