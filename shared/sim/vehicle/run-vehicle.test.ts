import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { RoadInput } from '../../schemas/road.ts';
import type { SetupInput } from '../../schemas/setup.ts';
import { VehicleRunResult } from '../../schemas/vehicle-run.ts';
import { VehicleSetup, type VehicleSetupInput } from '../../schemas/vehicle-setup.ts';
import { linearVehicle } from './vehicle-linear.ts';
import { vehicleStatics } from './vehicle-model.ts';
import { vehicleFrequencyResponse } from './vehicle-response.ts';
import { runVehicle } from './run-vehicle.ts';

const example = <T>(name: string): T => JSON.parse(readFileSync(new URL(`../../../examples/${name}`, import.meta.url), 'utf8'));
const pipit: VehicleSetupInput = { ...example<VehicleSetupInput>('pipit.vehicle.json'), front: example<SetupInput>('pipit-front.setup.json'), rear: example<SetupInput>('pipit-rear.setup.json') };

const roads: Array<[string, RoadInput, number]> = [
  ['iso8608', example('iso-c.road.json'), 3],
  ['sine', example('sine.road.json'), 3],
  ['sweep', example('sweep.road.json'), 3],
  ['bump', example('speed-bump.road.json'), 4],
  ['pothole', example('pothole.road.json'), 3],
  ['kerb', example('kerb-down.road.json'), 3],
  ['measured', { kind: 'measured', points: Array.from({ length: 400 }, (_, i) => [i * 0.25, 0.01 * Math.sin(i / 3)]) } as RoadInput, 3],
];

describe('runVehicle', () => {
  it.each(roads)('runs over a %s road and returns a result the schema accepts', (_kind, road, duration) => {
    const out = runVehicle({ vehicle: pipit, road, speed: 10, duration });
    if (!out.ok) throw new Error(out.reason);
    expect(VehicleRunResult.safeParse(out.result).success).toBe(true);
    const f = out.result.figures;
    expect(f.heaveAccelRms).toBeGreaterThan(0);
    expect(f.pitchAccelRms).toBeGreaterThan(0);
    for (const seat of f.seats) expect(seat.pointTotal).toBeGreaterThanOrEqual(seat.verticalWkRms);
  });

  it('the rear axle meets an event a wheelbase after the front', () => {
    const out = runVehicle({ vehicle: pipit, road: example('speed-bump.road.json'), speed: 10, duration: 4 });
    if (!out.ok) throw new Error(out.reason);
    const first = (x: Float64Array) => x.findIndex((v) => v > 1e-6) * out.trace.dt;
    expect(first(out.trace.rear.road) - first(out.trace.front.road)).toBeCloseTo(2.55 / 10, 2);
  });

  it('a corner the gas would lift names its axle', () => {
    const light = { ...pipit, bodyMass: 60, cgToFrontAxle: 1.2 };
    const out = runVehicle({ vehicle: light, road: example('iso-c.road.json'), speed: 10, duration: 2 });
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.reason).toMatch(/^vehicle\.front\.damper\.gas: /);
  });
});

describe('time domain against the linear frequency response', () => {
  it('on a small sine road a linear vehicle heaves, pitches and shakes each seat as the response predicts', () => {
    // Linear dampers, no gas, no stops; unequal ends and dynamic index ≠ 1, so heave and pitch couple.
    const front = example<SetupInput>('pipit-front-linear.setup.json');
    const rear = { ...front, name: 'linear rear', sprungMass: 245, springRate: 30000 };
    const vehicle = VehicleSetup.parse({ name: 'Linear', wheelbase: 2.55, pitchRadiusOfGyration: 1.05, front, rear });
    const speed = 12;
    const road: RoadInput = { kind: 'sine', amplitude: 0.005, wavelength: 9 };
    const out = runVehicle({ vehicle, road, speed, duration: 14, settleTime: 8 });
    if (!out.ok) throw new Error(out.reason);
    const st = vehicleStatics(vehicle);
    if (!st.ok) throw new Error(st.reason);
    const f = speed / 9;
    const response = vehicleFrequencyResponse(linearVehicle(st.statics), speed, out.result.figures.seats.map((s) => ({ name: s.name, behindFrontAxle: s.behindFrontAxle })) as never, new Float64Array([f]));
    // A steady sine of amplitude A has RMS A/√2; 6 s hold whole periods to within a fraction of one: 1 %.
    const rms = (gain: number) => (gain * 0.005) / Math.SQRT2;
    const fig = out.result.figures;
    expect(fig.heaveAccelRms / rms(response.heave.gain[0])).toBeCloseTo(1, 1.7);
    expect(fig.pitchAccelRms / rms(response.pitch.gain[0])).toBeCloseTo(1, 1.7);
    fig.seats.forEach((s, i) => expect(s.accelRms / rms(response.seats[i].response.gain[0])).toBeCloseTo(1, 1.7));
  });
});
