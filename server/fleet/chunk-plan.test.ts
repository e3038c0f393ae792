import { describe, expect, it } from 'vitest';
import { StudyDefinition } from '../../shared/schemas/study.ts';
import { plannedCounts } from '../../shared/study/expand.ts';
import { chunkUnitsOf, fleetPlan, missingChunks, MS_PER_SIMULATED_SECOND, storedRuns } from './chunk-plan.ts';

const def = (duration: number, speeds = [20]) =>
  StudyDefinition.parse({
    name: 'Plan',
    base: { setupId: 's', revisionId: 'r' },
    axes: [
      { parameter: 'reboundScale', from: 0.8, to: 1.2, steps: 7 },
      { parameter: 'springRate', from: 26000, to: 38000, steps: 5 },
    ],
    roads: [{ source: 'inline', road: { kind: 'iso8608', class: 'C', seed: 1 } }],
    speeds,
    duration,
    objectives: [{ figure: 'bodyAccelWkRms', weight: 1 }],
    constraints: {},
  });

describe('fleet chunk plan', () => {
  it('covers the base and every point exactly once, the base first', () => {
    const plan = fleetPlan(def(60, [15, 25]), 100);
    const all = Array.from({ length: plan.chunks }, (_, k) => chunkUnitsOf(plan, k)).flat();
    expect(all).toEqual([-1, ...Array.from({ length: 35 }, (_, i) => i)]);
    expect(plan.runsTotal).toBe(plannedCounts(def(60, [15, 25])).runs);
  });

  it('sizes a chunk to the target time from the cost per simulated second', () => {
    // 2 runs of 60 s per point at 5.9 ms each: about 11.8 ms per point, so 1 s holds 85 points
    const plan = fleetPlan(def(60, [15, 25]), 1000);
    expect(plan.chunkUnits).toBe(Math.round(1000 / (2 * 60 * MS_PER_SIMULATED_SECOND)));
    // a chunk never holds less than one point, however long the runs
    expect(fleetPlan(def(60), 1).chunkUnits).toBe(1);
  });

  it('queues again only chunks with a point not stored, and counts the runs of the stored ones', () => {
    const plan = fleetPlan(def(60), 50);
    const units = Array.from({ length: plan.chunks }, (_, k) => chunkUnitsOf(plan, k)).flat();
    const stored = new Set(units.filter((u) => !chunkUnitsOf(plan, 1).includes(u) || u === chunkUnitsOf(plan, 1)[0]));
    expect(missingChunks(plan, stored)).toEqual([1]);
    expect(missingChunks(plan, new Set(units))).toEqual([]);
    expect(storedRuns(plan, [-1, 0, 1])).toBe(3);
  });
});
