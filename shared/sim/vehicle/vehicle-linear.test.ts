import { readFileSync } from 'node:fs';
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import type { SetupInput } from '../../schemas/setup.ts';
import { VehicleSetup } from '../../schemas/vehicle-setup.ts';
import { modalAnalysis } from '../linear/modal.ts';
import { linearCorner } from '../quarter-car.ts';
import { flatRideChecks } from './flat-ride.ts';
import { linearVehicle, vehicleModes, type LinearAxle, type LinearVehicle } from './vehicle-linear.ts';
import { vehicleStatics } from './vehicle-model.ts';
import { vehicleFrequencyResponse, wheelbaseFilterZeros } from './vehicle-response.ts';

const example = <T>(name: string): T => JSON.parse(readFileSync(new URL(`../../../examples/${name}`, import.meta.url), 'utf8'));
const front = example<SetupInput>('pipit-front.setup.json');
const rear = example<SetupInput>('pipit-rear.setup.json');

function statics(v: unknown) {
  const s = vehicleStatics(VehicleSetup.parse(v));
  if (!s.ok) throw new Error(s.reason);
  return s.statics;
}

const axle = (ks: number, kt: number, mu = 0.05, c = 0): LinearAxle => ({ unsprungMass: mu, wheelRate: ks, wheelDamping: c, tyreRate: kt, tyreDamping: 0 });
const rideRate = (x: LinearAxle) => (x.wheelRate * x.tyreRate) / (x.wheelRate + x.tyreRate);

/**
 * Textbook closed form for the undamped two-degree-of-freedom body on its ride rates Kf, Kr
 * (a vehicle-dynamics textbook's ride chapter, e.g. Gillespie, "Fundamentals of Vehicle
 * Dynamics", bounce and pitch; from memory): α = (Kf + Kr)/M, β = (Kf·a − Kr·b)/M,
 * γ = (Kf·a² + Kr·b²)/(M·k²); ω² = (α+γ)/2 ± √((α−γ)²/4 + β²/k²); node x = β/(α − ω²) ahead of
 * the CG. Written here independently of the product code.
 */
function closedForm(v: LinearVehicle) {
  const { mass: M, inertia, a, b } = v.geometry;
  const k2 = inertia / M;
  const Kf = rideRate(v.front);
  const Kr = rideRate(v.rear);
  const alpha = (Kf + Kr) / M;
  const beta = (Kf * a - Kr * b) / M;
  const gamma = (Kf * a * a + Kr * b * b) / (M * k2);
  const root = Math.sqrt((alpha - gamma) ** 2 / 4 + beta ** 2 / k2);
  const w2 = [(alpha + gamma) / 2 - root, (alpha + gamma) / 2 + root];
  return w2.map((w) => ({ hz: Math.sqrt(w) / (2 * Math.PI), nodeAhead: beta / (alpha - w) }));
}

