import { describe, expect, it } from 'vitest';
import { Road, type RoadInput } from '../../schemas/road.ts';
import { buildRoad } from './index.ts';
import { eventProfile, halfSine, ramp } from './event-shape.ts';

const out = new Float64Array(2);
function built(r: RoadInput, speed = 10, duration = 10) {
  const b = buildRoad(Road.parse(r), speed, duration);
  if (!b.ok) throw new Error(b.reason);
  return b.road;
}
const z = (road: ReturnType<typeof built>, t: number) => (road.sample(t, out), out[0]);
const zd = (road: ReturnType<typeof built>, t: number) => (road.sample(t, out), out[1]);
/** Central difference of the elevation, to check the reported rate. */
const slope = (road: ReturnType<typeof built>, t: number, h = 1e-6) => (z(road, t + h) - z(road, t - h)) / (2 * h);

describe('event roads', () => {
  it('a half-sine bump peaks at its height mid-way and lists its edges as breakpoints', () => {
    const r = built({ kind: 'bump', height: 0.05, length: 0.4, at: 12 });
    expect(z(r, 1.19)).toBe(0);
    expect(z(r, 1.22)).toBeCloseTo(0.05, 12);
    expect(z(r, 1.25)).toBe(0);
    expect(r.breakpoints).toEqual([1.2, 1.24].map((t) => expect.closeTo(t, 12)));
    expect(zd(r, 1.21)).toBeCloseTo(slope(r, 1.21), 5);
  });

  it('a pothole dips by its depth', () => {
    const r = built({ kind: 'pothole', depth: 0.03, length: 0.6, at: 5 });
    expect(z(r, 0.53)).toBeCloseTo(-0.03, 12);
  });

  it('a kerb ramps to its signed height and stays there', () => {
    const up = built({ kind: 'kerb', height: 0.1, rampLength: 0.1, at: 20 });
    expect(z(up, 2.005)).toBeCloseTo(0.05, 12);
    expect(zd(up, 2.005)).toBeCloseTo(10 * 1, 12);
    expect(z(up, 8)).toBe(0.1);
    const down = built({ kind: 'kerb', height: -0.08, rampLength: 0.02, at: 20 });
    expect(z(down, 8)).toBe(-0.08);
  });

  it('breakpoints outside the run are dropped', () => {
    const r = built({ kind: 'bump', height: 0.05, length: 0.4, at: 500 });
    expect(r.breakpoints).toEqual([]);
  });

  it('a footprint averages the shape exactly and moves the kinks by half its length', () => {
    const shape = ramp(0.1, 0.05, 2);
    const soft = eventProfile(shape, 0.2);
    // Mid-way through the (lengthened) ramp the average is half the height.
    soft.at(2.025, out);
    expect(out[0]).toBeCloseTo(0.05, 12);
    // The average by brute force at an arbitrary point.
    const x = 1.95;
    let avg = 0;
    const n = 100000;
    for (let i = 0; i < n; i++) avg += shape.value(x - 0.1 + ((i + 0.5) * 0.2) / n) / n;
    soft.at(x, out);
    expect(out[0]).toBeCloseTo(avg, 8);
    expect(soft.kinks).toEqual([1.9, 2.1, 1.95, 2.15].map((k) => expect.closeTo(k, 12)));
    const bump = eventProfile(halfSine(0.05, 0.5, 3), 0.15);
    bump.at(3.25, out);
    expect(out[0]).toBeLessThan(0.05);
    expect(out[0]).toBeGreaterThan(0.045);
  });
});

describe('periodic roads', () => {
  it('a sine fades in over two wavelengths, then holds its amplitude; rate is consistent', () => {
    const r = built({ kind: 'sine', amplitude: 0.01, wavelength: 5 }, 10, 10);
    expect(z(r, 0)).toBe(0);
    // Fully faded in after 10 m (1 s): z = A sin(2π x/λ).
    for (const t of [1.3, 2.77, 5.5]) {
      expect(z(r, t)).toBeCloseTo(0.01 * Math.sin((2 * Math.PI * 10 * t) / 5), 12);
      expect(zd(r, t)).toBeCloseTo(slope(r, t), 6);
    }
    expect(zd(r, 0.4)).toBeCloseTo(slope(r, 0.4), 6);
  });

  it('a sweep runs through its frequencies in time and is level after it', () => {
    const r = built({ kind: 'sweep', amplitude: 0.005, startFrequency: 1, endFrequency: 16, duration: 8, law: 'log' }, 20, 10);
    // Count zero crossings in a window: the local frequency of a log sweep is f0·(f1/f0)^(t/T).
    const crossingsIn = (a: number, b: number) => {
      let c = 0;
      let prev = z(r, a);
      for (let t = a + 1e-4; t <= b; t += 1e-4) {
        const v = z(r, t);
        if (v * prev < 0) c++;
        prev = v;
      }
      return c;
    };
    // Between 4 and 5 s the frequency runs from 4 Hz to 16^(5/8) ≈ 5.66 Hz: the phase advance is
    // ∫f dt = T/ln16·(f(5) − f(4)) ≈ 4.78 cycles, so 9 or 10 crossings.
    const c = crossingsIn(4, 5);
    expect(c).toBeGreaterThanOrEqual(9);
    expect(c).toBeLessThanOrEqual(10);
    expect(Math.abs(z(r, 3.3))).toBeLessThanOrEqual(0.005);
    expect(z(r, 9)).toBe(0);
    expect(r.breakpoints).toEqual([8]);
    for (const t of [0.5, 3.3, 7.95]) expect(zd(r, t)).toBeCloseTo(slope(r, t), 5);
  });

  it('a constant-velocity sweep shrinks the displacement as the frequency rises', () => {
    const r = built({ kind: 'sweep', velocityAmplitude: 0.2, startFrequency: 2, endFrequency: 20, duration: 10, law: 'linear' }, 20, 10);
    let early = 0;
    let late = 0;
    for (let t = 2; t < 3; t += 1e-3) early = Math.max(early, Math.abs(zd(r, t)));
    for (let t = 8; t < 9; t += 1e-3) late = Math.max(late, Math.abs(zd(r, t)));
    // Peak road velocity stays near 0.2 m/s at both ends of the sweep (within 5 %).
    expect(early).toBeGreaterThan(0.19);
    expect(early).toBeLessThan(0.21);
    expect(late).toBeGreaterThan(0.19);
    expect(late).toBeLessThan(0.21);
  });
});

describe('measured roads', () => {
  const points = Array.from({ length: 2001 }, (_, i) => [i * 0.1, 0.002 * i * 0.1 + 0.01 * Math.sin(i * 0.1)] as [number, number]);

  it('removes the grade, starts at zero and follows the profile', () => {
    const r = built({ kind: 'measured', points }, 10, 15);
    expect(z(r, 0)).toBe(0);
    // Detrended: the 0.2 % grade no longer climbs over 150 m.
    expect(Math.abs(z(r, 15) - z(r, 0))).toBeLessThan(0.03);
    expect(zd(r, 7.7)).toBeCloseTo(slope(r, 7.7), 5);
    expect(r.summary.length).toBeCloseTo(200, 9);
    expect(r.summary.spacing).toBeCloseTo(0.1, 12);
  });

  it('refuses a run longer than the profile, saying how long it may be', () => {
    const b = buildRoad(Road.parse({ kind: 'measured', points }), 20, 60);
    expect(b.ok).toBe(false);
    if (!b.ok) expect(b.reason).toMatch(/200\.0 m long.*1200\.0 m.*at most 10\.00 s/);
  });
});
