import type { Damper, DamperCurve, GasCharge } from '../schemas/setup.ts';

/**
 * Damper force laws. Sign convention: piston velocity and force are positive in compression
 * (force resisting the wheel moving towards the body); negative velocity is rebound.
 */

type Table = ReadonlyArray<readonly [number, number]>;

/**
 * Force of a table at a speed ≥ 0: piecewise linear from an implied (0, 0), extrapolated past
 * the last point with the last segment's slope. Also used for end-stop tables.
 */
export function tableForce(table: Table, speed: number): number {
  let v0 = 0;
  let f0 = 0;
  for (let i = 0; i < table.length; i++) {
    const [v1, f1] = table[i];
    if (speed <= v1 || i === table.length - 1) {
      if (v1 === v0) return f1;
      return f0 + ((f1 - f0) * (speed - v0)) / (v1 - v0);
    }
    v0 = v1;
    f0 = f1;
  }
  return 0;
}

/** Force of one direction's curve at a piston speed ≥ 0, N. */
export const curveForce = (curve: DamperCurve, speed: number): number => tableForce(curve, speed);

/** Signed damper force at a signed piston velocity (positive = compression), N. */
export function damperForce(damper: Pick<Damper, 'compression' | 'rebound'>, velocity: number): number {
  return velocity >= 0 ? curveForce(damper.compression, velocity) : -curveForce(damper.rebound, -velocity);
}

/** Smallest compressed gas volume allowed, as a share of the static volume (keeps the law finite). */
const MIN_VOLUME_SHARE = 0.05;

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

/** Options of the least-squares equivalent coefficient. */
export interface LeastSquaresRange {
  /** Upper piston speed of the fit, m/s; default 0.3. */
  maxSpeed?: number;
}

/** An equivalent linear damping coefficient at the damper, with the words that define it. */
export interface EquivalentDamping {
  /** Mean of the two directions, N·s/m at the damper. */
  coefficient: number;
  compression: number;
  rebound: number;
  /** One sentence for the UI saying how the figure was obtained. */
  definition: string;
}

/**
 * Least-squares slope through the origin of one table over speeds 0…vMax, treating the table
 * as a continuous curve: c = ∫F·v dv / ∫v² dv. Exact for the piecewise-linear law (each segment
 * is integrated in closed form), so no sampling choice enters the figure.
 */
export function leastSquaresSlope(table: Table, vMax: number): number {
  const knots: Array<[number, number]> = [[0, 0]];
  for (const [v, f] of table) if (v > 0 && v < vMax) knots.push([v, f]);
  knots.push([vMax, tableForce(table, vMax)]);
  let num = 0;
  for (let i = 1; i < knots.length; i++) {
    const [a, fa] = knots[i - 1];
    const [b, fb] = knots[i];
    if (b <= a) continue;
    // ∫_a^b F(v)·v dv with F linear between (a, fa) and (b, fb).
    const s = (fb - fa) / (b - a);
    const f0 = fa - s * a;
    num += (f0 * (b * b - a * a)) / 2 + (s * (b ** 3 - a ** 3)) / 3;
  }
  return num / (vMax ** 3 / 3);
}

/**
 * Equivalent linear coefficient as the least-squares slope through the origin over piston
 * speeds 0…maxSpeed (default 0.3 m/s), averaged over compression and rebound. Averaging the
 * two directions matches the energy a symmetric oscillation dissipates per cycle.
 */
export function equivalentDampingLeastSquares(damper: Damper, range: LeastSquaresRange = {}): EquivalentDamping {
  const vMax = range.maxSpeed ?? 0.3;
  const compression = leastSquaresSlope(damper.compression, vMax);
  const rebound = leastSquaresSlope(damper.rebound, vMax);
  return {
    coefficient: (compression + rebound) / 2,
    compression,
    rebound,
    definition: `least-squares slope through the origin of each curve over 0–${vMax} m/s piston speed, mean of compression and rebound`,
  };
}

/**
 * Equivalent linear coefficient as the secant at a reference piston speed (default 0.1 m/s):
 * c = F(vRef) / vRef per direction, averaged over compression and rebound.
 */
export function equivalentDampingSecant(damper: Damper, referenceSpeed = 0.1): EquivalentDamping {
  const compression = curveForce(damper.compression, referenceSpeed) / referenceSpeed;
  const rebound = curveForce(damper.rebound, referenceSpeed) / referenceSpeed;
  return {
    coefficient: (compression + rebound) / 2,
    compression,
    rebound,
    definition: `secant force/speed at ${referenceSpeed} m/s piston speed, mean of compression and rebound`,
  };
}

