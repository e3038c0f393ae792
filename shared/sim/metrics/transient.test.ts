import { describe, expect, it } from 'vitest';
import { vdv } from './iso2631.ts';
import { mtvv, settleBand, settlingTime } from './transient.ts';

const dt = 1 / 1000;
const samples = (seconds: number) => new Float64Array(Math.round(seconds / dt));

describe('MTVV, ISO 2631-1:1997 §6.3.1 formulas (4)/(5) (from memory), τ = 1 s', () => {
  it('a rectangular pulse shorter than τ: MTVV = A·√(D/τ)', () => {
    // Hand working: a pulse of A = 4 m/s² lasting D = 0.25 s inside 5 s of zeros. Any 1 s window
    // holding the whole pulse integrates A²·D = 16 · 0.25 = 4 (m/s²)²·s; divided by τ = 1 s and
    // rooted: √4 = 2 m/s² = A·√(D/τ). Windows holding part of it give less, so the maximum is 2.
    const a = samples(5);
    a.fill(4, 2000, 2250);
    expect(mtvv(a, dt)).toBeCloseTo(2, 9);
  });

  it('a constant-amplitude sine burst longer than τ with whole cycles per second: MTVV = A/√2', () => {
    // Hand working: 3 s of a 5 Hz sine of amplitude A = 1.5 m/s² inside 6 s of zeros. A 1 s window
    // inside the burst holds 5 whole cycles, over which the mean of sin² is 1/2, so the running
    // RMS there is A/√2 = 1.0607 m/s²; no window holds more of the burst than that.
    const a = samples(6);
    for (let i = 1000; i < 4000; i++) a[i] = 1.5 * Math.sin(2 * Math.PI * 5 * i * dt);
    expect(mtvv(a, dt)).toBeCloseTo(1.5 / Math.SQRT2, 6);
  });

  it('ignores what lies before the analysed part', () => {
    const a = samples(4);
    a.fill(10, 0, 500);
    a.fill(1, 2000, 3000);
    expect(mtvv(a, dt, 1000)).toBeCloseTo(1, 9);
  });
});

describe('VDV of a known signal', () => {
  it('a sine of amplitude A over T (whole cycles): VDV = A·(3T/8)^¼', () => {
    // ∫₀ᵀ A⁴ sin⁴(ωt) dt = A⁴·3T/8 over whole cycles (the mean of sin⁴ is 3/8; handbook integral).
    const a = samples(8);
    for (let i = 0; i < a.length; i++) a[i] = 2 * Math.sin(2 * Math.PI * 4 * i * dt);
    expect(vdv(a, dt)).toBeCloseTo(2 * Math.pow((3 * 8) / 8, 0.25), 6);
  });
});

describe('settling time after an event', () => {
  it('band is 5 % of the peak with a 0.05 m/s² floor', () => {
    expect(settleBand(10)).toBeCloseTo(0.5, 12);
    expect(settleBand(0.2)).toBe(0.05);
  });

  it('counts from the end of the event to the sample after the last one outside the band', () => {
    // An exponentially decaying 1.5 Hz ring after an event ending at 1 s: e^(−t/0.4) falls to
    // 5 % of its start at t = 0.4·ln 20 = 1.198 s; the last crossing outside the band is at or
    // just before that.
    const a = samples(6);
    for (let i = 1000; i < a.length; i++) {
      const t = i * dt - 1;
      a[i] = 3 * Math.exp(-t / 0.4) * Math.cos(2 * Math.PI * 1.5 * t);
    }
    const time = settlingTime(a, dt, 1, settleBand(3));
    expect(time).not.toBeNull();
    expect(time!).toBeGreaterThan(0.8);
    expect(time!).toBeLessThanOrEqual(0.4 * Math.log(20) + dt);
  });

  it('is null when the run ends outside the band, 0 when nothing leaves it after the event', () => {
    const ringing = samples(2).fill(1);
    expect(settlingTime(ringing, dt, 0.5, 0.1)).toBeNull();
    const quiet = samples(2);
    quiet.fill(2, 100, 200);
    expect(settlingTime(quiet, dt, 0.5, 0.1)).toBe(0);
  });
});
