import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { curveForce } from '../sim/damper-force.ts';
import { exampleDamperCurves, exampleGasForce, exampleRecordCsv } from './example-record.ts';
import { fitDamperCurves, suggestFitKnots } from './fit-curve.ts';
import { parseDynoCsv } from './parse-dyno-csv.ts';
import { seriesToPeaks } from './series-to-peaks.ts';

const read = (name: string) => readFileSync(new URL(`../../examples/dyno/${name}`, import.meta.url), 'utf8');

describe('examples/dyno', () => {
  it('the sine record is what the generator makes (regenerate: npx tsx examples/dyno/make-series.ts)', () => {
    expect(read('pipit-front-sine-record.csv')).toBe(exampleRecordCsv());
  });

  it('the sine record, parsed with its gas force, fitted, gives back the curve it was made from within 1 %', () => {
    const parsed = parseDynoCsv(read('pipit-front-sine-record.csv'), { gasForce: exampleGasForce });
    if (!parsed.ok || parsed.kind !== 'series') throw new Error('expected a time series');
    expect(parsed.warnings).toEqual([]);
    expect(parsed.units.displacement).toEqual({ unit: 'mm', source: 'header' });
    const analysis = seriesToPeaks(parsed.data);
    expect(analysis.peaks.compression).toHaveLength(7);
    const knots = [0.05, 0.1, 0.3, 0.8];
    const fit = fitDamperCurves(analysis.peaks, knots);
    for (const dir of ['compression', 'rebound'] as const) {
      const r = fit[dir];
      if (!r.ok) throw new Error(r.message);
      for (const [v, f] of r.table) expect(Math.abs(f / curveForce(exampleDamperCurves[dir], v) - 1)).toBeLessThan(0.01);
    }
  });

  it('the peak file reads as 9 points a direction in SI and fits at the suggested speeds', () => {
    const parsed = parseDynoCsv(read('pipit-front-peaks.csv'));
    if (!parsed.ok || parsed.kind !== 'peaks') throw new Error('expected peak points');
    expect(parsed.layout).toBe('force-per-direction');
    expect(parsed.data.compression).toHaveLength(9);
    expect(parsed.data.rebound[8]).toEqual({ velocity: 1, force: 2985 });
    const knots = suggestFitKnots(parsed.data.compression, [0.025, 0.05, 0.1, 0.2, 0.3, 0.5, 1.0]);
    expect(knots).toEqual([0.025, 0.05, 0.1, 0.2, 0.3, 0.5, 1.0]);
    const fit = fitDamperCurves(parsed.data, knots);
    expect(fit.compression.ok && fit.compression.rmsResidualPct).toBeLessThan(3);
  });
});
