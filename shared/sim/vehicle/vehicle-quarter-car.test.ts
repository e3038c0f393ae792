import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { RoadInput } from '../../schemas/road.ts';
import { Setup, type SetupInput } from '../../schemas/setup.ts';
import { VehicleSetup } from '../../schemas/vehicle-setup.ts';
import { integrateCorner, integrateVehicle } from '../integrate.ts';
import { computeMetrics } from '../metrics/compute-metrics.ts';
import { figureDifferences } from '../metrics/figure-differences.ts';
import { cornerModel, staticEquilibrium } from '../quarter-car.ts';
import { buildRoad } from '../roads/index.ts';
import type { TraceColumns } from '../trace.ts';
import { axleRoads } from './integrate-vehicle.ts';
import { dynamicIndex, vehicleModel, vehicleStatics } from './vehicle-model.ts';

const example = <T>(name: string): T => JSON.parse(readFileSync(new URL(`../../../examples/${name}`, import.meta.url), 'utf8'));
const pipit = example<SetupInput>('pipit-front.setup.json');

/**
 * A vehicle with equal front and rear, the CG mid-way and a dynamic index of 1 is two
 * independent quarter cars: each axle must then reproduce its corner's own run over the same
 * input (the front over the road a wheelbase ahead). Both runs use the same method and step.
 * Without switches the step sequences are identical, so the runs agree to rounding (1e-9 of
 * each column's range). With lift-off or stop contact on either axle the vehicle also cuts the
 * other axle's step at the located switch, so they agree to integrator accuracy: every figure
 * within 0.1 %, the bound that holds RK4 to odex at 1e-8 (integrate-rk4.test.ts).
 */
const L = 2.6;
const vehicle = VehicleSetup.parse({ name: 'Twin Pipit', wheelbase: L, pitchRadiusOfGyration: L / 2, front: pipit, rear: pipit });

function maxDifference(a: Float64Array, b: Float64Array): number {
  let d = 0;
  for (let i = 0; i < a.length; i++) d = Math.max(d, Math.abs(a[i] - b[i]));
  return d;
}
function range(a: Float64Array): number {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of a) {
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  return hi - lo;
}
const columns = ['bodyAccel', 'travel', 'tyreLoad', 'damperForce', 'bumpStopForce', 'reboundStopForce'] as const;

function expectSameRun(axle: TraceColumns, corner: TraceColumns) {
  expect(axle.bodyAccel.length).toBe(corner.bodyAccel.length);
  for (const c of columns) {
    const scale = Math.max(range(corner[c]), 1);
    expect(maxDifference(axle[c], corner[c]) / scale, c).toBeLessThan(1e-9);
  }
}

describe('vehicle with equal axles, CG mid-way, dynamic index 1', () => {
  const statics = vehicleStatics(vehicle);
  if (!statics.ok) throw new Error(statics.reason);
  const model = vehicleModel(statics.statics);

  it('has dynamic index 1 and carries each corner its own sprung mass', () => {
    expect(dynamicIndex(statics.statics.geometry)).toBeCloseTo(1, 12);
    expect(statics.statics.frontSetup.sprungMass).toBeCloseTo(pipit.sprungMass, 9);
    expect(statics.statics.rearSetup.sprungMass).toBeCloseTo(pipit.sprungMass, 9);
  });

  const cases: Array<[string, RoadInput, number, number, (t: TraceColumns) => void]> = [
    ['ISO 8608 class B at 20 m/s (no switch)', { kind: 'iso8608', class: 'B', seed: 3 }, 20, 6, (t) => expect(Math.min(...t.tyreLoad)).toBeGreaterThan(0)],
    ['ISO 8608 class D at 20 m/s (lift-off)', { kind: 'iso8608', class: 'D', seed: 3 }, 20, 6, (t) => expect(Math.min(...t.tyreLoad)).toBe(0)],
    [
      'a 6 cm car-park bump at 10 m/s (bump-stop strike, road breakpoints)',
      example<RoadInput>('speed-bump.road.json'),
      10,
      3,
      (t) => expect(Math.max(...t.bumpStopForce)).toBeGreaterThan(0),
    ],
  ];
  for (const [name, roadDoc, speed, duration, contains] of cases) {
    it(`each axle reproduces its quarter-car run: ${name}`, () => {
      const setup = Setup.parse(pipit);
      const delay = L / speed;
      const built = buildRoad(roadDoc as never, speed, duration + delay, setup.tyreFootprint, setup.tyreRadius);
      if (!built.ok) throw new Error(built.reason);
      const roads = axleRoads(built.road, delay);
      const out = integrateVehicle(model, roads, { duration, outputRate: 500 });
      if (!out.ok) throw new Error(out.reason);
      const cs = staticEquilibrium(setup);
      if (!cs.ok) throw new Error(cs.reason);
      const corner = cornerModel(setup, cs.state);
      const rear = integrateCorner(corner, roads.rear, { duration, outputRate: 500 });
      const front = integrateCorner(corner, roads.front, { duration, outputRate: 500 });
      if (!rear.ok || !front.ok) throw new Error('corner run failed');
      contains(rear.trace);
      const switched = out.stats.rejectedSteps > 0;
      for (const [axle, single, reach] of [
        [out.trace.rear, rear.trace, 25],
        [out.trace.front, front.trace, 25 - L],
      ] as const) {
        if (!switched) expectSameRun(axle, single);
        // Until an axle meets the bump (the rear at 25 m, the front a wheelbase earlier) it rests and
        // the sign of its damper speed (the compression share) is rounding noise: its figures start there.
        const options = { settleTime: roadDoc.kind === 'iso8608' ? 1 : reach / speed + 0.01, staticTyreLoad: cs.state.tyreLoad, stroke: setup.stroke };
        const diffs = figureDifferences(computeMetrics(axle, options), computeMetrics(single, options));
        for (const d of diffs) expect(d.relative, d.key).toBeLessThanOrEqual(1e-3);
      }
    });
  }
});
