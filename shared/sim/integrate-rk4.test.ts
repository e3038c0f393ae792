import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { RoadInput } from '../schemas/road.ts';
import { Setup, type SetupInput } from '../schemas/setup.ts';
import { figuresFromMetrics } from '../study/figures.ts';
import { createStudyRunner } from '../study/run-jobs.ts';
import { figureDifferences } from './metrics/figure-differences.ts';
import { runCorner } from './run-corner.ts';

const example = <T>(name: string): T => JSON.parse(readFileSync(new URL(`../../examples/${name}`, import.meta.url), 'utf8'));
const pipit = example<SetupInput>('pipit-front.setup.json');

const run = (req: Parameters<typeof runCorner>[0]) => {
  const out = runCorner(req);
  if (!out.ok) throw new Error(out.reason);
  return out.result;
};

/**
 * The default integrator (RK4 at the planned step, switches located) against the reference,
 * odex at a relative tolerance of 1e-8 (its own tenfold-tightening check is in
 * integrate.test.ts), on the non-linear Pipit corner: tabled damper, polytropic gas, polynomial
 * bump stop, tabled rebound stop. Bound: 0.1 % on every figure, each on the scale that fits it
 * (metrics/figure-differences.ts). `expects` says what the case must contain, so that a change
 * of road or setup cannot quietly turn a stop-strike case into one without a strike.
 */
const cases: Array<[string, RoadInput, number, number, Array<'liftOff' | 'bumpStop' | 'reboundStop'>]> = [
  ['ISO 8608 class C at 20 m/s (the benchmark road)', example<RoadInput>('iso-c.road.json'), 20, 30, ['liftOff']],
  ['ISO 8608 class D at 20 m/s', { kind: 'iso8608', class: 'D', seed: 3 }, 20, 20, ['liftOff', 'bumpStop']],
  ['a 6 cm car-park bump at 10 m/s: lift-off and a bump-stop strike', example<RoadInput>('speed-bump.road.json'), 10, 6, ['liftOff', 'bumpStop']],
  ['an 8 cm short bump at 15 m/s: the wheel flies off the crest', { kind: 'bump', height: 0.08, length: 0.5, at: 10 }, 15, 3, ['liftOff', 'bumpStop']],
  ['a 10 cm kerb drop at 10 m/s: rebound-stop strike, lift-off, bump-stop strike on landing', example<RoadInput>('kerb-down.road.json'), 10, 6, ['liftOff', 'bumpStop', 'reboundStop']],
];

describe('default integrator (RK4, located switches) against odex at 1e-8', () => {
  it.each(cases)('%s: every figure within 0.1 %%', (_name, road, speed, duration, expects) => {
    const reference = run({ setup: pipit, road, speed, duration, integrator: 'odex', tolerance: 1e-8 });
    const fast = run({ setup: pipit, road, speed, duration });
    expect(fast.integrator).toBe('rk4');
    const m = reference.metrics;
    if (expects.includes('liftOff')) expect(m.liftOffFraction).toBeGreaterThan(0);
    if (expects.includes('bumpStop')) expect(m.bumpStopTime).toBeGreaterThan(0);
    if (expects.includes('reboundStop')) expect(m.reboundStopTime).toBeGreaterThan(0);
    const diffs = figureDifferences(fast.metrics, m);
    expect(diffs.length).toBeGreaterThan(40);
    for (const d of diffs) expect(d.relative, d.key).toBeLessThanOrEqual(1e-3);
    expect(fast.metrics.comfort).toEqual(m.comfort);
    // The linear figures do not depend on the integrator at all.
    expect(fast.modal).toEqual(reference.modal);
    // It gets there with fewer evaluations of the equations of motion than odex at its default.
    const odex = run({ setup: pipit, road, speed, duration, integrator: 'odex' });
    if (duration >= 20) expect(fast.timing.rhsEvaluations).toBeLessThan(odex.timing.rhsEvaluations);
  }, 60_000);

  it('restarts at each located switch and road breakpoint', () => {
    const kerb = example<RoadInput>('kerb-down.road.json');
    const out = run({ setup: pipit, road: kerb, speed: 10, duration: 6 });
    // Two ramp ends, then at least a lift-off, a landing and the stop contacts, each a new segment.
    expect(out.timing.segments).toBeGreaterThanOrEqual(7);
    expect(out.timing.rejectedSteps).toBeGreaterThanOrEqual(4);
  });

  it('a study point and a single run of the same corner are the same integration', () => {
    const road = example<RoadInput>('iso-c.road.json');
    const runner = createStudyRunner({ base: Setup.parse(pipit), roads: [road as never], duration: 10 });
    const study = runner.run({ pointIndex: 0, values: {}, roadIndex: 0, speed: 20 });
    const single = run({ setup: pipit, road, speed: 20, duration: 10 });
    expect(study.run.figures).toEqual(figuresFromMetrics(single.metrics, single.statics, Setup.parse(pipit)));
  });
});
