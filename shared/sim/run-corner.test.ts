import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { RoadInput } from '../schemas/road.ts';
import { RunResult } from '../schemas/run.ts';
import type { SetupInput } from '../schemas/setup.ts';
import { runCorner } from './run-corner.ts';

const example = <T>(name: string): T => JSON.parse(readFileSync(new URL(`../../examples/${name}`, import.meta.url), 'utf8'));
const pipit = example<SetupInput>('pipit-front.setup.json');
const isoC = example<Extract<RoadInput, { kind: 'iso8608' }>>('iso-c.road.json');

describe('runCorner', () => {
  it('returns a result that satisfies the run-result schema, with traces beside it', () => {
    const out = runCorner({ setup: pipit, road: isoC, speed: 20, duration: 8 });
    if (!out.ok) throw new Error(out.reason);
    expect(RunResult.safeParse(out.result).success).toBe(true);
    expect(out.result.settleTime).toBe(2);
    expect(out.result.road).toMatchObject({ kind: 'iso8608', seed: 7, distance: 160 });
    expect(out.trace.bodyAccel).toBeInstanceOf(Float64Array);
    expect(out.trace.bodyAccel.length).toBe(8 * 500 + 1);
    // Wheel rate and damping of the linear model: k·MR² (plus the small gas rate), c_eq·MR².
    expect(out.result.linear.wheelRate).toBeGreaterThan(32000 * 0.9025);
    expect(out.result.linear.wheelRate).toBeLessThan(32000 * 0.9025 * 1.02);
    expect(out.result.modal.equivalentDamping.definition).toMatch(/least-squares/);
  });

  it('uses the secant definition when asked', () => {
    const out = runCorner({ setup: pipit, road: isoC, speed: 20, duration: 3, equivalentDamping: { method: 'secant', referenceSpeed: 0.1 } });
    if (!out.ok) throw new Error(out.reason);
    // Pipit curves at 0.1 m/s: 130 N and 300 N → (1300 + 3000)/2 N·s/m at the damper.
    expect(out.result.linear.wheelDamping).toBeCloseTo(2150 * 0.95 ** 2, 6);
  });

  it('a seed in the request replaces the road seed', () => {
    const a = runCorner({ setup: pipit, road: isoC, speed: 20, duration: 3, seed: 11 });
    const b = runCorner({ setup: pipit, road: { ...isoC, seed: 11 }, speed: 20, duration: 3 });
    if (!a.ok || !b.ok) throw new Error('run failed');
    expect(a.result.road.seed).toBe(11);
    expect(Array.from(a.trace.road)).toEqual(Array.from(b.trace.road));
  });

  it('names the field of bad input', () => {
    const bad = { ...pipit, damper: { ...pipit.damper, rebound: [[0.1, 300], [0.05, 400]] } };
    const out = runCorner({ setup: bad as SetupInput, road: isoC, speed: 20, duration: 3 });
    expect(out.ok).toBe(false);
    if (!out.ok) {
      expect(out.reason).toMatch(/^setup\.damper\.rebound\.1\.0: velocity must rise/);
      expect(out.issues?.[0].path).toBe('setup.damper.rebound.1.0');
    }
    const noSpeed = runCorner({ setup: pipit, road: isoC, speed: -1, duration: 3 });
    expect(noSpeed.ok).toBe(false);
    if (!noSpeed.ok) expect(noSpeed.reason).toMatch(/^speed:/);
  });

  it('reports a corner the gas would lift and a measured road too short for the run', () => {
    const lifted = runCorner({ setup: { ...pipit, damper: { ...pipit.damper, gas: { force: 5000 } } }, road: isoC, speed: 20, duration: 3 });
    expect(lifted.ok).toBe(false);
    if (!lifted.ok) expect(lifted.reason).toMatch(/^setup\.damper\.gas:/);
    const short = runCorner({ setup: pipit, road: { kind: 'measured', points: [[0, 0], [1, 0], [2, 0], [3, 0], [4, 0]] }, speed: 20, duration: 3 });
    expect(short.ok).toBe(false);
    if (!short.ok) expect(short.reason).toMatch(/^road\.points: the profile is 4\.0 m long/);
  });

  it('events start the analysis at 0 s, so a bump early in the run is measured', () => {
    const out = runCorner({ setup: pipit, road: { kind: 'bump', height: 0.04, length: 0.5, at: 5 }, speed: 10, duration: 3 });
    if (!out.ok) throw new Error(out.reason);
    expect(out.result.settleTime).toBe(0);
    expect(out.result.metrics.bodyAccelPeak).toBeGreaterThan(1);
  });
});
