import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Damper, DamperCurve, GasCharge } from '../schemas/setup.ts';
import {
  compileDamperForce,
  compileGasChange,
  curveForce,
  damperForce,
  equivalentDampingLeastSquares,
  equivalentDampingSecant,
  gasForce,
  leastSquaresSlope,
  staticGasForce,
} from './damper.ts';

const damper = Damper.parse({
  compression: [[0.05, 100], [0.1, 150], [0.3, 250]],
  rebound: [[0, 0], [0.05, 200], [0.2, 500]],
});

describe('damper table', () => {
  it('interpolates linearly between points, from an implied origin', () => {
    expect(curveForce(damper.compression, 0.025)).toBeCloseTo(50, 12);
    expect(curveForce(damper.compression, 0.075)).toBeCloseTo(125, 12);
    expect(curveForce(damper.compression, 0.2)).toBeCloseTo(200, 12);
    expect(curveForce(damper.rebound, 0.1)).toBeCloseTo(300, 12);
  });

  it('extrapolates past the last point with the last slope', () => {
    // Last compression segment: 100 N over 0.2 m/s = 500 N·s/m.
    expect(curveForce(damper.compression, 0.5)).toBeCloseTo(350, 12);
    // Last rebound segment: 300 N over 0.15 m/s = 2000 N·s/m.
    expect(curveForce(damper.rebound, 0.3)).toBeCloseTo(700, 12);
  });

  it('a single point is a straight line through the origin', () => {
    const c = DamperCurve.parse([[0.5, 1000]]);
    expect(curveForce(c, 0.1)).toBeCloseTo(200, 12);
    expect(curveForce(c, 2)).toBeCloseTo(4000, 12);
  });

  it('signs force with velocity: compression positive, rebound negative', () => {
    expect(damperForce(damper, 0.1)).toBeCloseTo(150, 12);
    expect(damperForce(damper, -0.1)).toBeCloseTo(-300, 12);
    expect(damperForce(damper, 0)).toBe(0);
  });

  it('the compiled law equals the table law at any velocity', () => {
    const fast = compileDamperForce(damper);
    fc.assert(
      fc.property(fc.double({ min: -3, max: 3, noNaN: true }), (v) => Math.abs(fast(v) - damperForce(damper, v)) <= 1e-9 * (1 + Math.abs(damperForce(damper, v)))),
    );
  });
});

describe('gas force', () => {
  const gas = GasCharge.parse({ pressure: 1.5e6, rodArea: 2e-4, polytropic: { volume: 1e-4, exponent: 1.3 } });

  it('is pressure × rod area at the static position', () => {
    expect(staticGasForce(gas)).toBeCloseTo(300, 9);
    expect(gasForce(gas, 0)).toBeCloseTo(300, 9);
  });

  it('follows the polytropic law with stroke', () => {
    // x = 0.1 m: V = 1e-4 − 2e-5 = 8e-5 m³, F = 300·(1e-4/8e-5)^1.3.
    expect(gasForce(gas, 0.1)).toBeCloseTo(300 * 1.25 ** 1.3, 9);
    expect(gasForce(gas, -0.1)).toBeCloseTo(300 * (1 / 1.2) ** 1.3, 9);
  });

  it('is constant without the polytropic part', () => {
    const plain = GasCharge.parse({ force: 250 });
    expect(gasForce(plain, 0.08)).toBe(250);
    expect(compileGasChange(plain)).toBeNull();
  });

  it('the tabulated change matches the law within 1e-6 of the force', () => {
    const change = compileGasChange(gas)!;
    for (let x = -0.3; x <= 0.3; x += 0.00737) {
      expect(Math.abs(change(x) - (gasForce(gas, x) - 300))).toBeLessThan(1e-6 * gasForce(gas, x));
    }
  });
});

describe('equivalent linear coefficient', () => {
  it('least squares of a straight line is its slope', () => {
    expect(leastSquaresSlope([[1, 2500]], 0.3)).toBeCloseTo(2500, 9);
  });

  it('least squares equals the closed form for a two-slope curve', () => {
    // F = 4000·v up to 0.05 m/s, then 200 + 1000·(v − 0.05) = 150 + 1000·v.
    // ∫0^0.3 F v dv = 4000·0.05³/3 + ∫0.05^0.3 (150 + 1000 v) v dv, divided by 0.3³/3.
    const table = [[0.05, 200], [0.3, 450]] as const;
    const num = (4000 * 0.05 ** 3) / 3 + (150 * (0.3 ** 2 - 0.05 ** 2)) / 2 + (1000 * (0.3 ** 3 - 0.05 ** 3)) / 3;
    expect(leastSquaresSlope(table, 0.3)).toBeCloseTo(num / (0.3 ** 3 / 3), 9);
  });

  it('averages compression and rebound and states its definition', () => {
    const d = Damper.parse({ compression: [[1, 1000]], rebound: [[1, 3000]] });
    const ls = equivalentDampingLeastSquares(d);
    expect(ls.coefficient).toBeCloseTo(2000, 9);
    expect(ls.definition).toMatch(/least-squares.*0–0.3 m\/s/);
    const sec = equivalentDampingSecant(damper, 0.1);
    expect(sec.compression).toBeCloseTo(1500, 9);
    expect(sec.rebound).toBeCloseTo(3000, 9);
    expect(sec.coefficient).toBeCloseTo(2250, 9);
    expect(sec.definition).toMatch(/secant.*0.1 m\/s/);
  });
});
