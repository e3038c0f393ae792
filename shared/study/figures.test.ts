import { describe, expect, it } from 'vitest';
import type { Metrics } from '../schemas/metrics.ts';
import { Setup } from '../schemas/setup.ts';
import { StudyFigures, studyFigureKeys } from '../schemas/study.ts';
import { figuresFromMetrics, studyFigureInfo } from './figures.ts';

const metrics: Metrics = {
  analysedTime: 58, bodyAccelRms: 0.9, bodyAccelPeak: 3.1, bodyAccelCrest: 3.4, bodyAccelWkRms: 0.62, vdv: 1.9,
  comfort: { bands: ['fairly uncomfortable'], primary: 'fairly uncomfortable' },
  tyreLoadStatic: 3400, tyreLoadRms: 500, tyreLoadRatio: 0.147, tyreLoadMin: 1200, liftOffFraction: 0,
  travelRms: 0.012, travelMaxCompression: 0.04, travelMaxExtension: 0.035, strokeUsedCompression: 0.47, strokeUsedExtension: 0.37,
  bumpStopTime: 0, reboundStopTime: 0, damperVelocityRms: 0.11,
  damperVelocityHistogram: { edges: [0, 1], counts: [1] },
  damperVelocityBands: { lowEdge: 0.05, highEdge: 0.3, low: 0.4, mid: 0.5, high: 0.1, compression: 0.5 },
  damperPowerMean: 40, damperEnergy: 2320,
  endOfStrokeDepthCompression: 0.004, endOfStrokeDepthExtension: 0, damperEquivalentOnRoad: 1200,
};

const corner = Setup.parse({
  name: 'linear corner', sprungMass: 300, unsprungMass: 40, springRate: 30000, motionRatio: 1, tyreRate: 200000,
  damper: { compression: [[1, 1000]], rebound: [[1, 1000]] },
});

describe('figuresFromMetrics', () => {
  it('keeps every scalar figure and adds stroke used as the larger way', () => {
    const f = figuresFromMetrics({ ...metrics, mtvv: 1.4 }, { bodySag: 0.164 }, corner);
    expect(StudyFigures.safeParse(f).success).toBe(true);
    expect(f.endOfStrokeDepth).toBe(0.004);
    // ζ = c·MR² / (2·√(k·MR²·ms)) by hand: 1200 / (2·√(30000·300)) = 0.2
    expect(f.bodyDampingRatioOnRoad).toBeCloseTo(0.2, 12);
    expect(f.staticSag).toBe(0.164);
    expect(Object.keys(f).sort()).toEqual([...studyFigureKeys].sort());
    expect(f.strokeUsed).toBe(0.47);
    expect(f.bodyAccelWkRms).toBe(0.62);
  });

  it('leaves stroke figures out when the setup gives no stroke', () => {
    const { strokeUsedCompression: _c, strokeUsedExtension: _e, ...rest } = metrics;
    const f = figuresFromMetrics(rest);
    expect(f.strokeUsed).toBeUndefined();
    expect(f.strokeUsedCompression).toBeUndefined();
  });

  it('reads higher as better only for minimum tyre load and (so "worst" is the least damped run) the damping ratio on the road', () => {
    expect(studyFigureKeys.filter((k) => studyFigureInfo[k].goal === 'max')).toEqual(['tyreLoadMin', 'bodyDampingRatioOnRoad']);
  });
});
