import type { Damper, GasCharge } from '../schemas/setup.ts';
import type { ForceTable } from './damper-force.ts';
import { gasForce, MIN_VOLUME_SHARE, staticGasForce } from './damper-gas.ts';

/**
 * Copies of the damper, stop and gas laws prepared once per run for the equations of motion,
 * which call them millions of times: typed arrays, no allocation per call. The plain laws in
 * damper-force.ts and damper-gas.ts stay the reference; the tests hold these equal to them.
 */

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

function compileTable(table: ForceTable): CompiledTable {
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
export function compileTableForce(table: ForceTable): (x: number) => number {
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

/** Slope lookup on a compiled table (the segment `compiledLookup` would use). */
function compiledSlope(t: CompiledTable): (x: number) => number {
  const { v, s } = t;
  const last = v.length - 1;
  return (x) => {
    let i = 0;
    while (i < last && x > v[i]) i++;
    return s[i];
  };
}

/**
 * Slope dF/dv of the compiled damper law at a signed velocity (the slope of the segment the
 * force is read from), for the top-mount solve, which needs the force's derivative.
 */
export function compileDamperSlope(damper: Pick<Damper, 'compression' | 'rebound'>): (velocity: number) => number {
  const c = compiledSlope(compileTable(damper.compression));
  const r = compiledSlope(compileTable(damper.rebound));
  return (velocity) => (velocity >= 0 ? c(velocity) : r(-velocity));
}
