import { describe, expect, it } from 'vitest';
import type { Metrics } from '../../schemas/metrics.ts';
import type { TraceColumns } from '../trace.ts';
import { computeMetrics } from './compute-metrics.ts';
import { CREST_FACTOR_LIMIT, rideJudgement } from './rms-method.ts';

const dt = 1 / 500;

/** A trace of `seconds` with the body acceleration given per sample; the other columns quiet. */
function trace(seconds: number, accel: (t: number) => number): TraceColumns {
  const n = Math.round(seconds / dt);
  const col = () => new Float64Array(n);
  const t: TraceColumns = { dt, bodyAccel: col(), travel: col(), tyreLoad: col().fill(3000), damperVelocity: col(), damperForce: col(), bumpStopForce: col(), reboundStopForce: col(), road: col() };
  for (let i = 0; i < n; i++) t.bodyAccel[i] = accel(i * dt);
  return t;
}

const metricsOf = (tr: TraceColumns, eventEnd?: number): Metrics => computeMetrics(tr, { settleTime: 0, staticTyreLoad: 3000, eventEnd });

describe('when the RMS method is enough (ISO 2631-1 crest factor limit 9, from memory)', () => {
  it('a steady 5 Hz sine (crest √2) keeps the RMS verdict on a random road', () => {
    const m = metricsOf(trace(20, (t) => 0.8 * Math.sin(2 * Math.PI * 5 * t)));
    const j = rideJudgement('iso8608', m);
    expect(j.crestAboveLimit).toBe(false);
    expect(j.lead).toBe('rms');
    expect(j.verdict).toEqual(m.comfort);
    expect(j.why).toBeNull();
  });

  it('one short shock in a quiet run has a crest factor above 9: no RMS verdict, and it says why', () => {
    // A 0.2 s, 5 Hz half-burst of 6 m/s² at 3 s in 20 s of faint 5 Hz ripple.
    const m = metricsOf(trace(20, (t) => 0.02 * Math.sin(2 * Math.PI * 5 * t) + (t >= 3 && t < 3.2 ? 6 * Math.sin(2 * Math.PI * 5 * (t - 3)) : 0)));
    expect(m.bodyAccelWkCrest).toBeGreaterThan(CREST_FACTOR_LIMIT);
    const j = rideJudgement('iso8608', m);
    expect(j.crestAboveLimit).toBe(true);
    expect(j.verdict).toBeNull();
    expect(j.why).toMatch(/basic RMS method of ISO 2631-1 is not sufficient/);
  });

  it('event roads lead with the event figures and give no RMS verdict', () => {
    const m = metricsOf(trace(6, (t) => (t >= 1 && t < 1.2 ? 3 * Math.sin(2 * Math.PI * 5 * (t - 1)) : 0)), 1.2);
    for (const kind of ['bump', 'pothole', 'kerb'] as const) {
      const j = rideJudgement(kind, m);
      expect(j.lead).toBe('event');
      expect(j.verdict).toBeNull();
    }
    expect(m.settling?.eventEnd).toBe(1.2);
    expect(m.mtvv).toBeGreaterThan(0);
    expect(m.bodyAccelWkPeak).toBeGreaterThan(0);
  });

  it('runs saved before the weighted crest was kept are judged on the raw crest factor', () => {
    const m = metricsOf(trace(20, (t) => 0.8 * Math.sin(2 * Math.PI * 5 * t)));
    const old: Metrics = { ...m, bodyAccelWkCrest: undefined, bodyAccelCrest: 12.5 };
    expect(rideJudgement('iso8608', old).verdict).toBeNull();
  });
});
