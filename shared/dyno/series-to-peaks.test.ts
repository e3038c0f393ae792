import { describe, expect, it } from 'vitest';
import { DynoSeriesAnalysis, type DynoTimeSeries } from '../schemas/dyno.ts';
import { curveForce, damperForce } from '../sim/damper-force.ts';
import { exampleDamperCurves, exampleProgramme, exampleProgrammeSpeeds } from './example-record.ts';
import { centralDifferenceVelocity, seriesToPeaks } from './series-to-peaks.ts';
import { synthesiseDynoSeries } from './synthetic-series.ts';

const forceAt = (v: number) => damperForce(exampleDamperCurves, v);
const clean = () => synthesiseDynoSeries(forceAt, exampleProgramme, { sampleRate: 1000 });

describe('centralDifferenceVelocity', () => {
  it('is exact on a straight line, ends included', () => {
    const t = Array.from({ length: 50 }, (_, i) => i * 0.01);
    const v = centralDifferenceVelocity(t, t.map((x) => 0.3 * x + 2), 3);
    for (const vi of v) expect(vi).toBeCloseTo(0.3, 12);
  });

  it('reads a sine peak low by the predicted (ωhΔt)²/6', () => {
    const fs = 1000;
    const w = 2 * Math.PI * 5;
    const h = 4;
    const t = Array.from({ length: 2000 }, (_, i) => i / fs);
    const v = centralDifferenceVelocity(t, t.map((x) => Math.sin(w * x)), h);
    const peak = Math.max(...v.slice(10, -10));
    const a = (w * h) / fs;
    expect(peak / w).toBeCloseTo(Math.sin(a) / a, 6);
    expect(1 - peak / w).toBeCloseTo(a * a / 6, 4);
  });
});

describe('seriesToPeaks', () => {
  it('finds one compression and one rebound peak per cycle, on the known curve', () => {
    const r = seriesToPeaks(clean());
    expect(DynoSeriesAnalysis.safeParse(r).success).toBe(true);
    expect(r.velocitySource).toBe('central-difference');
    expect(r.halfCycles).toHaveLength(2 * exampleProgramme.length);
    expect(r.peaks.compression).toHaveLength(exampleProgramme.length);
    // peak speeds read low by the central difference's sin(a)/a, a = ωhΔt (h = 2, Δt = 1 ms)
    const expected = exampleProgramme.map((b, i) => {
      const a = 2 * Math.PI * b.frequency * 2 * 0.001;
      return (exampleProgrammeSpeeds[i] * Math.sin(a)) / a;
    });
    r.peaks.compression.forEach((p, i) => {
      expect(Math.abs(p.velocity / expected[i] - 1)).toBeLessThan(3e-4);
      // force at the measured peak speed, within 0.2 % of the curve there
      expect(p.force / curveForce(exampleDamperCurves.compression, p.velocity)).toBeCloseTo(1, 2);
    });
    r.peaks.rebound.forEach((p, i) => {
      expect(Math.abs(p.velocity / expected[i] - 1)).toBeLessThan(3e-4);
      expect(p.force / curveForce(exampleDamperCurves.rebound, p.velocity)).toBeCloseTo(1, 2);
    });
    expect(r.warnings).toEqual([]);
  });

  it('does not split strokes on force noise and displacement steps', () => {
    const noisy = synthesiseDynoSeries(forceAt, exampleProgramme, { sampleRate: 1000, forceNoise: 5, displacementStep: 1e-6, seed: 'n' });
    const r = seriesToPeaks(noisy);
    expect(r.halfCycles).toHaveLength(2 * exampleProgramme.length);
    r.peaks.rebound.forEach((p) => expect(Math.abs(p.force - curveForce(exampleDamperCurves.rebound, p.velocity))).toBeLessThan(10));
  });

  it('drops a stroke cut by the start of the record', () => {
    const s = clean();
    const from = Math.round(0.3 * 1000); // inside the first compression stroke (period 1.26 s)
    const cut: DynoTimeSeries = { time: s.time.slice(from), displacement: s.displacement.slice(from), force: s.force.slice(from) };
    const r = seriesToPeaks(cut);
    expect(r.halfCycles).toHaveLength(2 * exampleProgramme.length - 1);
    expect(r.halfCycles[0].direction).toBe('rebound');
  });

  it('uses the file velocity when the record has one', () => {
    const s = clean();
    const doubled = { ...s, velocity: centralDifferenceVelocity(s.time, s.displacement).map((v) => 2 * v) };
    const r = seriesToPeaks(doubled);
    expect(r.velocitySource).toBe('file');
    expect(r.peaks.compression[0].velocity / exampleProgrammeSpeeds[0]).toBeCloseTo(2, 2);
  });

  it('with velocity bins, gives mean force per speed band near the curve', () => {
    const r = seriesToPeaks(clean(), { method: 'velocity-bins', bins: 16 });
    expect(r.peaks.compression.length).toBeGreaterThan(8);
    for (const p of r.peaks.compression.filter((q) => q.velocity > 0.1)) {
      expect(Math.abs(p.force / curveForce(exampleDamperCurves.compression, p.velocity) - 1)).toBeLessThan(0.05);
    }
  });

  it('warns when force helps the motion (opposite sign conventions)', () => {
    const s = clean();
    const r = seriesToPeaks({ ...s, force: s.force.map((f) => -f) });
    expect(r.warnings.join(' ')).toMatch(/opposite sign conventions/);
  });

  it('thins the plotted loop to the requested size', () => {
    const r = seriesToPeaks(clean(), { maxLoopPoints: 500 });
    expect(r.loop.velocity.length).toBeLessThanOrEqual(500);
    expect(r.loop.velocity.length).toBe(r.loop.force.length);
    expect(r.loop.velocity.length).toBeGreaterThan(400);
  });
});
