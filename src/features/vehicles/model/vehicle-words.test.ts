import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { SetupInput } from '../../../../shared/schemas/setup.ts';
import { VehicleSetup } from '../../../../shared/schemas/vehicle-setup.ts';
import { vehicleLinearResult } from '../../../../shared/sim/vehicle/run-vehicle.ts';
import { vehicleStatics } from '../../../../shared/sim/vehicle/vehicle-model.ts';
import { vehicleCheckLines } from './vehicle-words.ts';

const example = <T>(name: string): T => JSON.parse(readFileSync(new URL(`../../../../examples/${name}`, import.meta.url), 'utf8'));
const front = example<SetupInput>('pipit-front.setup.json');
const rear = example<SetupInput>('pipit-rear.setup.json');

function linear(f: SetupInput, r: SetupInput, speed: number) {
  const s = vehicleStatics(VehicleSetup.parse({ name: 'x', wheelbase: 2.55, pitchRadiusOfGyration: 1.15, front: f, rear: r }));
  if (!s.ok) throw new Error(s.reason);
  return vehicleLinearResult(s.statics, speed);
}
const kmh = (v: number) => `${(v * 3.6).toFixed(0)} km/h`;

describe('vehicle checks in words', () => {
  it('says which end is faster and what that does', () => {
    const good = vehicleCheckLines(linear(front, rear, 20), 20, kmh).find((l) => l.key === 'frontBelowRear')!;
    const swapped = vehicleCheckLines(linear(rear, front, 20), 20, kmh).find((l) => l.key === 'frontBelowRear')!;
    expect(good.met).toBe(true);
    expect(good.text).toMatch(/slower than the rear/);
    expect(swapped.met).toBe(false);
    expect(swapped.text).toMatch(/faster than the rear/);
  });

  it('names the speed where the wheelbase feeds the pitch mode (V = 2·L·f_pitch), and flags it when driven there', () => {
    const lin = linear(front, rear, 20);
    const worst = 2 * 2.55 * lin.modes.pitch.naturalHz;
    const far = vehicleCheckLines(lin, 20, kmh).find((l) => l.key === 'pitchSpeed')!;
    expect(far.text).toContain(kmh(worst));
    expect(far.met).toBe(true);
    const there = vehicleCheckLines(linear(front, rear, worst), worst, kmh).find((l) => l.key === 'pitchSpeed')!;
    expect(there.met).toBe(false);
    expect(there.text).toMatch(/pitches most here/);
  });
});
