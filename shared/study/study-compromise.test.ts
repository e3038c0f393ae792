import { describe, expect, it } from 'vitest';
import { StudyCompromise, type StudyPointResult } from '../schemas/study-result.ts';
import { describePoint, group } from './describe-point.ts';
import { studyBestCompromise, studyTradeOff } from './study-compromise.ts';

const axes = [{ parameter: 'reboundScale' as const }, { parameter: 'springRate' as const }];
const def = {
  axes,
  objectives: [{ figure: 'bodyAccelWkRms' as const, weight: 1 }, { figure: 'tyreLoadRatio' as const, weight: 1 }],
  comfortFigure: 'bodyAccelWkRms' as const,
  gripFigure: 'tyreLoadRatio' as const,
};
const point = (index: number, r: number, wk: number, grip: number, feasible = true): StudyPointResult => ({
  index,
  values: { reboundScale: r, springRate: 30000 },
  runs: [],
  figures: { bodyAccelWkRms: wk, tyreLoadRatio: grip },
  objectives: [wk, grip],
  feasible,
  violations: feasible ? [] : [{ kind: 'maxStrokeUsed', limit: 0.9, value: 0.95, roadIndex: 0, speed: 20, message: '' }],
});

describe('describePoint', () => {
  it('names a point by its swept values, in axis order', () => {
    expect(describePoint(axes, { reboundScale: 1.2, springRate: 28460 })).toBe('rebound ×1.20, spring rate 28 500 N/m');
    expect(describePoint(axes, {})).toBe('the base setup');
    expect(describePoint(axes, { springRate: 28000 }, { springRate: (x) => `${x / 1000} N/mm` })).toBe('28 N/mm');
    expect(group(0.3456)).toBe('0.346');
  });
});

describe('studyBestCompromise', () => {
  it('explains the winner in the study’s own words', () => {
    const pts = [point(0, 0.8, 0.5, 0.2), point(1, 1.0, 0.515, 0.0736), point(2, 1.2, 0.6, 0.07)];
    const r = studyBestCompromise(def, pts);
    expect(StudyCompromise.safeParse(r).success).toBe(true);
    if (!r.ok) throw new Error('expected a winner');
    expect(r.winner).toBe(1);
    expect(r.explanation[0]).toMatch(/^rebound ×1.00, spring rate 30 000 N\/m has the lowest weighted score/);
    expect(r.neighbours[0].sentence).toBe('Compared with rebound ×0.80, spring rate 30 000 N/m: 3.0 % more Wk-weighted body acceleration for 63.2 % less tyre load variation.');
  });

  it('counts the broken limits when no point is feasible', () => {
    const r = studyBestCompromise(def, [point(0, 0.8, 0.5, 0.2, false), point(1, 1, 0.5, 0.2, false)]);
    expect(r).toMatchObject({ ok: false, reason: 'no-feasible-point' });
    expect(r.explanation).toEqual(['None of the 2 points meets the limits.', 'Of them: 2 use too much stroke.', 'Relax a limit or widen the sweep.']);
  });
});

describe('studyTradeOff', () => {
  it('draws the front through feasible points only, along the comfort axis', () => {
    const pts = [point(0, 0.8, 0.6, 0.07), point(1, 1.0, 0.5, 0.2), point(2, 1.2, 0.4, 0.05, false), point(3, 1.4, 0.7, 0.08)];
    expect(studyTradeOff(def, pts)).toEqual({ comfortFigure: 'bodyAccelWkRms', gripFigure: 'tyreLoadRatio', front: [1, 0] });
  });
});
