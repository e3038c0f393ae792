import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { Setup } from '../schemas/setup.ts';
import { Road } from '../schemas/road.ts';
import { integrateCorner } from './integrate.ts';
import { cornerModel, endOfStrokeRate, GRAVITY, newCornerForces, staticEquilibrium, wheelRate } from './quarter-car.ts';
import { runCorner } from './run-corner.ts';
import { buildRoad } from './roads/index.ts';
import { stopLawEnergy } from './stops.ts';

// The hard limits at the ends of the stroke (docs/model.md §1). Checks: the limit's force law
// read straight from the equations of motion; conservation of energy through a strike on the
// limit (the limit stores ½·k·δ², a linear spring: any mechanics text); and the run the issue
// reported (a 100 mm kerb at 10 m/s on the demo front corner went 151 % of its stroke) now
// stays within the stroke plus the limit's small deflection, and says so.

const example = (name: string) => JSON.parse(readFileSync(new URL(`../../examples/${name}`, import.meta.url), 'utf8')) as Record<string, unknown>;
const front = Setup.parse(example('pipit-front.setup.json'));

describe('end of stroke', () => {
  it('pushes back with k·δ beyond the compression end and pulls with k·δ beyond the extension end', () => {
    const st = staticEquilibrium(front);
    if (!st.ok) throw new Error(st.reason);
    const k = endOfStrokeRate(front);
    expect(k).toBe(20 * front.tyreRate);
    const model = cornerModel(front, st.state);
    const without = cornerModel(Setup.parse({ ...front, stroke: undefined }), st.state);
    const a = newCornerForces();
    const b = newCornerForces();
    for (const [x, beyond] of [
      [front.stroke!.compression + 0.004, 0.004],
      [-front.stroke!.extension - 0.003, -0.003],
      [front.stroke!.compression - 0.001, 0],
    ]) {
      model.evaluate(0, 0, x, 0, 0, 0, a);
      without.evaluate(0, 0, x, 0, 0, 0, b);
      // the suspension force on the body differs by exactly the limit's force
      expect((a.bodyAccel - b.bodyAccel) * front.sprungMass).toBeCloseTo(k * beyond, 6);
    }
  });

  it('conserves energy through a strike on the compression limit (no damping, no tyre damping)', () => {
    const s = Setup.parse({ ...front, damper: { compression: [[1, 1e-9]], rebound: [[1, 1e-9]] }, tyreDamping: 0 });
    const st = staticEquilibrium(s);
    if (!st.ok) throw new Error(st.reason);
    const level = buildRoad(Road.parse({ kind: 'sine', name: 'flat', amplitude: 1e-9, wavelength: 1000 }), 1, 2);
    if (!level.ok) throw new Error(level.reason);
    // wheel thrown up fast from rest: it runs through the bump stop into the end of the stroke
    const WHEEL_SPEED = 8;
    const run = integrateCorner(cornerModel(s, st.state), level.road, { duration: 0.6, outputRate: 4000, tolerance: 1e-10, initial: [0, 0, 0, WHEEL_SPEED], recordStates: true });
    if (!run.ok) throw new Error(run.reason);
    const { bodyDisplacement: zs, bodyVelocity: vs, wheelDisplacement: zu, wheelVelocity: vu } = run.states!;
    const k = endOfStrokeRate(s);
    const kw = wheelRate(s);
    const energy = (i: number) => {
      const x = zu[i] - zs[i];
      return (
        0.5 * s.sprungMass * vs[i] ** 2 +
        0.5 * s.unsprungMass * vu[i] ** 2 +
        0.5 * kw * (st.state.springDeflection + x) ** 2 +
        0.5 * s.tyreRate * Math.max(0, st.state.tyreDeflection - zu[i]) ** 2 +
        GRAVITY * (s.sprungMass * zs[i] + s.unsprungMass * zu[i]) +
        stopLawEnergy(s.bumpStop!.law, x - s.bumpStop!.clearance) +
        stopLawEnergy(s.reboundStop!.law, -x - s.reboundStop!.clearance) +
        0.5 * k * (Math.max(0, x - s.stroke!.compression) ** 2 + Math.max(0, -x - s.stroke!.extension) ** 2)
      );
    };
    const maxTravel = Math.max(...Array.from(zu, (u, i) => u - zs[i]));
    expect(maxTravel, 'the strike reaches the limit').toBeGreaterThan(s.stroke!.compression);
    const e0 = energy(0);
    let worst = 0;
    for (let i = 1; i < zs.length; i++) worst = Math.max(worst, Math.abs(energy(i) - e0));
    expect(worst / (0.5 * s.unsprungMass * WHEEL_SPEED ** 2)).toBeLessThan(1e-4);
  });

  it('keeps a 100 mm kerb at 10 m/s within the stroke plus the limit\'s deflection, and reports the strike', () => {
    const road = { kind: 'kerb' as const, name: 'kerb', height: 0.1, rampLength: 0.02, at: 2 };
    const unbounded = runCorner({ setup: { ...front, stroke: undefined }, road, speed: 10, duration: 2 });
    const run = runCorner({ setup: front, road, speed: 10, duration: 2 });
    if (!run.ok || !unbounded.ok) throw new Error('run failed');
    const m = run.result.metrics;
    // without the limit the travel ran far past the stroke (the reported 129 mm of 85 mm)
    const overshootBefore = unbounded.result.metrics.travelMaxCompression - front.stroke!.compression;
    expect(overshootBefore).toBeGreaterThan(0.04);
    const k = endOfStrokeRate(front);
    expect(m.travelMaxCompression).toBeGreaterThan(front.stroke!.compression);
    expect(m.endOfStrokeDepthCompression).toBeCloseTo(m.travelMaxCompression - front.stroke!.compression, 12);
    // the limit (20 × the tyre rate) holds it to less than half that overshoot (15 of 44 mm here)
    expect(m.endOfStrokeDepthCompression!).toBeLessThan(overshootBefore / 2);
    expect(m.endOfStrokeForcePeak).toBeCloseTo(k * m.endOfStrokeDepthCompression!, 6);
    expect(m.endOfStrokeEnergyPeak).toBeCloseTo(0.5 * k * m.endOfStrokeDepthCompression! ** 2, 6);
    // the damper is driven far past its table's last speed, and that is reported too
    expect(m.damperSpeedPeakCompression!).toBeGreaterThan(m.damperTableEndCompression!);
  });
});