/**
 * Segments of a table from an implied origin, ready for fast lookup in the equations of motion.
 * Each segment is anchored at its left end, so the first one gives exactly 0 N at 0 m/s:
 * anchoring at the right end left a rounding-sized force at rest that differed between
 * compression and rebound, a jump odex's stability check could not step across.
 */
interface CompiledTable {
  /** Right end of segment i (the table's velocities). */
  v: Float64Array;
  /** Left end of segment i and the force there. */
  v0: Float64Array;
  f0: Float64Array;
  /** Slope of segment i. */
  s: Float64Array;
}

function compileTable(table: Table): CompiledTable {
  const pts = table[0][0] === 0 ? table.slice(1) : table;
  const n = pts.length;
  const v = new Float64Array(n);
  const v0 = new Float64Array(n);
  const f0 = new Float64Array(n);
  const s = new Float64Array(n);
  let vl = 0;
  let fl = 0;
  for (let i = 0; i < n; i++) {
    v[i] = pts[i][0];
    v0[i] = vl;
    f0[i] = fl;
    s[i] = (pts[i][1] - fl) / (pts[i][0] - vl);
    vl = pts[i][0];
    fl = pts[i][1];
  }
  return { v, v0, f0, s };
}

/** Lookup on a compiled table: the segment ending at the first knot at or above `x`. */
function compiledLookup(t: CompiledTable): (x: number) => number {
  const { v, v0, f0, s } = t;
  const last = v.length - 1;
  return (x) => {
    let i = 0;
    while (i < last && x > v[i]) i++;
    return f0[i] + s[i] * (x - v0[i]);
  };
}

/**
 * The same law as `damperForce`, compiled to typed arrays so the equations of motion allocate
 * nothing per call. Returns the signed damper force at a signed velocity.
 */
export function compileDamperForce(damper: Pick<Damper, 'compression' | 'rebound'>): (velocity: number) => number {
  const c = compiledLookup(compileTable(damper.compression));
  const r = compiledLookup(compileTable(damper.rebound));
  return (velocity) => (velocity >= 0 ? c(velocity) : -r(-velocity));
}

/** Compiled one-sided table (speed or deflection ≥ 0 → force), for end stops. */
export function compileTableForce(table: Table): (x: number) => number {
  return compiledLookup(compileTable(table));
}

/** Damper compression range tabulated for the polytropic law, m either side of static. */
const GAS_TABLE_RANGE = 0.5;
const GAS_TABLE_STEP = 0.001;

/**
 * Change of the gas force from its static value at damper compression x, N, compiled for the
 * equations of motion; `null` when the force is constant (it is then all in the static
 * balance). The polytropic law is tabulated once, with its exact slope, on a 1 mm grid and
 * read by cubic Hermite interpolation (error far below 1e-6 of the force, C¹), because a
 * fractional power per right-hand-side call was the most expensive part of the model.
 */
export function compileGasChange(gas: GasCharge | undefined): ((x: number) => number) | null {
  if (!gas?.polytropic || gas.rodArea === undefined) return null;
  const f0 = staticGasForce(gas);
  const n = gas.polytropic.exponent;
  const a = gas.rodArea;
  const v0 = gas.polytropic.volume;
  const count = Math.round((2 * GAS_TABLE_RANGE) / GAS_TABLE_STEP) + 1;
  const fv = new Float64Array(count);
  const dv = new Float64Array(count);
  for (let i = 0; i < count; i++) {
    const x = -GAS_TABLE_RANGE + i * GAS_TABLE_STEP;
    fv[i] = gasForce(gas, x) - f0;
    const vol = v0 - a * x;
    // d/dx of f0·(V0/V)^n = f0·n·(V0/V)^n·A/V, zero where the volume floor holds.
    dv[i] = vol > MIN_VOLUME_SHARE * v0 ? ((f0 + fv[i]) * n * a) / vol : 0;
  }
  const h = GAS_TABLE_STEP;
  return (x) => {
    const s = (x + GAS_TABLE_RANGE) / h;
    const i = Math.floor(s);
    if (i < 0 || i >= count - 1) return gasForce(gas, x) - f0;
    const u = s - i;
    const u2 = u * u;
    const u3 = u2 * u;
    return (2 * u3 - 3 * u2 + 1) * fv[i] + (u3 - 2 * u2 + u) * h * dv[i] + (-2 * u3 + 3 * u2) * fv[i + 1] + (u3 - u2) * h * dv[i + 1];
  };
}
