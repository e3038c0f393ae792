import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Damper, GasCharge } from '../schemas/setup.ts';
import { compileDamperForce, compileGasChange, compileTableForce } from './damper-compiled.ts';
import { damperForce, tableForce } from './damper-force.ts';
import { gasForce } from './damper-gas.ts';

// The compiled copies must equal the reference laws they copy; the reference laws have their own tests.
const damper = Damper.parse({
  compression: [[0.05, 100], [0.1, 150], [0.3, 250]],
  rebound: [[0, 0], [0.05, 200], [0.2, 500]],
});

describe('compiled damper law', () => {
  it('equals the table law at any velocity', () => {
    const fast = compileDamperForce(damper);
    fc.assert(
      fc.property(fc.double({ min: -3, max: 3, noNaN: true }), (v) => Math.abs(fast(v) - damperForce(damper, v)) <= 1e-9 * (1 + Math.abs(damperForce(damper, v)))),
    );
  });

  it('gives exactly zero force at rest in both directions', () => {
    const fast = compileDamperForce(damper);
    expect(fast(0)).toBe(0);
    // Just either side of rest the force is the first segment's slope times the speed, no offset.
    expect(fast(1e-12)).toBeCloseTo(2000 * 1e-12, 20);
    expect(fast(-1e-12)).toBeCloseTo(-4000 * 1e-12, 20);
  });

  it('a compiled stop table equals the table law at any deflection', () => {
    const stop = [[0.005, 500], [0.015, 4000], [0.025, 15000]] as const;
    const fast = compileTableForce(stop);
    fc.assert(fc.property(fc.double({ min: 0, max: 0.05, noNaN: true }), (x) => Math.abs(fast(x) - tableForce(stop, x)) <= 1e-9 * (1 + tableForce(stop, x))));
  });
});

describe('compiled gas change', () => {
  const gas = GasCharge.parse({ pressure: 1.5e6, rodArea: 2e-4, polytropic: { volume: 1e-4, exponent: 1.3 } });

  it('is null when the gas force is constant', () => {
    expect(compileGasChange(GasCharge.parse({ force: 250 }))).toBeNull();
    expect(compileGasChange(undefined)).toBeNull();
  });

  it('matches the law within 1e-6 of the force inside the table', () => {
    const change = compileGasChange(gas)!;
    for (let x = -0.3; x <= 0.3; x += 0.00737) {
      expect(Math.abs(change(x) - (gasForce(gas, x) - 300))).toBeLessThan(1e-6 * gasForce(gas, x));
    }
  });

  it('falls back to the law outside the table', () => {
    const change = compileGasChange(gas)!;
    expect(change(-0.6)).toBeCloseTo(gasForce(gas, -0.6) - 300, 9);
  });
});
