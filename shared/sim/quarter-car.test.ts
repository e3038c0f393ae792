import { readFileSync } from 'node:fs';
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { Setup, type SetupInput } from '../schemas/setup.ts';
import { integrateCorner } from './integrate.ts';
import { cornerModel, endOfStrokeRate, GRAVITY, linearCorner, newCornerForces, staticEquilibrium, wheelRate } from './quarter-car.ts';
import type { RoadExcitation } from './roads/excitation.ts';
import { stopLawEnergy } from './stops.ts';

const example = (name: string): SetupInput => JSON.parse(readFileSync(new URL(`../../examples/${name}`, import.meta.url), 'utf8'));
const pipit = Setup.parse(example('pipit-front.setup.json'));
const level: RoadExcitation = {
  sample(_t, out) {
    out[0] = 0;
    out[1] = 0;
  },
  breakpoints: [],
  summary: { kind: 'bump', name: 'level road', distance: 0 },
};
const statics = (s: Setup) => {
  const r = staticEquilibrium(s);
  if (!r.ok) throw new Error(r.reason);
  return r.state;
};

describe('static equilibrium', () => {
  it('sag is load over stiffness, with the wheel rate k·MR² and the gas share removed', () => {
    const st = statics(pipit);
    // Pipit front: ms 310 kg, mu 38 kg, k 32 000 N/m, MR 0.95, kt 210 000 N/m, gas 1.2 MPa × 2.01e-4 m².
    const gasAtWheel = 0.95 * 1.2e6 * 2.01e-4;
    expect(wheelRate(pipit)).toBeCloseTo(32000 * 0.95 ** 2, 9);
    expect(st.springForceAtWheel).toBeCloseTo(310 * 9.81 - gasAtWheel, 9);
    expect(st.springDeflection).toBeCloseTo((310 * 9.81 - gasAtWheel) / (32000 * 0.9025), 12);
    expect(st.tyreDeflection).toBeCloseTo((348 * 9.81) / 210000, 12);
    expect(st.bodySag).toBeCloseTo(st.springDeflection + st.tyreDeflection, 12);
    // Virtual work: the spring itself is compressed MR times the wheel deflection and pushes k times that.
    const springForce = 32000 * st.springDeflection * 0.95;
    expect(springForce * 0.95).toBeCloseTo(st.springForceAtWheel, 9);
  });

  it('refuses a gas charge that would lift the body', () => {
    const s = Setup.parse({ ...example('pipit-front.setup.json'), damper: { ...pipit.damper, gas: { force: 4000 } } });
    const r = staticEquilibrium(s);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(/^damper\.gas/);
  });

  it('at static equilibrium nothing accelerates and the tyre carries (ms + mu)·g', () => {
    const st = statics(pipit);
    const f = newCornerForces();
    cornerModel(pipit, st).evaluate(0, 0, 0, 0, 0, 0, f);
    expect(f.bodyAccel).toBe(0);
    expect(Math.abs(f.wheelAccel)).toBeLessThan(1e-12);
    expect(f.tyreLoad).toBeCloseTo(348 * GRAVITY, 9);
  });

  it('released with spring and tyre unloaded, the corner falls at g and settles at its sag', () => {
    // No gas, no stops and no stroke: at the unloaded position the rebound stop and the
    // extension end of the stroke would be engaged.
    const { bumpStop: _b, reboundStop: _r, stroke: _s, ...plain } = example('pipit-front.setup.json');
    const s = Setup.parse({ ...plain, damper: { ...pipit.damper, gas: undefined } });
    const st = statics(s);
    const model = cornerModel(s, st);
    const f = newCornerForces();
    model.evaluate(st.bodySag, 0, st.wheelSag, 0, 0, 0, f);
    expect(f.bodyAccel).toBeCloseTo(-GRAVITY, 9);
    expect(f.wheelAccel).toBeCloseTo(-GRAVITY, 9);
    const run = integrateCorner(model, level, { duration: 15, outputRate: 200, tolerance: 1e-8, initial: [st.bodySag, 0, st.wheelSag, 0] });
    if (!run.ok) throw new Error(run.reason);
    const last = run.trace.travel.length - 1;
    expect(Math.abs(run.trace.travel[last])).toBeLessThan(1e-6);
    expect(run.trace.tyreLoad[last]).toBeCloseTo(348 * GRAVITY, 2);
  });
});

