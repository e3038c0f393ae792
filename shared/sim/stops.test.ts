import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EndStop } from '../schemas/setup.ts';
import { bumpStopForce, compileStop, reboundStopForce, stopLawEnergy, stopLawForce } from './stops.ts';

const poly = EndStop.parse({ clearance: 0.05, law: { kind: 'polynomial', coefficients: [20000, 0, 4e7] } });
const table = EndStop.parse({ clearance: 0.07, law: { kind: 'table', points: [[0.005, 1500], [0.01, 5000], [0.02, 20000]] } });

describe('end stops', () => {
  it('push nothing inside the clearance', () => {
    expect(bumpStopForce(poly, 0.049)).toBe(0);
    expect(reboundStopForce(table, -0.069)).toBe(0);
    expect(bumpStopForce(undefined, 0.2)).toBe(0);
  });

  it('the polynomial law is c1·δ + c2·δ² + c3·δ³ beyond the clearance', () => {
    // δ = 0.02 m: 20000·0.02 + 4e7·0.02³ = 400 + 320 N.
    expect(bumpStopForce(poly, 0.07)).toBeCloseTo(720, 9);
  });

  it('the table law interpolates and extrapolates like a damper table', () => {
    expect(reboundStopForce(table, -0.0775)).toBeCloseTo(1500 + 3500 * 0.5, 9);
    // Past the last point: slope 15000 N / 0.01 m.
    expect(reboundStopForce(table, -0.1)).toBeCloseTo(20000 + 1.5e6 * 0.01, 6);
  });

  it('the compiled stops equal the reference law at any travel', () => {
    const b = compileStop(poly, 'bump')!;
    const r = compileStop(table, 'rebound')!;
    fc.assert(
      fc.property(fc.double({ min: -0.2, max: 0.2, noNaN: true }), (x) => {
        return Math.abs(b(x) - bumpStopForce(poly, x)) <= 1e-9 * (1 + bumpStopForce(poly, x)) && Math.abs(r(x) - reboundStopForce(table, x)) <= 1e-9 * (1 + reboundStopForce(table, x));
      }),
    );
  });

  it('stored energy is the integral of the force', () => {
    for (const stop of [poly, table]) {
      const d = 0.025;
      let e = 0;
      const n = 20000;
      for (let i = 0; i < n; i++) e += (stopLawForce(stop.law, ((i + 0.5) * d) / n) * d) / n;
      expect(stopLawEnergy(stop.law, d)).toBeCloseTo(e, 3);
    }
  });
});
