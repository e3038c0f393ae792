import { describe, expect, it } from 'vitest';
import { initialScenario, INLINE_ROAD, resolveScenario, switchSpeedUnit } from './scenario.ts';

describe('scenario', () => {
  it('resolves the starting draft to a class C road at 60 km/h for 20 s, in SI', () => {
    const out = resolveScenario(initialScenario(), undefined);
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    expect(out.scenario.speed).toBeCloseTo(60 / 3.6, 12);
    expect(out.scenario.duration).toBe(20);
    expect(out.scenario.road).toMatchObject({ kind: 'iso8608', class: 'C', seed: 7 });
    expect(out.scenario.roadId).toBeNull();
  });

  it('takes m/s as typed and refuses speeds and durations out of range', () => {
    const ok = resolveScenario({ ...initialScenario(), speed: '25', speedUnit: 'm/s' }, undefined);
    expect(ok.ok && ok.scenario.speed).toBe(25);
    const bad = resolveScenario({ ...initialScenario(), speed: '0', duration: '700' }, undefined);
    expect(bad).toEqual({ ok: false, errors: { speed: expect.any(String), duration: expect.any(String) } });
  });

  it('converts the number when the speed unit is switched (60 km/h = 16.6667 m/s = 37.2823 mph; 1 mph = 0.44704 m/s, NIST SP 811)', () => {
    const kmh = { ...initialScenario(), speed: '60' };
    const mps = switchSpeedUnit(kmh, 'm/s');
    expect(mps).toMatchObject({ speed: '16.6667', speedUnit: 'm/s' });
    expect(switchSpeedUnit(kmh, 'mph')).toMatchObject({ speed: '37.2823', speedUnit: 'mph' });
    expect(switchSpeedUnit(mps, 'km/h')).toMatchObject({ speed: '60', speedUnit: 'km/h' });
    const a = resolveScenario(kmh, undefined);
    const b = resolveScenario(mps, undefined);
    expect(a.ok && b.ok && Math.abs(a.scenario.speed - b.scenario.speed)).toBeLessThan(1e-4);
    expect(switchSpeedUnit({ ...kmh, speed: 'fast' }, 'm/s').speed).toBe('fast');
  });

  it('starts in the preferred speed unit with the same 60 km/h', () => {
    expect(initialScenario('mph').speed).toBe('37.2823');
    const out = resolveScenario(initialScenario('m/s'), undefined);
    expect(out.ok && out.scenario.speed).toBeCloseTo(60 / 3.6, 4);
  });

  it('uses a library road with a replacement seed, and waits for it to load', () => {
    const draft = { ...initialScenario(), roadChoice: 'road-1', seed: '42' };
    expect(resolveScenario(draft, undefined)).toMatchObject({ ok: false, errors: { roadChoice: expect.any(String) } });
    const out = resolveScenario(draft, { kind: 'iso8608', class: 'D', seed: 3 } as never);
    expect(out).toMatchObject({ ok: true, scenario: { roadId: 'road-1', seed: 42 } });
  });

  it('puts inline road problems on the road field', () => {
    const out = resolveScenario({ ...initialScenario(), roadChoice: INLINE_ROAD, kind: 'sine', road: { amplitude: 'x', wavelength: '5' } }, undefined);
    expect(out).toEqual({ ok: false, errors: { 'road.amplitude': 'Enter a number' } });
  });
});
