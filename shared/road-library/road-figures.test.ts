import { describe, expect, test } from 'vitest';
import { Road } from '../schemas/road.ts';
import { roadFigures } from './road-figures.ts';
import { sampleRoadProfile } from './sample-profile.ts';

const road = (r: unknown) => Road.parse(r);

describe('roadFigures', () => {
  test.each(['B', 'C', 'D'] as const)('an ISO class %s road is fitted back to its own class with waviness near 2', (cls) => {
    const out = roadFigures(road({ kind: 'iso8608', class: cls, seed: 11 }));
    if (!out.ok) throw new Error(out.reason);
    expect(out.figures.iso?.className).toBe(cls);
    // the generated PSD is exact per harmonic; Welch smoothing leaves the slope within ±0.2
    expect(out.figures.iso?.waviness).toBeGreaterThan(1.8);
    expect(out.figures.iso?.waviness).toBeLessThan(2.2);
    expect(out.figures.length).toBeCloseTo(1024, 6);
  });

  test('a measured profile reports its point count, grid step and a fitted class', () => {
    // a class C road sampled at 0.1 m for 400 m, then given as raw points
    const iso = sampleRoadProfile(road({ kind: 'iso8608', class: 'C', seed: 3, length: 400 }));
    if (!iso.ok) throw new Error(iso.reason);
    const points = Array.from(iso.profile.z, (z, i) => [i * iso.profile.step, z] as [number, number]);
    const out = roadFigures(road({ kind: 'measured', points }));
    if (!out.ok) throw new Error(out.reason);
    expect(out.figures.points).toBe(points.length);
    expect(out.figures.spacing).toBeCloseTo(iso.profile.step, 9);
    expect(out.figures.iso?.className).toBe('C');
  });

  test('a short measured profile saves without a class and says why', () => {
    const points = Array.from({ length: 20 }, (_, i) => [i * 0.5, Math.sin(i) * 0.01] as [number, number]);
    const out = roadFigures(road({ kind: 'measured', points }));
    if (!out.ok) throw new Error(out.reason);
    expect(out.figures.iso).toBeNull();
    expect(out.figures.note).toMatch(/too short/);
  });

  test('events have a length and no spectral figures; a sweep has no length', () => {
    const bump = roadFigures(road({ kind: 'bump', height: 0.05, length: 0.5, at: 10 }));
    if (!bump.ok) throw new Error(bump.reason);
    expect(bump.figures.iso).toBeNull();
    expect(bump.figures.spacing).toBeNull();
    expect(bump.figures.length).toBeGreaterThan(0.5);
    const sweep = roadFigures(road({ kind: 'sweep', amplitude: 0.01, startFrequency: 0.5, endFrequency: 20, duration: 30 }));
    if (!sweep.ok) throw new Error(sweep.reason);
    expect(sweep.figures.length).toBeNull();
  });
});

describe('sampleRoadProfile', () => {
  test('a bump preview reaches the bump height at its middle and is level at the ends', () => {
    const out = sampleRoadProfile(road({ kind: 'bump', height: 0.04, length: 1, at: 5 }));
    if (!out.ok) throw new Error(out.reason);
    const { z } = out.profile;
    expect(Math.max(...z)).toBeCloseTo(0.04, 4);
    expect(z[0]).toBe(0);
    expect(z[z.length - 1]).toBe(0);
  });

  test('a kerb preview ends at the step height', () => {
    const out = sampleRoadProfile(road({ kind: 'kerb', height: -0.08, rampLength: 0.1, at: 3 }));
    if (!out.ok) throw new Error(out.reason);
    expect(out.profile.z[out.profile.z.length - 1]).toBeCloseTo(-0.08, 9);
  });
});