describe('vehicle modes against the textbook closed form', () => {
  // Wheels of 50 g on stiff tyres: the full model's body modes tend to the body on its ride rates.
  const coupled: LinearVehicle = {
    geometry: { mass: 1200, inertia: 1700, a: 1.1, b: 1.5, wheelbase: 2.6 },
    front: axle(52000, 420000),
    rear: axle(60000, 420000),
  };

  it('coupled body (dynamic index ≠ 1): heave and pitch frequencies and nodes', () => {
    const m = vehicleModes(coupled);
    expect(m.dynamicIndex).toBeCloseTo(1700 / (1200 * 1.1 * 1.5), 12);
    const [low, high] = closedForm(coupled);
    // Tolerance 0.1 %: the 50 g wheels still move a little.
    const modes = [m.modes.heave, m.modes.pitch].sort((x, y) => x.naturalHz - y.naturalHz);
    expect(modes[0].naturalHz / low.hz - 1).toBeLessThan(1e-3);
    expect(Math.abs(modes[1].naturalHz / high.hz - 1)).toBeLessThan(1e-3);
    // Nodes, m behind the front axle: a − x.
    const nodes = modes.map((x) => x.nodeBehindFrontAxle!);
    expect(nodes[0]).toBeCloseTo(1.1 - low.nodeAhead, 2);
    expect(nodes[1]).toBeCloseTo(1.1 - high.nodeAhead, 2);
    // The mode with a node inside the wheelbase is the pitch mode.
    expect(m.modes.pitch.nodeBehindFrontAxle!).toBeGreaterThan(0);
    expect(m.modes.pitch.nodeBehindFrontAxle!).toBeLessThan(2.6);
    expect(m.modes.pitch.dampingRatio).toBeCloseTo(0, 9);
  });

  it('dynamic index 1: each end at its own frequency, the nodes at the other axle', () => {
    const g = { mass: 1200, inertia: 1200 * 1.1 * 1.5, a: 1.1, b: 1.5, wheelbase: 2.6 };
    const v: LinearVehicle = { ...coupled, geometry: g };
    const m = vehicleModes(v);
    expect(m.dynamicIndex).toBeCloseTo(1, 12);
    // Decoupled: f = √(K/m_end)/2π with the end's mass share M·b/L at the front, M·a/L at the rear.
    const fFront = Math.sqrt(rideRate(v.front) / ((g.mass * g.b) / g.wheelbase)) / (2 * Math.PI);
    const fRear = Math.sqrt(rideRate(v.rear) / ((g.mass * g.a) / g.wheelbase)) / (2 * Math.PI);
    const hz = [m.modes.heave, m.modes.pitch].map((x) => x.naturalHz).sort((x, y) => x - y);
    const ends = [fFront, fRear].sort((x, y) => x - y);
    expect(Math.abs(hz[0] / ends[0] - 1)).toBeLessThan(1e-3);
    expect(Math.abs(hz[1] / ends[1] - 1)).toBeLessThan(1e-3);
    const nodes = [m.modes.heave, m.modes.pitch].map((x) => x.nodeBehindFrontAxle!).sort((x, y) => x - y);
    expect(nodes[0]).toBeCloseTo(0, 2);
    expect(nodes[1]).toBeCloseTo(2.6, 2);
    // And both closed-form roots say the same.
    const cf = closedForm(v).map((x) => x.hz);
    expect(Math.abs(cf[0] / ends[0] - 1)).toBeLessThan(1e-9);
    expect(Math.abs(cf[1] / ends[1] - 1)).toBeLessThan(1e-9);
  });

  it('equal axles, CG mid-way, dynamic index 1: heave and pitch at the corner body mode, both hops at its wheel hop', () => {
    const s = statics({ name: 'Twin', wheelbase: 2.6, pitchRadiusOfGyration: 1.3, front, rear: front });
    const m = vehicleModes(linearVehicle(s));
    const corner = modalAnalysis(linearCorner(s.frontSetup));
    // Each mode is now a double eigenvalue, which a polynomial root finder resolves to about √ε: 1e-6 relative.
    const close = (x: number, y: number) => expect(Math.abs(x / y - 1)).toBeLessThan(1e-6);
    for (const name of ['heave', 'pitch'] as const) {
      close(m.modes[name].naturalHz, corner.body.naturalHz);
      close(m.modes[name].dampingRatio, corner.body.dampingRatio);
    }
    for (const name of ['frontHop', 'rearHop'] as const) close(m.modes[name].naturalHz, corner.wheel.naturalHz);
  });
});

describe('vehicle eigenvalues against ml-matrix', () => {
  it('the damped Pipit pair: all eight eigenvalues of the equations written out independently', () => {
    const s = statics({ name: 'Pipit', wheelbase: 2.55, pitchRadiusOfGyration: 1.15, front, rear });
    const v = linearVehicle(s);
    const { mass: M, inertia: I, a, b } = v.geometry;
    const { wheelRate: kf, wheelDamping: cf, tyreRate: tf, tyreDamping: dtf, unsprungMass: mf } = v.front;
    const { wheelRate: kr, wheelDamping: cr, tyreRate: tr, tyreDamping: dtr, unsprungMass: mr } = v.rear;
    // Equations of motion in x = [z, θ, zf, zr, ż, θ̇, żf, żr], from the free-body forces:
    // front suspension force Ff = kf(zf − z − aθ) + cf(żf − ż − aθ̇), rear Fr = kr(zr − z + bθ) + cr(…).
    const row = (kF: number, kR: number, cF: number, cR: number, wF: number, wR: number, mass: number) =>
      [-(kF + kR), -(kF * wF + kR * wR), kF, kR, -(cF + cR), -(cF * wF + cR * wR), cF, cR].map((x) => x / mass);
    const A = new Matrix([
      [0, 0, 0, 0, 1, 0, 0, 0],
      [0, 0, 0, 0, 0, 1, 0, 0],
      [0, 0, 0, 0, 0, 0, 1, 0],
      [0, 0, 0, 0, 0, 0, 0, 1],
      row(kf, kr, cf, cr, a, -b, M),
      row(kf * a, -kr * b, cf * a, -cr * b, a, -b, I),
      [kf, kf * a, -(kf + tf), 0, cf, cf * a, -(cf + dtf), 0].map((x) => x / mf),
      [kr, -kr * b, 0, -(kr + tr), cr, -cr * b, 0, -(cr + dtr)].map((x) => x / mr),
    ]);
    const eig = new EigenvalueDecomposition(A);
    const reference = eig.realEigenvalues.map((re, i) => ({ re, im: eig.imaginaryEigenvalues[i] }));
    const ours = vehicleModes(v).eigenvalues;
    expect(ours).toHaveLength(8);
    for (const l of ours) {
      const nearest = Math.min(...reference.map((r) => Math.hypot(r.re - l.re, r.im - l.im)));
      expect(nearest / Math.hypot(l.re, l.im)).toBeLessThan(1e-9);
    }
  });
});

