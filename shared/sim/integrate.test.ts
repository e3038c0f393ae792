import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { Metrics } from '../schemas/metrics.ts';
import type { RoadInput } from '../schemas/road.ts';
import type { SetupInput } from '../schemas/setup.ts';
import { runCorner } from './run-corner.ts';

const example = <T>(name: string): T => JSON.parse(readFileSync(new URL(`../../examples/${name}`, import.meta.url), 'utf8'));
const pipit = example<SetupInput>('pipit-front.setup.json');
const isoC = example<RoadInput>('iso-c.road.json');

const run = (req: Parameters<typeof runCorner>[0]) => {
  const out = runCorner(req);
  if (!out.ok) throw new Error(out.reason);
  return out;
};

/** Every scalar metric, flattened (`damperVelocityBands.low`, …). */
function scalars(m: Metrics): Record<string, number> {
  const out: Record<string, number> = {};
  for (const [k, v] of Object.entries(m)) if (typeof v === 'number') out[k] = v;
  for (const [k, v] of Object.entries(m.damperVelocityBands)) out[`damperVelocityBands.${k}`] = v;
  return out;
}

describe('integration accuracy of the reference (odex)', () => {
  it('tightening the tolerance tenfold moves no metric by more than 0.1 %', () => {
    // Non-linear Pipit corner (tabled asymmetric damper, polytropic gas, stops) on ISO 8608
    // class C at 20 m/s, the benchmark problem, with a few lift-offs in it.
    const base = { setup: pipit, road: isoC, speed: 20, duration: 30, integrator: 'odex' as const };
    const a = run(base).result;
    const b = run({ ...base, tolerance: a.tolerance / 10 }).result;
    const ma = scalars(a.metrics);
    const mb = scalars(b.metrics);
    // 0.1 % of the figure itself; for shares of time (counted in output samples) 0.1 % of all
    // the time, for times 0.1 % of the analysed time, for the minimum tyre load (0 at lift-off)
    // 0.1 % of the static load.
    const shares = new Set(['liftOffFraction', 'damperVelocityBands.low', 'damperVelocityBands.mid', 'damperVelocityBands.high', 'damperVelocityBands.compression']);
    const scaleOf = (k: string, v: number) =>
      shares.has(k) ? 1 : k.endsWith('StopTime') ? mb.analysedTime : k === 'tyreLoadMin' ? mb.tyreLoadStatic : Math.abs(v);
    const worst = Object.keys(mb).map((k) => ({ k, rel: Math.abs(ma[k] - mb[k]) / Math.max(scaleOf(k, mb[k]), 1e-300) }));
    for (const w of worst) expect(w.rel, w.k).toBeLessThanOrEqual(1e-3);
    expect(b.timing.rhsEvaluations).toBeGreaterThan(a.timing.rhsEvaluations);
  }, 60_000);
});

describe('output and events', () => {
  it('samples on a uniform grid from 0 to the end of the run', () => {
    const out = run({ setup: pipit, road: isoC, speed: 20, duration: 2, outputRate: 400 });
    expect(out.trace.dt).toBe(1 / 400);
    expect(out.trace.bodyAccel.length).toBe(801);
    // The run starts in static equilibrium with the road at zero under the tyre.
    expect(out.trace.road[0]).toBe(0);
    expect(out.trace.travel[0]).toBe(0);
    expect(out.trace.bodyAccel[0]).toBe(0);
  });

  it('restarts at the edges of a bump instead of stepping over it', () => {
    const bump: RoadInput = { kind: 'bump', height: 0.03, length: 0.5, at: 30 };
    const out = run({ setup: pipit, road: bump, speed: 15, duration: 4 });
    // Two road breakpoints make at least three pieces.
    expect(out.result.timing.segments).toBeGreaterThanOrEqual(3);
    const peakRoad = Math.max(...out.trace.road);
    expect(peakRoad).toBeGreaterThan(0.0299);
    expect(peakRoad).toBeLessThanOrEqual(0.03);
    // Before the bump (t < 2 s) the corner has not moved at all.
    const before = Math.round(1.9 / out.trace.dt);
    expect(Math.max(...out.trace.travel.subarray(0, before).map(Math.abs))).toBe(0);
    expect(out.result.metrics.travelMaxCompression).toBeGreaterThan(0.005);
  });

  it('on a severe road the tyre leaves the ground and its force is never negative', () => {
    // ISO 8608 class F at 30 m/s: a rough track far beyond what the example corner is made for.
    const out = run({ setup: pipit, road: { kind: 'iso8608', class: 'F', seed: 3 }, speed: 30, duration: 10 });
    // (timeout raised below: a loaded test machine, not a timed assertion)
    expect(out.result.metrics.liftOffFraction).toBeGreaterThan(0.01);
    expect(Math.min(...out.trace.tyreLoad)).toBe(0);
    expect(out.trace.tyreLoad.every((f) => f >= 0)).toBe(true);
    // Each lift-off and landing is a restart of the integrator.
    expect(out.result.timing.segments).toBeGreaterThan(10);
  }, 30_000);

  it('drops off a kerb: the wheel leaves the road, then lands and settles', () => {
    const kerb: RoadInput = { kind: 'kerb', height: -0.12, rampLength: 0.05, at: 20 };
    const out = run({ setup: pipit, road: kerb, speed: 10, duration: 7 });
    expect(out.result.metrics.liftOffFraction).toBeGreaterThan(0);
    const last = out.trace.tyreLoad.length - 1;
    // Five seconds after the drop the load is back within 0.2 % of static.
    expect(Math.abs(out.trace.tyreLoad[last] / out.result.statics.tyreLoad - 1)).toBeLessThan(0.002);
    expect(out.trace.road[last]).toBeCloseTo(-0.12, 12);
  });
});
