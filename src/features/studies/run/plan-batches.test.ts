import { describe, expect, it } from 'vitest';
import { StudyDefinition } from '../../../../shared/schemas/study.ts';
import { batchSize, planBatches, studyWorkerCount } from './plan-batches.ts';

const def = StudyDefinition.parse({
  name: 'Grid',
  base: { setupId: 's', revisionId: 'r' },
  axes: [
    { parameter: 'damperScale', from: 0.5, to: 2, steps: 20 },
    { parameter: 'springRate', from: 20000, to: 40000, steps: 20 },
  ],
  roads: [{ source: 'inline', road: { kind: 'iso8608', class: 'C', seed: 7 }, seed: 11 }],
  speeds: [20],
  objectives: [{ figure: 'bodyAccelWkRms', weight: 1 }],
});

describe('planBatches', () => {
  it('runs every job exactly once, the base setup first, then the points in sweep order', () => {
    const plan = planBatches(def, 2);
    const jobs = plan.batches.flat();
    expect(plan.totalRuns).toBe(401);
    expect(jobs).toHaveLength(401);
    expect(jobs[0]).toEqual({ pointIndex: -1, values: {}, roadIndex: 0, speed: 20, seed: 11 });
    expect(jobs.slice(1).map((j) => j.pointIndex)).toEqual(Array.from({ length: 400 }, (_, i) => i));
    expect(jobs[21].values.springRate).toBe(20000);
    expect(jobs[21].values.damperScale).toBeCloseTo(0.5 + 1.5 / 19, 12);
  });

  it('gives every worker several batches of at most 12 runs', () => {
    expect(batchSize(401, 2)).toBe(12);
    expect(batchSize(17, 2)).toBe(2);
    expect(batchSize(1, 8)).toBe(1);
    const plan = planBatches(def, 2);
    expect(Math.max(...plan.batches.map((b) => b.length))).toBeLessThanOrEqual(12);
    expect(plan.batches.length).toBeGreaterThanOrEqual(12);
  });

  it('sizes the pool from the hardware, 2 to 8 workers', () => {
    expect(studyWorkerCount(undefined)).toBe(2);
    expect(studyWorkerCount(1)).toBe(2);
    expect(studyWorkerCount(6)).toBe(6);
    expect(studyWorkerCount(32)).toBe(8);
  });
});