describe('wheelbase filter', () => {
  // Equal axles with the CG mid-way: heave and pitch are uncoupled whatever the inertia.
  const s = statics({ name: 'Twin', wheelbase: 2.5, pitchRadiusOfGyration: 1.05, front, rear: front });
  const v = linearVehicle(s);
  const speed = 15;
  const zeros = wheelbaseFilterZeros(2.5, speed, 20);

  it('lists heave zeros at (2n+1)·V/(2L) and pitch zeros at n·V/L', () => {
    expect(zeros.heaveHz.slice(0, 3)).toEqual([3, 9, 15]);
    expect(zeros.pitchHz.slice(0, 3)).toEqual([6, 12, 18]);
  });

  it('the heave and pitch responses vanish there, from the delay alone', () => {
    const at = (f: number) => vehicleFrequencyResponse(v, speed, [], new Float64Array([f * 0.9, f, f * 1.1]));
    for (const f of zeros.heaveHz) {
      const r = at(f);
      expect(r.heave.gain[1]).toBeLessThan(1e-9 * Math.max(r.heave.gain[0], r.heave.gain[2]));
      expect(r.pitch.gain[1]).toBeGreaterThan(1e-3);
    }
    for (const f of zeros.pitchHz) {
      const r = at(f);
      expect(r.pitch.gain[1]).toBeLessThan(1e-9 * Math.max(r.pitch.gain[0], r.pitch.gain[2]));
      expect(r.heave.gain[1]).toBeGreaterThan(1e-3);
    }
  });

  it('a seat at the CG feels heave only; a seat over an axle feels heave plus the pitch lever', () => {
    const seats = [
      { name: 'middle', behindFrontAxle: 1.25 },
      { name: 'front', behindFrontAxle: 0 },
    ] as never;
    const r = vehicleFrequencyResponse(v, speed, seats, new Float64Array([1.2, 6]));
    expect(r.seats[0].response.gain[0]).toBeCloseTo(r.heave.gain[0], 9);
    // At a pitch zero the front seat feels only heave.
    expect(r.seats[1].response.gain[1]).toBeCloseTo(r.heave.gain[1], 9);
  });
});

describe('flat-ride checks (common practice)', () => {
  it('with dynamic index 1 the two end frequencies are the body modes of the whole vehicle', () => {
    const g = statics({ name: 'Pipit', wheelbase: 2.55, pitchRadiusOfGyration: 1, front, rear }).geometry;
    const [s, m] = withModes({ name: 'Pipit', wheelbase: 2.55, pitchRadiusOfGyration: Math.sqrt(g.a * g.b), front, rear });
    const c = flatRideChecks(s, m);
    const body = [m.modes.heave.naturalHz, m.modes.pitch.naturalHz].sort((x, y) => x - y);
    const ends = [c.frontHz, c.rearHz].sort((x, y) => x - y);
    // Each end is then its own corner at its share of the body: the same eigenvalues.
    expect(Math.abs(body[0] / ends[0] - 1)).toBeLessThan(1e-6);
    expect(Math.abs(body[1] / ends[1] - 1)).toBeLessThan(1e-6);
    expect(c.ratio).toBeCloseTo(c.rearHz / c.frontHz, 12);
    expect(c.pitchOverHeave).toBeCloseTo(m.modes.pitch.naturalHz / m.modes.heave.naturalHz, 12);
  });

  it('swapping the ends turns the first check around', () => {
    const a = flatRideChecks(...withModes({ name: 'A', wheelbase: 2.55, pitchRadiusOfGyration: 1.15, front, rear }));
    const b = flatRideChecks(...withModes({ name: 'B', wheelbase: 2.55, pitchRadiusOfGyration: 1.15, front: rear, rear: front }));
    expect(a.frontBelowRear).not.toBe(b.frontBelowRear);
  });
});

function withModes(v: unknown) {
  const s = statics(v);
  return [s, vehicleModes(linearVehicle(s))] as const;
}
