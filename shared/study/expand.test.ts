import { describe, expect, it } from 'vitest';
import { StudyDefinition, type StudyDefinitionInput } from '../schemas/study.ts';
import { expandStudy, sweepValues } from './expand.ts';

const iso = { kind: 'iso8608', class: 'C', seed: 11 } as const;
const base: StudyDefinitionInput = {
  name: 'rebound against spring',
  base: { setupId: 's1', revisionId: 'r3' },
  axes: [
    { parameter: 'reboundScale', from: 0.8, to: 1.2, steps: 3 },
    { parameter: 'springRate', from: 20000, to: 40000, steps: 2 },
  ],
  roads: [{ source: 'inline', road: iso }, { source: 'library', roadId: 'bump-1', seed: 99 }],
  speeds: [15, 25],
  objectives: [{ figure: 'bodyAccelWkRms', weight: 1 }, { figure: 'tyreLoadRatio', weight: 1 }],
};

describe('sweepValues', () => {
  it('spaces linearly with exact ends, falling sweeps included', () => {
    expect(sweepValues({ from: 0.5, to: 1.5, steps: 5, spacing: 'linear' })).toEqual([0.5, 0.75, 1, 1.25, 1.5]);
    expect(sweepValues({ from: 3, to: 1, steps: 3, spacing: 'linear' })).toEqual([3, 2, 1]);
    expect(sweepValues({ from: 0.7, to: 0.9, steps: 1, spacing: 'linear' })).toEqual([0.7]);
  });

  it('spaces logarithmically with a constant ratio', () => {
    const v = sweepValues({ from: 10000, to: 80000, steps: 4, spacing: 'log' });
    expect(v[0]).toBe(10000);
    expect(v[3]).toBe(80000);
    expect(v[1]).toBeCloseTo(20000, 8);
    expect(v[2] / v[1]).toBeCloseTo(2, 12);
  });
});

describe('expandStudy', () => {
  it('orders points first axis outer, second inner, and runs by point, road, speed', () => {
    const def = StudyDefinition.parse(base);
    const { points, jobs, baseJobs } = expandStudy(def);
    expect(points.map((p) => p.values)).toEqual([
      { reboundScale: 0.8, springRate: 20000 },
      { reboundScale: 0.8, springRate: 40000 },
      { reboundScale: 1, springRate: 20000 },
      { reboundScale: 1, springRate: 40000 },
      { reboundScale: 1.2, springRate: 20000 },
      { reboundScale: 1.2, springRate: 40000 },
    ]);
    expect(jobs).toHaveLength(6 * 2 * 2);
    expect(jobs.slice(0, 4)).toEqual([
      { id: 0, pointIndex: 0, roadIndex: 0, speed: 15 },
      { id: 1, pointIndex: 0, roadIndex: 0, speed: 25 },
      { id: 2, pointIndex: 0, roadIndex: 1, speed: 15, seed: 99 },
      { id: 3, pointIndex: 0, roadIndex: 1, speed: 25, seed: 99 },
    ]);
    expect(baseJobs.map((j) => [j.id, j.pointIndex])).toEqual([[24, -1], [25, -1], [26, -1], [27, -1]]);
    expect(expandStudy(def)).toEqual({ points, jobs, baseJobs });
  });

  it('keeps one seed per road across every point', () => {
    const { jobs } = expandStudy(StudyDefinition.parse(base));
    const seeds = new Set(jobs.filter((j) => j.roadIndex === 1).map((j) => j.seed));
    expect([...seeds]).toEqual([99]);
  });

  it('runs each point at its own speed when speed is swept, with no base runs', () => {
    const def = StudyDefinition.parse({ ...base, axes: [{ parameter: 'speed', from: 10, to: 30, steps: 3 }], speeds: [] });
    const { jobs, baseJobs } = expandStudy(def);
    expect(jobs.map((j) => j.speed)).toEqual([10, 10, 20, 20, 30, 30]);
    expect(baseJobs).toEqual([]);
  });
});

describe('StudyDefinition', () => {
  it.each([
    ['a swept speed with a speed list', { axes: [{ parameter: 'speed', from: 10, to: 30, steps: 3 }] }, 'speeds', /leave the speed list empty/],
    ['no speed at all', { speeds: [] }, 'speeds', /at least one speed/],
    ['two axes on one parameter', { axes: [{ parameter: 'springRate', from: 2e4, to: 3e4, steps: 2 }, { parameter: 'springRate', from: 2e4, to: 3e4, steps: 2 }] }, 'axes.1.parameter', /different parameters/],
    ['scale and damping ratio together', { axes: [{ parameter: 'damperScale', from: 0.5, to: 2, steps: 2 }, { parameter: 'targetBodyDampingRatio', from: 0.2, to: 0.4, steps: 2 }] }, 'axes', /sweep one of them/],
    ['a value out of range', { axes: [{ parameter: 'reboundScale', from: 0, to: 2, steps: 3 }] }, 'axes.0.from', /between 0.05 and 10/],
    ['log spacing through zero', { axes: [{ parameter: 'gasForce', from: 0, to: 300, steps: 3, spacing: 'log' }] }, 'axes.0.spacing', /above 0/],
    ['too many runs', { axes: [{ parameter: 'reboundScale', from: 0.5, to: 2, steps: 100 }, { parameter: 'springRate', from: 2e4, to: 4e4, steps: 100 }] }, 'axes', /40000 runs asked for; at most 20000/],
    ['all weights zero', { objectives: [{ figure: 'vdv', weight: 0 }] }, 'objectives', /weight above 0/],
  ])('refuses %s', (_name, patch, path, message) => {
    const r = StudyDefinition.safeParse({ ...base, ...patch });
    expect(r.success).toBe(false);
    if (!r.success) {
      const issue = r.error.issues.find((i) => i.path.join('.') === path);
      expect(issue?.message).toMatch(message);
    }
  });

  it('fills defaults: 60 s runs, mean aggregation, Wk RMS against tyre load variation', () => {
    const d = StudyDefinition.parse(base);
    expect(d).toMatchObject({ duration: 60, aggregate: 'mean', comfortFigure: 'bodyAccelWkRms', gripFigure: 'tyreLoadRatio', constraints: {} });
    expect(d.axes[0].spacing).toBe('linear');
  });
});
