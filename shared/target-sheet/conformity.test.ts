import { describe, expect, it } from 'vitest';
import { ConformityReport, type TargetPoint } from '../schemas/target-sheet.ts';
import { checkConformity, checkDirection } from './conformity.ts';

// Hand-made sheet: 10 % with a 20 N floor. Bands: 0.05 m/s 150 ± 20 (floor), 0.1 m/s 400 ± 40, 0.3 m/s 800 ± 80.
const targets: TargetPoint[] = [
  { velocity: 0.05, force: 150, tolPct: 10, floorN: 20 },
  { velocity: 0.1, force: 400, tolPct: 10, floorN: 20 },
  { velocity: 0.3, force: 800, tolPct: 10, floorN: 20 },
];

describe('checkDirection', () => {
  it('passes points measured exactly at the speeds and exactly on the band edges', () => {
    const r = checkDirection(targets, [
      { velocity: 0.05, force: 170 }, // upper edge, floor governs
      { velocity: 0.1, force: 360 }, // lower edge
      { velocity: 0.3, force: 880 }, // upper edge
    ]);
    expect(r.points.map((p) => p.pass)).toEqual([true, true, true]);
    expect(r.points[0]).toMatchObject({ lower: 130, upper: 170, measured: 170, deviation: 20, verdict: 'within' });
    expect(r.points[0].deviationPct).toBeCloseTo(13.333333, 5);
    expect(r.points[1].deviationPct).toBeCloseTo(-10, 12);
    expect(r.pass).toBe(true);
  });

  it('passes just inside and fails just outside, saying which side', () => {
    const inside = checkDirection(targets, [
      { velocity: 0.05, force: 169.9 },
      { velocity: 0.1, force: 360.1 },
      { velocity: 0.3, force: 879.9 },
    ]);
    expect(inside.pass).toBe(true);
    const outside = checkDirection(targets, [
      { velocity: 0.05, force: 170.1 },
      { velocity: 0.1, force: 359.9 },
      { velocity: 0.3, force: 880.1 },
    ]);
    expect(outside.points.map((p) => p.verdict)).toEqual(['above', 'below', 'above']);
    expect(outside.points[1].deviation).toBeCloseTo(-40.1, 9);
    expect(outside.pass).toBe(false);
  });

  it('floor dominates at low speed: 14 % off passes at 0.05 m/s where 10 % would not', () => {
    const r = checkDirection([targets[0]], [{ velocity: 0.05, force: 129 }, { velocity: 0.06, force: 171 }]);
    expect(r.points[0].verdict).toBe('below'); // 129 < 130
    const ok = checkDirection([targets[0]], [{ velocity: 0.05, force: 131 }, { velocity: 0.06, force: 171 }]);
    expect(ok.points[0]).toMatchObject({ pass: true, measured: 131 });
    expect(ok.points[0].deviationPct).toBeCloseTo(-12.666667, 5);
  });

  it('interpolates linearly between measured points and averages repeats', () => {
    const r = checkDirection([targets[1]], [
      { velocity: 0.08, force: 300 },
      { velocity: 0.12, force: 500 },
      { velocity: 0.12, force: 460 },
    ]);
    // between (0.08, 300) and (0.12, 480): 300 + 180 · 0.5 = 390
    expect(r.points[0].measured).toBeCloseTo(390, 9);
    expect(r.points[0].pass).toBe(true);
  });

  it('fails a reference speed outside the measured range as not measured', () => {
    const r = checkDirection(targets, [
      { velocity: 0.06, force: 240 },
      { velocity: 0.2, force: 800 }, // 400 N at 0.1 m/s
    ]);
    expect(r.points.map((p) => p.verdict)).toEqual(['not-measured', 'within', 'not-measured']);
    expect(r.points[0]).toMatchObject({ measured: null, deviation: null, deviationPct: null, pass: false });
  });
});

describe('checkConformity', () => {
  const sheet = { compression: targets, rebound: targets.map((t) => ({ ...t, force: 2 * t.force })) };
  const good = { compression: targets.map((t) => ({ velocity: t.velocity, force: t.force })), rebound: targets.map((t) => ({ velocity: t.velocity, force: 2 * t.force })) };

  it('gives a pass verdict only when every damper passes both directions', () => {
    const bad = { ...good, rebound: good.rebound.map((p, i) => (i === 2 ? { ...p, force: p.force * 1.2 } : p)) };
    const r = checkConformity(sheet, [
      { label: 'PF-0143', peaks: good },
      { label: 'PF-0144', peaks: bad },
    ]);
    expect(ConformityReport.safeParse(r).success).toBe(true);
    expect(r.dampers.map((d) => d.pass)).toEqual([true, false]);
    expect(r.dampers[1].compression.pass).toBe(true);
    expect(r.dampers[1].rebound.points[2]).toMatchObject({ verdict: 'above', deviationPct: expect.closeTo(20, 9) });
    expect(r).toMatchObject({ verdict: 'fail', passed: 1, failed: 1 });
    expect(checkConformity(sheet, [{ label: 'PF-0143', peaks: good }]).verdict).toBe('pass');
  });
});
