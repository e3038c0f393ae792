import { describe, expect, it } from 'vitest';
import { Metrics } from '../../schemas/metrics.ts';
import type { TraceColumns } from '../trace.ts';
import { computeMetrics, computeSpectra } from './compute-metrics.ts';
import { wkResponse } from './iso2631.ts';

const dt = 1 / 400;
const fz0 = 3335.4;

/** 20 s synthetic trace: 4 Hz body sine, travel sine, linear damper, a lift-off and stop contacts. */
function syntheticTrace(): TraceColumns {
  const n = 8000;
  const col = () => new Float64Array(n);
  const t: TraceColumns = {
    dt,
    bodyAccel: col(),
    travel: col(),
    tyreLoad: col(),
    damperVelocity: col(),
    damperForce: col(),
    bumpStopForce: col(),
    reboundStopForce: col(),
    road: col(),
  };
  for (let i = 0; i < n; i++) {
    const s = i * dt;
    t.bodyAccel[i] = 2 * Math.sin(2 * Math.PI * 4 * s);
    t.travel[i] = 0.03 * Math.sin(2 * Math.PI * 1 * s) + 0.01;
    t.damperVelocity[i] = 0.4 * Math.cos(2 * Math.PI * 2 * s);
    t.damperForce[i] = 1500 * t.damperVelocity[i];
    t.tyreLoad[i] = fz0 + 1000 * Math.sin(2 * Math.PI * 3 * s);
  }
  // 0.5 s off the road between 10 and 10.5 s; 0.25 s on each stop.
  t.tyreLoad.fill(0, 4000, 4200);
  t.bumpStopForce.fill(800, 5000, 5100);
  t.reboundStopForce.fill(300, 6000, 6100);
  // Garbage during the settling time must not reach any figure.
  t.bodyAccel.fill(3, 0, 10);
  t.travel.fill(-1, 0, 100);
  t.tyreLoad.fill(-5, 0, 100);
  return t;
}

describe('computeMetrics on a synthetic trace', () => {
  const trace = syntheticTrace();
  const m = computeMetrics(trace, { settleTime: 2, staticTyreLoad: fz0, stroke: { compression: 0.08, extension: 0.1 } });

  it('produces a value the Metrics schema accepts', () => {
    expect(Metrics.safeParse(m).success).toBe(true);
    expect(m.analysedTime).toBeCloseTo(18, 9);
  });

  it('body acceleration: RMS A/√2, peak A, crest √2, Wk RMS |Wk(4 Hz)|·A/√2', () => {
    expect(m.bodyAccelRms).toBeCloseTo(2 / Math.SQRT2, 6);
    expect(m.bodyAccelPeak).toBeCloseTo(2, 3);
    expect(m.bodyAccelCrest).toBeCloseTo(Math.SQRT2, 3);
    // The Wk filter warms up on the 2 s settling time.
    expect(m.bodyAccelWkRms / ((wkResponse(4) * 2) / Math.SQRT2)).toBeCloseTo(1, 2);
    expect(m.vdv).toBeGreaterThan(0);
    expect(m.comfort.bands).toContain(m.comfort.primary);
  });

  it('tyre load: RMS about the static load, ratio, minimum and lift-off share', () => {
    // 17.5 s of a 1000 N sine (mean square 5e5) and 0.5 s at −Fz0.
    const expected = Math.sqrt((17.5 * 5e5 + 0.5 * fz0 * fz0) / 18);
    expect(m.tyreLoadRms / expected).toBeCloseTo(1, 2);
    expect(m.tyreLoadRatio).toBeCloseTo(m.tyreLoadRms / fz0, 12);
    expect(m.tyreLoadMin).toBe(0);
    expect(m.liftOffFraction).toBeCloseTo(0.5 / 18, 9);
    expect(m.tyreLoadStatic).toBe(fz0);
  });

  it('travel about static: RMS, extremes, stroke used and stop times', () => {
    expect(m.travelRms).toBeCloseTo(Math.sqrt(0.03 ** 2 / 2 + 0.01 ** 2), 5);
    expect(m.travelMaxCompression).toBeCloseTo(0.04, 5);
    expect(m.travelMaxExtension).toBeCloseTo(0.02, 5);
    expect(m.strokeUsedCompression).toBeCloseTo(0.5, 4);
    expect(m.strokeUsedExtension).toBeCloseTo(0.2, 4);
    expect(m.bumpStopTime).toBeCloseTo(0.25, 9);
    expect(m.reboundStopTime).toBeCloseTo(0.25, 9);
  });

  it('damper: RMS, mean power c·v_rms², energy = power × time, histogram over all samples', () => {
    const vrms = 0.4 / Math.SQRT2;
    expect(m.damperVelocityRms).toBeCloseTo(vrms, 6);
    expect(m.damperPowerMean).toBeCloseTo(1500 * vrms * vrms, 3);
    expect(m.damperEnergy).toBeCloseTo(m.damperPowerMean * 18, 6);
    const h = m.damperVelocityHistogram;
    expect(h.counts.length).toBe(40);
    expect(h.counts.reduce((a, b) => a + b, 0)).toBe(7200);
    expect(h.edges[h.edges.length - 1]).toBe(0.5);
    const b = m.damperVelocityBands;
    expect(b.low + b.mid + b.high).toBeCloseTo(1, 12);
    // |0.4 cos θ| < 0.05 for a share (2/π)·asin(0.125) of the time, ± one sample per crossing.
    expect(Math.abs(b.low - (2 / Math.PI) * Math.asin(0.125))).toBeLessThan(0.02);
    expect(b.compression).toBeCloseTo(0.5, 2);
  });

  it('leaves out stroke use when no stroke is given and honours band edges', () => {
    const m2 = computeMetrics(trace, { settleTime: 2, staticTyreLoad: fz0, velocityBands: { low: 0.1, high: 0.3 }, histogramBins: 10 });
    expect(m2.strokeUsedCompression).toBeUndefined();
    expect(m2.damperVelocityBands.lowEdge).toBe(0.1);
    expect(m2.damperVelocityHistogram.counts.length).toBe(10);
  });

  it('throws when the settling time leaves nothing to analyse', () => {
    expect(() => computeMetrics(trace, { settleTime: 30, staticTyreLoad: fz0 })).toThrow(/settleTime/);
  });
});

describe('computeSpectra', () => {
  it('returns three PSDs on one frequency grid with the body peak at 4 Hz', () => {
    const s = computeSpectra(syntheticTrace(), { settleTime: 2, segmentLength: 1024 });
    expect(s.freq.length).toBe(513);
    expect(s.bodyAccel.length).toBe(513);
    expect(s.travel.length).toBe(513);
    expect(s.tyreLoad.length).toBe(513);
    const peak = s.bodyAccel.indexOf(Math.max(...s.bodyAccel));
    expect(Math.abs(s.freq[peak] - 4)).toBeLessThanOrEqual(s.freq[1]);
  });
});
