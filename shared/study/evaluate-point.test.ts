import { describe, expect, it } from 'vitest';
import type { StudyRunOutcome } from '../schemas/study-result.ts';
import { aggregateFigures } from './aggregate.ts';
import { evaluatePoint } from './evaluate-point.ts';

const run = (roadIndex: number, speed: number, f: Partial<Record<'bodyAccelWkRms' | 'tyreLoadMin' | 'strokeUsed' | 'liftOffFraction', number>> | null, error?: string): StudyRunOutcome => ({
  roadIndex,
  speed,
  figures: f,
  ...(error ? { error } : {}),
});

const def = {
  aggregate: 'mean' as const,
  objectives: [
    { figure: 'bodyAccelWkRms' as const, weight: 1 },
    { figure: 'tyreLoadMin' as const, weight: 1 },
  ],
  constraints: { maxStrokeUsed: 0.9, maxLiftOffFraction: 0.01, minTyreLoad: 300 },
};

describe('aggregating a point over roads and speeds', () => {
  it('mean averages each figure; worst takes the highest, or the lowest for higher-is-better figures', () => {
    const runs = [{ bodyAccelWkRms: 1, tyreLoadMin: 500 }, { bodyAccelWkRms: 2, tyreLoadMin: 200 }];
    expect(aggregateFigures(runs, 'mean')).toEqual({ bodyAccelWkRms: 1.5, tyreLoadMin: 350 });
    expect(aggregateFigures(runs, 'worst')).toEqual({ bodyAccelWkRms: 2, tyreLoadMin: 200 });
  });

  it('keeps a figure only when every run has it', () => {
    expect(aggregateFigures([{ bodyAccelWkRms: 1, strokeUsed: 0.5 }, { bodyAccelWkRms: 3 }], 'mean')).toEqual({ bodyAccelWkRms: 2 });
    expect(aggregateFigures([], 'mean')).toEqual({});
  });
});

describe('evaluatePoint', () => {
  it('a point within every limit on every run is feasible, with objectives in the definition’s order', () => {
    const p = evaluatePoint(def, { index: 4, values: { damperScale: 1.2 } }, [run(0, 20, { bodyAccelWkRms: 1, tyreLoadMin: 500, strokeUsed: 0.5, liftOffFraction: 0 }), run(1, 20, { bodyAccelWkRms: 2, tyreLoadMin: 400, strokeUsed: 0.6, liftOffFraction: 0 })]);
    expect(p).toMatchObject({ index: 4, feasible: true, violations: [], objectives: [1.5, 450] });
  });

  it('judges limits run by run, even when the mean would pass', () => {
    const p = evaluatePoint(def, { index: 0, values: {} }, [run(0, 20, { bodyAccelWkRms: 1, tyreLoadMin: 900, strokeUsed: 0.95, liftOffFraction: 0 }), run(1, 30, { bodyAccelWkRms: 1, tyreLoadMin: 100, strokeUsed: 0.1, liftOffFraction: 0.02 })], {
      roadName: (i) => ['town', 'motorway'][i],
    });
    expect(p.feasible).toBe(false);
    expect(p.violations.map((v) => [v.kind, v.roadIndex, v.speed])).toEqual([
      ['maxStrokeUsed', 0, 20],
      ['maxLiftOffFraction', 1, 30],
      ['minTyreLoad', 1, 30],
    ]);
    expect(p.violations[0].message).toBe('uses 95.0 % of the stroke on town at 20 m/s (limit 90.0 %)');
    expect(p.figures.tyreLoadMin).toBe(500);
  });

  it('a stroke limit without a stroke in the setup fails as not checkable, and a failed run makes the point infeasible', () => {
    const noStroke = evaluatePoint(def, { index: 0, values: {} }, [run(0, 20, { bodyAccelWkRms: 1, tyreLoadMin: 900, liftOffFraction: 0 })]);
    expect(noStroke.violations.map((v) => v.kind)).toEqual(['notCheckable']);
    const failed = evaluatePoint(def, { index: 1, values: {} }, [run(0, 20, { bodyAccelWkRms: 1, tyreLoadMin: 900, strokeUsed: 0.2, liftOffFraction: 0 }), run(1, 20, null, 'the motion diverged')]);
    expect(failed.feasible).toBe(false);
    expect(failed.violations[0]).toMatchObject({ kind: 'runFailed', message: 'the run on road 2 at 20 m/s failed: the motion diverged' });
    // figures come from the runs that worked
    expect(failed.figures.bodyAccelWkRms).toBe(1);
  });

  it('a setup the swept values could not make is infeasible with that reason', () => {
    const p = evaluatePoint(def, { index: 2, values: { gasForce: 9e4 } }, [run(0, 20, null, 'damper.gas: too much')], { setupError: 'damper.gas: too much' });
    expect(p).toMatchObject({ feasible: false, violations: [{ kind: 'setupInvalid', message: 'damper.gas: too much' }], objectives: [null, null] });
  });
});

describe('static sag limits', () => {
  const sagDef = { ...def, constraints: { minStaticSag: 0.15, maxStaticSag: 0.18 } };
  const sagRun = (speed: number, staticSag: number | undefined): StudyRunOutcome => ({ roadIndex: 0, speed, figures: { bodyAccelWkRms: 1, tyreLoadMin: 800, ...(staticSag === undefined ? {} : { staticSag }) } });

  it('rejects a point that sinks past the most sag allowed, naming the limit and the value', () => {
    // A spring softened so far that the body sits 211 mm down against a 180 mm ceiling.
    const p = evaluatePoint(sagDef, { index: 3, values: { springRate: 15000 } }, [sagRun(20, 0.211)]);
    expect(p.feasible).toBe(false);
    expect(p.violations).toEqual([expect.objectContaining({ kind: 'maxStaticSag', limit: 0.18, value: 0.211, message: 'static sag 211 mm (most allowed 180 mm)' })]);
  });

  it('rejects one that rises past the least sag, and keeps one in between', () => {
    expect(evaluatePoint(sagDef, { index: 0, values: {} }, [sagRun(20, 0.12)]).violations.map((v) => v.kind)).toEqual(['minStaticSag']);
    expect(evaluatePoint(sagDef, { index: 1, values: {} }, [sagRun(20, 0.164)]).feasible).toBe(true);
  });

  it('a run without a sag figure cannot pass a sag limit', () => {
    const p = evaluatePoint(sagDef, { index: 2, values: {} }, [sagRun(20, undefined)]);
    expect(p.feasible).toBe(false);
    expect(p.violations.every((v) => v.kind === 'notCheckable')).toBe(true);
  });
});
