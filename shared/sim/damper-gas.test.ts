import { describe, expect, it } from 'vitest';
import { GasCharge } from '../schemas/setup.ts';
import { gasForce, staticGasForce } from './damper-gas.ts';

// Expected values from the polytropic gas law p·V^n = const (textbook thermodynamics), worked by hand.
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

  it('floors the compressed volume at 5 % of the static volume', () => {
    // x = 1 m would leave a negative volume; the floor holds V at 5e-6 m³, F = 300·20^1.3.
    expect(gasForce(gas, 1)).toBeCloseTo(300 * 20 ** 1.3, 6);
  });

  it('is constant without the polytropic part, and zero without a charge', () => {
    const plain = GasCharge.parse({ force: 250 });
    expect(gasForce(plain, 0.08)).toBe(250);
    expect(gasForce(undefined, 0.08)).toBe(0);
    expect(staticGasForce(undefined)).toBe(0);
  });
});
