import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { StudyDefinition } from '../schemas/study.ts';
import type { StudyPointResult } from '../schemas/study-result.ts';
import { studyBestCompromise, studyTradeOff } from './study-compromise.ts';

const def = (gripFigure: 'tyreLoadRatio' | 'tyreLoadMin') =>
  StudyDefinition.parse({
    name: 'Study',
    base: { setupId: 's', revisionId: 'r' },
    axes: [{ parameter: 'damperScale', from: 0.5, to: 2, steps: 40 }],
    roads: [{ source: 'inline', road: { kind: 'iso8608', class: 'C', seed: 7 } }],
    speeds: [20],
    objectives: [
      { figure: 'bodyAccelWkRms', weight: 2 },
      { figure: gripFigure, weight: 1 },
    ],
    gripFigure,
  });

const point = (index: number, comfort: number, grip: number, feasible: boolean, gripKey: string): StudyPointResult => ({
  index,
  values: { damperScale: 0.5 + index / 26 },
  runs: [],
  figures: { bodyAccelWkRms: comfort, [gripKey]: grip },
  objectives: [comfort, grip],
  feasible,
  violations: [],
});

describe('study trade-off front and best compromise', () => {
  it('the front is exactly the feasible points no other feasible point beats in both figures (brute force), lower-is-better grip', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.integer({ min: 0, max: 8 }), fc.integer({ min: 0, max: 8 }), fc.boolean()), { maxLength: 40 }), (raw) => {
        const points = raw.map(([c, g, f], i) => point(i, c, g, f, 'tyreLoadRatio'));
        const front = studyTradeOff(def('tyreLoadRatio'), points).front;
        const beats = (a: StudyPointResult, b: StudyPointResult) =>
          a.objectives[0]! <= b.objectives[0]! && a.objectives[1]! <= b.objectives[1]! && (a.objectives[0]! < b.objectives[0]! || a.objectives[1]! < b.objectives[1]!);
        const brute = points.flatMap((p, i) => (p.feasible && !points.some((q) => q.feasible && beats(q, p)) ? [i] : []));
        expect([...front].sort((a, b) => a - b)).toEqual(brute);
        // drawn along the comfort axis
        const xs = front.map((i) => points[i].objectives[0]!);
        expect(xs).toEqual([...xs].sort((a, b) => a - b));
      }),
      { numRuns: 300, seed: 11 },
    );
  });

  it('a higher-is-better grip figure (minimum tyre load) is read by its sense', () => {
    const points = [point(0, 1, 500, true, 'tyreLoadMin'), point(1, 2, 900, true, 'tyreLoadMin'), point(2, 2, 400, true, 'tyreLoadMin')];
    expect(studyTradeOff(def('tyreLoadMin'), points).front).toEqual([0, 1]);
  });

  it('the best compromise is the exhaustive minimum of the weighted scaled figures over the feasible points', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.double({ min: 0.2, max: 3, noNaN: true }), fc.double({ min: 0.05, max: 0.6, noNaN: true }), fc.boolean()), { minLength: 1, maxLength: 40 }), (raw) => {
        const points = raw.map(([c, g, f], i) => point(i, c, g, f, 'tyreLoadRatio'));
        const r = studyBestCompromise(def('tyreLoadRatio'), points);
        const feasible = points.filter((p) => p.feasible);
        if (feasible.length === 0) {
          expect(r).toMatchObject({ ok: false, reason: 'no-feasible-point' });
          return;
        }
        if (!r.ok) throw new Error('expected a winner');
        const span = (k: 0 | 1) => {
          const xs = feasible.map((p) => p.objectives[k]!);
          return [Math.min(...xs), Math.max(...xs)] as const;
        };
        const [c0, c1] = span(0);
        const [g0, g1] = span(1);
        const score = (p: StudyPointResult) => (2 * (c1 > c0 ? (p.objectives[0]! - c0) / (c1 - c0) : 0) + (g1 > g0 ? (p.objectives[1]! - g0) / (g1 - g0) : 0)) / 3;
        const best = Math.min(...feasible.map(score));
        expect(points[r.winner].feasible).toBe(true);
        expect(score(points[r.winner])).toBeCloseTo(best, 9);
      }),
      { numRuns: 300, seed: 5 },
    );
  });

  it('when nothing meets the limits, says how many points break which limit', () => {
    const p = { ...point(0, 1, 0.2, false, 'tyreLoadRatio'), violations: [{ kind: 'minTyreLoad' as const, limit: 300, value: 100, roadIndex: 0, speed: 20, message: 'x' }] };
    const r = studyBestCompromise(def('tyreLoadRatio'), [p, { ...p, index: 1 }]);
    expect(r.ok).toBe(false);
    expect(r.explanation).toContain('Of them: 2 let the tyre load fall too low.');
  });
});