describe('free decay on a level road', () => {
  it('total energy never increases with positive damping, through stop contact and lift-off', () => {
    // Asymmetric tabled damper, tyre damping, bump and rebound stops; no gas (its preload
    // would need its own potential). Released 70 mm compressed (15 mm into the bump stop)
    // with the wheel thrown upwards hard enough to leave the road.
    const s = Setup.parse({ ...example('pipit-front.setup.json'), damper: { ...pipit.damper, gas: undefined } });
    const st = statics(s);
    const kw = wheelRate(s);
    const kt = s.tyreRate;
    const run = integrateCorner(cornerModel(s, st), level, { duration: 4, outputRate: 2000, tolerance: 1e-9, initial: [-0.07, 0, 0, 3], recordStates: true });
    if (!run.ok) throw new Error(run.reason);
    const { bodyDisplacement: zs, bodyVelocity: vs, wheelDisplacement: zu, wheelVelocity: vu } = run.states!;
    // Absolute energy: kinetic, spring (preloaded by d0), tyre (only while compressed), gravity, stops.
    const energy = (i: number) => {
      const x = zu[i] - zs[i];
      return (
        0.5 * s.sprungMass * vs[i] ** 2 +
        0.5 * s.unsprungMass * vu[i] ** 2 +
        0.5 * kw * (st.springDeflection + x) ** 2 +
        0.5 * kt * Math.max(0, st.tyreDeflection - zu[i]) ** 2 +
        GRAVITY * (s.sprungMass * zs[i] + s.unsprungMass * zu[i]) +
        stopLawEnergy(s.bumpStop!.law, x - s.bumpStop!.clearance) +
        stopLawEnergy(s.reboundStop!.law, -x - s.reboundStop!.clearance) +
        // the hard limits at the ends of the stroke store ½·k·δ² beyond each end
        0.5 * endOfStrokeRate(s) * (Math.max(0, x - s.stroke!.compression) ** 2 + Math.max(0, -x - s.stroke!.extension) ** 2)
      );
    };
    const atRest = 0.5 * kw * st.springDeflection ** 2 + 0.5 * kt * st.tyreDeflection ** 2;
    const scale = energy(0) - atRest;
    expect(run.trace.bumpStopForce[0]).toBeGreaterThan(0);
    expect(run.trace.tyreLoad.some((f) => f === 0)).toBe(true);
    let rises = 0;
    for (let i = 1; i < zs.length; i++) if (energy(i) > energy(i - 1) + 1e-7 * scale) rises++;
    expect(rises).toBe(0);
    // And it does decay: after 4 s less than 1 % of the released energy is left.
    expect(energy(zs.length - 1) - atRest).toBeLessThan(0.01 * scale);
  });

  it('the body decays at the damped frequency of the linear two-mass model', () => {
    // Symmetric linear damper, light damping so that many cycles are measurable.
    const s = Setup.parse({ ...example('pipit-front-linear.setup.json'), damper: { compression: [[1, 600]], rebound: [[1, 600]] } });
    const lin = linearCorner(s);
    const { sprungMass: ms, unsprungMass: mu, wheelRate: k, wheelDamping: c, tyreRate: kt } = lin;
    // States [zs, vs, zu, vu]; eigenvalues from ml-matrix (registry library, not project code).
    const A = new Matrix([
      [0, 1, 0, 0],
      [-k / ms, -c / ms, k / ms, c / ms],
      [0, 0, 0, 1],
      [k / mu, c / mu, -(k + kt) / mu, -c / mu],
    ]);
    const eig = new EigenvalueDecomposition(A);
    const im = eig.imaginaryEigenvalues.map(Math.abs);
    const re = eig.realEigenvalues;
    const bodyIndex = [0, 1, 2, 3].filter((i) => im[i] > 0).sort((a, b) => Math.hypot(re[a], im[a]) - Math.hypot(re[b], im[b]))[0];
    const dampedHz = im[bodyIndex] / (2 * Math.PI);

    const st = statics(s);
    const run = integrateCorner(cornerModel(s, st), level, { duration: 6, outputRate: 1000, initial: [0.02, 0, 0.02 * (k / (k + kt)), 0], recordStates: true });
    if (!run.ok) throw new Error(run.reason);
    const z = run.states!.bodyDisplacement;
    const dt = run.trace.dt;
    // Upward zero crossings after the wheel-hop part has died out (t > 0.5 s), interpolated.
    const crossings: number[] = [];
    for (let i = Math.round(0.5 / dt); i + 1 < z.length; i++) {
      if (z[i] < 0 && z[i + 1] >= 0) crossings.push((i + z[i] / (z[i] - z[i + 1])) * dt);
    }
    expect(crossings.length).toBeGreaterThanOrEqual(5);
    const period = (crossings[crossings.length - 1] - crossings[0]) / (crossings.length - 1);
    // Tolerance 0.2 %: crossings are interpolated on a 1 kHz grid of a ~1.5 Hz signal.
    expect(1 / period).toBeGreaterThan(dampedHz * 0.998);
    expect(1 / period).toBeLessThan(dampedHz * 1.002);
  });
});
