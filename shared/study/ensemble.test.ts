import { readFileSync } from 'node:fs';
import { Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { Setup, type SetupInput } from '../schemas/setup.ts';
import { StudyDefinition, type StudyDefinitionInput } from '../schemas/study.ts';
import { ensembleFigures, meanAndSpread } from './ensemble.ts';
import { runStudyHere } from './run-all.ts';
import { ensembleSeed } from './seeds.ts';

const pipit = Setup.parse(JSON.parse(readFileSync(new URL('../../examples/pipit-front.setup.json', import.meta.url), 'utf8')) as SetupInput);
const isoC = { kind: 'iso8608' as const, class: 'C' as const, seed: 11, amplitudes: 'random' as const };
const bump = { kind: 'bump' as const, height: 0.03, length: 0.5, at: 5 };

const def = (over: Partial<StudyDefinitionInput> = {}) =>
  StudyDefinition.parse({
    name: 'Seeds',
    base: { setupId: 's', revisionId: 'r' },
    axes: [{ parameter: 'damperScale', from: 0.7, to: 1.3, steps: 2 }],
    roads: [{ source: 'inline', road: isoC }],
    speeds: [20],
    duration: 4,
    objectives: [{ figure: 'bodyAccelWkRms', weight: 1 }],
    ...over,
  });
const roadsOf = (d: StudyDefinition) => d.roads.map((r) => (r.source === 'inline' ? r.road : isoC));

describe('seed ensembles', () => {
  it('mean and spread agree with ml-matrix (mean, unbiased standard deviation) on uneven data', () => {
    const xs = [0.81, 1.07, 0.93, 1.42, 0.66, 1.15, 0.99];
    const m = new Matrix([xs]);
    const s = meanAndSpread(xs);
    expect(s.mean).toBeCloseTo(m.mean(), 14);
    expect(s.sd).toBeCloseTo(m.standardDeviation('row', { unbiased: true })[0], 14);
    expect([s.min, s.max]).toEqual([0.66, 1.42]);
    expect(meanAndSpread([3]).sd).toBe(0);
  });

  it('seed 1 is the road’s own; the others are distinct 32-bit seeds, the same on every call', () => {
    expect(ensembleSeed(11, 0)).toBe(11);
    const list = Array.from({ length: 50 }, (_, k) => ensembleSeed(11, k));
    expect(new Set(list).size).toBe(50);
    expect(list.every((s) => Number.isInteger(s) && s >= 0 && s <= 0xffffffff)).toBe(true);
    expect(Array.from({ length: 50 }, (_, k) => ensembleSeed(11, k))).toEqual(list);
    expect(ensembleSeed(12, 1)).not.toBe(ensembleSeed(11, 1));
  });

  it('a one-seed study is today’s study: no seed indices, no spread, figures the plain aggregate of the runs', () => {
    const one = runStudyHere(def(), pipit, roadsOf(def()));
    for (const p of one.points) {
      expect(p.spread).toBeUndefined();
      expect(p.runs.every((r) => r.seedIndex === undefined)).toBe(true);
      expect(ensembleFigures(p.runs, 'mean', 1).figures).toEqual(p.figures);
    }
  });

  it('over three seeds each figure is the mean of three one-seed studies on the derived seeds, with their spread', () => {
    const d3 = def({ seeds: 3 });
    const three = runStudyHere(d3, pipit, roadsOf(d3));
    const singles = [0, 1, 2].map((k) => {
      const d = def({ roads: [{ source: 'inline', road: isoC, seed: ensembleSeed(isoC.seed, k) }] });
      return runStudyHere(d, pipit, roadsOf(d));
    });
    // Seed 1 of the ensemble is the one-seed study, to the last digit.
    expect(three.points[0].runs[0].figures).toEqual(singles[0].points[0].runs[0].figures);
    for (const p of three.points) {
      expect(p.runs.map((r) => r.seedIndex)).toEqual([0, 1, 2]);
      const xs = singles.map((s) => s.points[p.index].figures.bodyAccelWkRms as number);
      const m = new Matrix([xs]);
      expect(p.figures.bodyAccelWkRms).toBeCloseTo(m.mean(), 12);
      expect(p.spread?.bodyAccelWkRms?.sd).toBeCloseTo(m.standardDeviation('row', { unbiased: true })[0], 12);
      expect(p.spread?.bodyAccelWkRms).toMatchObject({ min: Math.min(...xs), max: Math.max(...xs), n: 3 });
      // Different profiles really differ: a random-amplitude road scatters.
      expect(p.spread!.bodyAccelWkRms!.sd).toBeGreaterThan(0);
      expect(p.objectives[0]).toBe(p.figures.bodyAccelWkRms);
    }
    expect(three.base?.spread?.bodyAccelWkRms?.n).toBe(3);
  });

  it('the same definition gives the same figures to the last digit, run after run', () => {
    const d = def({ seeds: 4 });
    expect(runStudyHere(d, pipit, roadsOf(d))).toEqual(runStudyHere(d, pipit, roadsOf(d)));
  });

  it('an event road ignores seeds: every seed gives its one run, so its figures have no spread', () => {
    const d = def({ seeds: 3, roads: [{ source: 'inline', road: bump }] });
    const out = runStudyHere(d, pipit, roadsOf(d));
    for (const p of out.points) {
      expect(p.runs).toHaveLength(3);
      expect(p.runs[1].figures).toEqual(p.runs[0].figures);
      expect(p.spread?.bodyAccelPeak?.sd).toBe(0);
    }
  });
});
