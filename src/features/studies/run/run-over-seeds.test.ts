import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { Setup, type SetupInput } from '../../../../shared/schemas/setup.ts';
import { StudyDefinition } from '../../../../shared/schemas/study.ts';
import { runStudyHere } from '../../../../shared/study/run-all.ts';
import { createStudyRunner } from '../../../../shared/study/run-jobs.ts';
import { ensembleSeed } from '../../../../shared/study/seeds.ts';
import { seedRepeatJobs, summariseSeedRepeat } from './run-over-seeds.ts';

const pipit = Setup.parse(JSON.parse(readFileSync(new URL('../../../../examples/pipit-front.setup.json', import.meta.url), 'utf8')) as SetupInput);
const road = { kind: 'iso8608' as const, class: 'B' as const, seed: 5 };

describe('a run repeated over seeds', () => {
  it('gives the figures and spread of a one-point study over the same seeds, whatever order the runs come back in', () => {
    const input = { road, speed: 25, seed: 40, seeds: 4 };
    const runner = createStudyRunner({ base: pipit, roads: [road], duration: 4 });
    const outcomes = seedRepeatJobs(input).map((j) => runner.run(j)).reverse();
    const got = summariseSeedRepeat(input, outcomes);
    const def = StudyDefinition.parse({
      name: 'One point',
      base: { setupId: 's', revisionId: 'r' },
      axes: [{ parameter: 'damperScale', from: 1, to: 1, steps: 1 }],
      roads: [{ source: 'inline', road, seed: 40 }],
      speeds: [25],
      duration: 4,
      seeds: 4,
      objectives: [{ figure: 'bodyAccelWkRms', weight: 1 }],
    });
    const study = runStudyHere(def, pipit, [road]);
    expect(got.figures).toEqual(study.base?.figures);
    expect(got.spread).toEqual(study.base?.spread);
    expect(got.roadSeeds).toEqual([0, 1, 2, 3].map((k) => ensembleSeed(40, k)));
    expect(got.failed).toBe(0);
  });
});
