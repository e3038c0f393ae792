import { describe, expect, it } from 'vitest';
import { StudyPointResult } from '../schemas/study-result.ts';
import { evaluatePoint } from './evaluate-point.ts';

const def = {
  aggregate: 'mean' as const,
  objectives: [{ figure: 'bodyAccelWkRms' as const, weight: 1 }, { figure: 'strokeUsed' as const, weight: 0 }],
  constraints: { maxStrokeUsed: 0.9, maxLiftOffFraction: 0.01, minTyreLoad: 500 },
};
const good = { bodyAccelWkRms: 0.5, strokeUsed: 0.6, liftOffFraction: 0, tyreLoadMin: 1800 };

describe('evaluatePoint', () => {
  it('aggregates figures, lists objectives in order, and is feasible when every run meets every limit', () => {
    const r = evaluatePoint(def, { index: 3, values: { damperScale: 1.1 } }, [
      { roadIndex: 0, speed: 20, figures: good },
      { roadIndex: 1, speed: 20, figures: { ...good, bodyAccelWkRms: 0.7, strokeUsed: 0.8 } },
    ]);
    expect(StudyPointResult.safeParse(r).success).toBe(true);
    expect(r.objectives[0]).toBeCloseTo(0.6, 12);
    expect(r.objectives[1]).toBeCloseTo(0.7, 12);
    expect(r).toMatchObject({ index: 3, feasible: true, violations: [] });
  });

  it('fails a point on any one run breaking a limit, even when the mean would pass', () => {
    const r = evaluatePoint(def, { index: 0, values: {} }, [
      { roadIndex: 0, speed: 20, figures: good },
      { roadIndex: 1, speed: 30, figures: { ...good, strokeUsed: 0.95, liftOffFraction: 0.02, tyreLoadMin: 0 } },
    ]);
    expect(r.figures.strokeUsed).toBeCloseTo(0.775, 12);
    expect(r.feasible).toBe(false);
    expect(r.violations.map((v) => v.kind)).toEqual(['maxStrokeUsed', 'maxLiftOffFraction', 'minTyreLoad']);
    expect(r.violations[0]).toMatchObject({ limit: 0.9, value: 0.95, roadIndex: 1, speed: 30, message: 'uses 95.0 % of the stroke on road 2 at 30 m/s (limit 90.0 %)' });
  });

  it('fails a limit it cannot check, a failed run and an invalid setup, with reasons', () => {
    const noStroke = evaluatePoint(def, { index: 0, values: {} }, [{ roadIndex: 0, speed: 20, figures: { bodyAccelWkRms: 0.5 } }]);
    expect(noStroke.violations[0].kind).toBe('notCheckable');
    const failed = evaluatePoint(def, { index: 0, values: {} }, [{ roadIndex: 0, speed: 20, figures: null, error: 'integration gave up' }], { roadName: () => 'ISO C' });
    expect(failed.violations[0].message).toBe('the run on ISO C at 20 m/s failed: integration gave up');
    expect(failed.objectives).toEqual([null, null]);
    const invalid = evaluatePoint(def, { index: 0, values: {} }, [], { setupError: 'springRate: too big' });
    expect(invalid).toMatchObject({ feasible: false, violations: [{ kind: 'setupInvalid', message: 'springRate: too big' }] });
  });
});
