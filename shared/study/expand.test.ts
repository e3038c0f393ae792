import { describe, expect, it } from 'vitest';
import { StudyDefinition, type StudyDefinitionInput } from '../schemas/study.ts';
import { expandStudy, plannedCounts, pointIndexOf, pointValuesAt, studyPlan, sweepValues } from './expand.ts';

const def = (over: Partial<StudyDefinitionInput> = {}) =>
  StudyDefinition.parse({
    name: 'Test',
    base: { setupId: 's', revisionId: 'r' },
    axes: [
      { parameter: 'damperScale', from: 0.5, to: 2, steps: 4 },
      { parameter: 'springRate', from: 20000, to: 40000, steps: 3 },
    ],
    roads: [{ source: 'inline', road: { kind: 'iso8608', class: 'C', seed: 7 } }, { source: 'library', roadId: 'r1', seed: 9 }],
    speeds: [15, 25],
    objectives: [{ figure: 'bodyAccelWkRms', weight: 1 }],
    ...over,
  });

describe('study expansion', () => {
  it('spaces linear and log sweeps with both ends exact', () => {
    expect(sweepValues({ from: 0.5, to: 2, steps: 4, spacing: 'linear' })).toEqual([0.5, 1, 1.5, 2]);
    const log = sweepValues({ from: 1, to: 8, steps: 4, spacing: 'log' });
    expect(log[0]).toBe(1);
    expect(log[3]).toBe(8);
    expect(log[1]).toBeCloseTo(2, 12);
    expect(log[2]).toBeCloseTo(4, 12);
  });

  it('orders points first axis outer, and every point runs every road at every speed with the road’s fixed seed', () => {
    const d = def();
    const e = expandStudy(d);
    expect(e.points).toHaveLength(12);
    expect(e.points[1].values).toEqual({ damperScale: 0.5, springRate: 30000 });
    expect(e.points[3].values).toEqual({ damperScale: 1, springRate: 20000 });
    expect(e.jobs).toHaveLength(12 * 2 * 2);
    expect(e.jobs.filter((j) => j.roadIndex === 1).every((j) => j.seed === 9)).toBe(true);
    expect(e.jobs.filter((j) => j.roadIndex === 0).every((j) => j.seed === undefined)).toBe(true);
    expect(e.baseJobs.map((j) => [j.pointIndex, j.roadIndex, j.speed])).toEqual([[-1, 0, 15], [-1, 0, 25], [-1, 1, 15], [-1, 1, 25]]);
    expect(plannedCounts(d)).toEqual({ points: 12, runs: 48 + 4 });
  });

  it('pointValuesAt agrees with the expansion at every index, and refuses indices outside it', () => {
    const d = def();
    const e = expandStudy(d);
    e.points.forEach((p) => expect(pointValuesAt(d.axes, p.index)).toEqual(p.values));
    expect(pointValuesAt(d.axes, 12)).toBeUndefined();
    expect(pointValuesAt(d.axes, -1)).toBeUndefined();
  });

  it('a swept speed replaces the speed list and leaves no base runs', () => {
    const d = def({ axes: [{ parameter: 'speed', from: 10, to: 30, steps: 3 }], speeds: [] });
    const e = expandStudy(d);
    expect(e.jobs.map((j) => j.speed)).toEqual([10, 10, 20, 20, 30, 30]);
    expect(e.baseJobs).toEqual([]);
    expect(plannedCounts(d)).toEqual({ points: 3, runs: 6 });
  });

  it('the same definition expands to the same jobs every time', () => {
    expect(expandStudy(def())).toEqual(expandStudy(def()));
  });

  it('four axes nest first outermost; lookups by index and by position agree with the expansion; seeds run innermost', () => {
    const d = def({
      axes: [
        { parameter: 'damperScale', from: 0.5, to: 1, steps: 2 },
        { parameter: 'springRate', from: 20000, to: 40000, steps: 3 },
        { parameter: 'tyreRate', from: 2e5, to: 3e5, steps: 2 },
        { parameter: 'unsprungMass', from: 30, to: 50, steps: 3 },
      ],
      seeds: 3,
    });
    const e = expandStudy(d);
    expect(e.points).toHaveLength(36);
    expect(e.points[1].values).toEqual({ damperScale: 0.5, springRate: 20000, tyreRate: 2e5, unsprungMass: 40 });
    expect(e.points[3].values).toEqual({ damperScale: 0.5, springRate: 20000, tyreRate: 3e5, unsprungMass: 30 });
    expect(e.points[18].values).toEqual({ damperScale: 1, springRate: 20000, tyreRate: 2e5, unsprungMass: 30 });
    expect(pointIndexOf(d.axes, [1, 2, 1, 2])).toBe(35);
    const plan = studyPlan(d);
    e.points.forEach((p) => {
      expect(pointValuesAt(d.axes, p.index)).toEqual(p.values);
      expect(plan.jobsOf(p.index)!.map(({ id: _, ...j }) => j)).toEqual(e.jobs.filter((j) => j.pointIndex === p.index).map(({ id: _, ...j }) => j));
    });
    expect(e.jobs.slice(0, 3).map((j) => [j.roadIndex, j.speed, j.seedIndex])).toEqual([[0, 15, 0], [0, 15, 1], [0, 15, 2]]);
    expect(plannedCounts(d)).toEqual({ points: 36, runs: 36 * 12 + 12 });
    expect(e.jobs.length + e.baseJobs.length).toBe(plannedCounts(d).runs);
  });

  it('a study over the run cap says how many runs it would need and how they multiply', () => {
    const r = StudyDefinition.safeParse({
      ...def(),
      axes: [
        { parameter: 'damperScale', from: 0.5, to: 2, steps: 100 },
        { parameter: 'springRate', from: 20000, to: 40000, steps: 100 },
      ],
      seeds: 50,
    });
    expect(r.success).toBe(false);
    // 10 000 points × 2 roads × 2 speeds × 50 seeds, and the base setup's 200.
    expect(r.error?.issues[0].message).toContain('2 000 200 runs (10 000 points × 2 roads × 2 speeds × 50 seeds');
    expect(r.error?.issues[0].message).toContain('at most 1 000 000');
    const five = StudyDefinition.safeParse({ ...def(), axes: [...def().axes, ...def().axes, def().axes[0]] });
    expect(five.success).toBe(false);
  });
});
