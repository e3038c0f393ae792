import { describe, expect, it } from 'vitest';
import { Damper, DamperCurve } from '../schemas/setup.ts';
import { curveFromParameters, parametricForce, scaleDamper, splitDamper, type CurveParameters } from './damper-builder.ts';
import { equivalentDampingLeastSquares } from './damper-equivalent.ts';
import { curveForce } from './damper-force.ts';

const base = { lowSpeedSlope: 4000, kneeVelocity: 0.06, highSpeedSlope: 1200 };
const shapes = (['digressive', 'linear', 'progressive'] as const).map((shape): CurveParameters => ({ ...base, shape }));

describe('parametric damper curves', () => {
  it('all shapes follow the bleed slope up to the knee', () => {
    for (const p of shapes) {
      expect(parametricForce(p, 0.03)).toBeCloseTo(120, 9);
      expect(parametricForce(p, 0.06)).toBeCloseTo(240, 9);
    }
  });

  it('above the knee digressive lies below linear and progressive above it', () => {
    const [dig, lin, pro] = shapes;
    for (const v of [0.1, 0.2, 0.5, 1]) {
      expect(parametricForce(dig, v)).toBeLessThan(parametricForce(lin, v));
      expect(parametricForce(pro, v)).toBeGreaterThan(parametricForce(lin, v));
    }
    expect(parametricForce(lin, 0.26)).toBeCloseTo(240 + 1200 * 0.2, 9);
  });

  it('starts above the knee with the high-speed slope for every shape', () => {
    const h = 1e-7;
    for (const p of shapes) {
      const slope = (parametricForce(p, 0.06 + h) - parametricForce(p, 0.06)) / h;
      expect(slope).toBeCloseTo(1200, 1);
    }
  });

  it('the digressive slope halves three knee speeds past the knee', () => {
    const [dig] = shapes;
    const v = 0.06 + 3 * 0.06;
    const h = 1e-7;
    expect((parametricForce(dig, v + h) - parametricForce(dig, v)) / h).toBeCloseTo(600, 1);
  });

  it('builds a valid table that includes the knee', () => {
    for (const p of shapes) {
      const table = curveFromParameters(p);
      expect(DamperCurve.safeParse(table).success).toBe(true);
      expect(table.some(([v]) => v === 0.06)).toBe(true);
      for (const [v, f] of table) expect(f).toBeCloseTo(parametricForce(p, v), 9);
    }
  });
});

describe('scaling and splitting', () => {
  const d = Damper.parse({
    compression: [[0.05, 100], [0.2, 220], [1, 500]],
    rebound: [[0.05, 250], [0.2, 600], [1, 1300]],
    gas: { force: 200 },
  });

  it('scales both directions and leaves the gas charge', () => {
    const s = scaleDamper(d, 1.5);
    expect(curveForce(s.compression, 0.2)).toBeCloseTo(330, 9);
    expect(curveForce(s.rebound, 0.2)).toBeCloseTo(900, 9);
    expect(s.gas).toEqual(d.gas);
  });

  it('split sets the rebound/compression ratio and keeps the mean coefficient', () => {
    const before = equivalentDampingLeastSquares(d);
    const s = splitDamper(d, 2.5);
    const after = equivalentDampingLeastSquares(s);
    expect(after.rebound / after.compression).toBeCloseTo(2.5, 9);
    expect(after.coefficient).toBeCloseTo(before.coefficient, 9);
  });
});
