import { describe, expect, it } from 'vitest';
import type { StudyCompromise, StudyPointResult } from '../schemas/study-result.ts';
import { baseVerdict } from './base-verdict.ts';
import { studyBestCompromise, studyTradeOff } from './study-compromise.ts';

const def = {
  axes: [{ parameter: 'reboundScale' as const }],
  objectives: [
    { figure: 'bodyAccelWkRms' as const, weight: 1 },
    { figure: 'tyreLoadRatio' as const, weight: 1 },
  ],
  comfortFigure: 'bodyAccelWkRms' as const,
  gripFigure: 'tyreLoadRatio' as const,
};

const point = (index: number, aw: number, load: number, feasible = true): StudyPointResult => ({
  index,
  values: index < 0 ? {} : { reboundScale: 0.7 + 0.3 * index },
  runs: [],
  figures: { bodyAccelWkRms: aw, tyreLoadRatio: load },
  objectives: [aw, load],
  feasible,
  violations: feasible ? [] : [{ kind: 'maxStrokeUsed', limit: 0.9, value: 0.95, roadIndex: 0, speed: 20, message: 'uses 95.0 % of the stroke on road 1 at 20 m/s (limit 90.0 %)' }],
});

// The case of the demo study: the base (0.925 m/s², 18.5 %) against swept points all worse on both.
const points = [point(0, 0.95, 0.19), point(1, 1.0, 0.187), point(2, 1.1, 0.186), point(3, 1.2, 0.2)];

describe('the base setup against the best compromise', () => {
  it('says plainly when the base beats the chosen point on both axes', () => {
    const base = point(-1, 0.925, 0.185);
    const compromise = studyBestCompromise(def, points);
    const v = baseVerdict(def, points, base, compromise)!;
    expect(v.beatsBestOnBoth).toBe(true);
    expect(v.sentences[0]).toMatch(/^The base setup beats the best compromise on both axes \(Wk-weighted body acceleration 0\.925 m\/s² against /);
    expect(v.sentences[0]).toMatch(/keep the base/);
  });

  it('takes the base onto the front, and the points it beats off it', () => {
    const base = point(-1, 0.925, 0.185);
    const withBase = studyTradeOff(def, points, base);
    expect(withBase.baseOnFront).toBe(true);
    expect(withBase.front).toEqual([]);
    expect(studyTradeOff(def, points).front.length).toBeGreaterThan(0);
  });

  it('says nothing of the kind when the base is worse on one axis', () => {
    const base = point(-1, 0.9, 0.195);
    const compromise = studyBestCompromise(def, points);
    const v = baseVerdict(def, points, base, compromise)!;
    expect(v.beatsBestOnBoth).toBe(false);
    expect(v.sentences).toEqual([]);
    expect(studyTradeOff(def, points, base).baseOnFront).toBe(true);
  });

  it('reads each figure by its sense: a higher minimum tyre load is better', () => {
    const d = { ...def, gripFigure: 'tyreLoadMin' as const };
    const pts = [{ ...point(0, 1, 0), figures: { bodyAccelWkRms: 1, tyreLoadMin: 900 } }];
    const winner: StudyCompromise = { ok: true, winner: 0, score: 0, scores: [0], ranges: [], tiedWith: [], front: [0], neighbours: [], explanation: [] };
    const higherLoad = { ...point(-1, 0.9, 0), figures: { bodyAccelWkRms: 0.9, tyreLoadMin: 1000 } };
    const lowerLoad = { ...point(-1, 0.9, 0), figures: { bodyAccelWkRms: 0.9, tyreLoadMin: 800 } };
    expect(baseVerdict(d, pts, higherLoad, winner)!.beatsBestOnBoth).toBe(true);
    expect(baseVerdict(d, pts, lowerLoad, winner)!.beatsBestOnBoth).toBe(false);
  });

  it('a base breaking a limit is not put on the front, and the verdict names the limit', () => {
    const base = point(-1, 0.925, 0.185, false);
    expect(studyTradeOff(def, points, base).baseOnFront).toBe(false);
    const v = baseVerdict(def, points, base, studyBestCompromise(def, points))!;
    expect(v.sentences[0]).toMatch(/but it breaks a limit: uses 95\.0 % of the stroke/);
  });
});
