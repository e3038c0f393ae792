import type { GasCharge } from '../schemas/setup.ts';

/** Smallest compressed gas volume allowed, as a share of the static volume (keeps the law finite). */
export const MIN_VOLUME_SHARE = 0.05;

/**
 * Gas force pushing the rod out at damper compression `x` from the static ride position, N.
 * Without `polytropic` it is a constant preload; with it F = p0·A·(V0 / (V0 − A·x))^n, the
 * compressed volume floored at 5 % of V0 (the damper would have bottomed long before).
 */
export function gasForce(gas: GasCharge | undefined, x: number): number {
  if (!gas) return 0;
  const f0 = staticGasForce(gas);
  if (!gas.polytropic || gas.rodArea === undefined) return f0;
  const v0 = gas.polytropic.volume;
  const v = Math.max(v0 - gas.rodArea * x, MIN_VOLUME_SHARE * v0);
  return f0 * (v0 / v) ** gas.polytropic.exponent;
}

/** Gas force at the static ride position, N. */
export function staticGasForce(gas: GasCharge | undefined): number {
  if (!gas) return 0;
  if (gas.force !== undefined) return gas.force;
  return (gas.pressure ?? 0) * (gas.rodArea ?? 0);
}
