import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { RoadInput } from '../schemas/road.ts';
import { Damper, Setup, type SetupInput } from '../schemas/setup.ts';
import { compileDamperForce } from './damper-compiled.ts';
import { complexGains } from './linear/frequency-response.ts';
import { cornerModel, newCornerForces, staticEquilibrium } from './quarter-car.ts';
import { runCorner } from './run-corner.ts';

const example = <T>(name: string): T => JSON.parse(readFileSync(new URL(`../../examples/${name}`, import.meta.url), 'utf8'));
const pipit = example<SetupInput>('pipit-front.setup.json');
const isoC = example<RoadInput>('iso-c.road.json');

/** A linear corner: one slope per direction, no stops, no gas, motion ratio 1. */
const linear = (c: number, extra: Partial<SetupInput> = {}): SetupInput => ({
  name: 'linear corner',
  sprungMass: 300,
  unsprungMass: 40,
  springRate: 25000,
  tyreRate: 200000,
  damper: { compression: [[1, c]], rebound: [[1, c]] },
  ...extra,
});

/** Steady-state amplitude of a trace column at frequency f over the last `periods` whole periods (one Fourier coefficient). */
function amplitudeAt(x: Float64Array, dt: number, f: number, periods: number): number {
  const n = Math.round(periods / (f * dt));
  let a = 0;
  let b = 0;
  for (let i = x.length - n; i < x.length; i++) {
    const w = 2 * Math.PI * f * i * dt;
    a += x[i] * Math.cos(w);
    b += x[i] * Math.sin(w);
  }
  return (2 * Math.hypot(a, b)) / n;
}

/** Body-acceleration gain per metre of road from a sine road run at frequency f (Hz). */
function simulatedBodyGain(setup: SetupInput, f: number, amplitude = 0.002): number {
  const wavelength = Math.min(10, 50 / f);
  const duration = Math.max(6, 16 / f);
  const out = runCorner({ setup, road: { kind: 'sine', amplitude, wavelength }, speed: f * wavelength, duration, settleTime: duration / 2 });
  if (!out.ok) throw new Error(out.reason);
  return amplitudeAt(out.trace.bodyAccel, out.trace.dt, f, Math.floor((f * duration) / 3)) / amplitude;
}

const gainOf = (setup: SetupInput, f: number) => {
  const out = runCorner({ setup, road: { kind: 'sine', amplitude: 0.001, wavelength: 10 }, speed: 10, duration: 1 });
  if (!out.ok) throw new Error(out.reason);
  return Math.hypot(...complexGains(out.result.linear, f)[0]);
};

describe('top mount', () => {
  it('in series with a linear damper, the strut force follows the Maxwell element: |K| = c·ω·k/√(k² + c²ω²)', () => {
    // Closed form of a spring k in series with a dashpot c (the Maxwell element of
    // viscoelasticity; any vibration textbook, e.g. Nashif, Jones and Henderson, "Vibration
    // Damping", 1985 — from memory). The wheel is driven at x = X·sin ωt with the body held;
    // the mount state is integrated here by classic RK4 at a fine step.
    const c = 2000;
    const k = 4e5;
    const setup = Setup.parse(linear(c, { topMount: { rate: k } }));
    const st = staticEquilibrium(setup);
    if (!st.ok) throw new Error(st.reason);
    const model = cornerModel(setup, st.state);
    expect(model.extraStates).toBe(1);
    const f = newCornerForces();
    const X = 0.01;
    for (const hz of [2, 15, 60]) {
      const w = 2 * Math.PI * hz;
      const h = 1 / (hz * 800);
      const periods = 12;
      const steps = Math.round(periods / (hz * h));
      const y = new Float64Array(5);
      const d = new Float64Array(5);
      const rate = (t: number, delta: number) => {
        y[4] = delta;
        model.evaluateExtra!(0, 0, X * Math.sin(w * t), X * w * Math.cos(w * t), 0, 0, y, d, f);
        return d[4];
      };
      let delta = 0;
      let a = 0;
      let b = 0;
      let count = 0;
      for (let i = 0; i < steps; i++) {
        const t = i * h;
        if (i >= steps / 2) {
          // Mount force k·δ, correlated with the drive over the last half (whole periods).
          a += k * delta * Math.sin(w * t);
          b += k * delta * Math.cos(w * t);
          count++;
        }
        const k1 = rate(t, delta);
        const k2 = rate(t + h / 2, delta + (h / 2) * k1);
        const k3 = rate(t + h / 2, delta + (h / 2) * k2);
        const k4 = rate(t + h, delta + h * k3);
        delta += (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
      }
      const measured = (2 * Math.hypot(a, b)) / count / X;
      const closed = (c * w * k) / Math.sqrt(k * k + c * c * w * w);
      expect(Math.abs(measured / closed - 1), `${hz} Hz`).toBeLessThan(0.002);
      // Phase lead of force over displacement: atan(k/(c·ω)) (90° for a pure damper).
      expect(Math.atan2(b, a)).toBeCloseTo(Math.atan2(k, c * w), 2);
    }
  });

  it('a run with a mount follows the linear frequency response (the mount as one more state), and the mount changes the high-frequency fall of body transmissibility', () => {
    const rigid = linear(1800);
    const mounted = linear(1800, { topMount: { rate: 1.5e5 } });
    for (const hz of [1.2, 14]) {
      const sim = simulatedBodyGain(mounted, hz);
      expect(Math.abs(sim / gainOf(mounted, hz) - 1), `${hz} Hz`).toBeLessThan(0.01);
    }
    // Below the mount's corner frequency km/(2π·c) ≈ 13 Hz the damper acts as before; far above
    // it the damper branch becomes the mount's spring (it stiffens from a dashpot to a spring,
    // from memory: the Maxwell element's storage stiffness rises from 0 to k), so the body's
    // displacement transmissibility falls one power of frequency faster: ω⁻⁴ instead of ω⁻³
    // above wheel hop. Slopes measured on the closed-form response over 150–300 Hz.
    expect(gainOf(mounted, 1) / gainOf(rigid, 1)).toBeGreaterThan(0.97);
    const slope = (s: SetupInput) => Math.log(gainOf(s, 300) / 300 ** 2 / (gainOf(s, 150) / 150 ** 2)) / Math.log(2);
    expect(slope(rigid)).toBeCloseTo(-3, 0);
    expect(slope(mounted)).toBeCloseTo(-4, 0);
  });

  it('a very stiff mount without friction gives the rigid results within integrator accuracy', () => {
    const run = (s: SetupInput) => {
      const out = runCorner({ setup: s, road: isoC, speed: 20, duration: 2.5, settleTime: 0.5 });
      if (!out.ok) throw new Error(out.reason);
      return out.result;
    };
    const rigid = run(pipit);
    const stiff = run({ ...pipit, topMount: { rate: 2e7 } });
    for (const key of ['bodyAccelRms', 'bodyAccelWkRms', 'tyreLoadRms', 'travelRms', 'damperVelocityRms'] as const) {
      expect(Math.abs(stiff.metrics[key] / rigid.metrics[key] - 1), key).toBeLessThan(2e-3);
    }
    expect(stiff.modal.body.naturalHz).toBeCloseTo(rigid.modal.body.naturalHz, 2);
    expect(stiff.modal.wheel.dampingRatio).toBeCloseTo(rigid.modal.wheel.dampingRatio, 2);
  });
});

describe('strut friction', () => {
  it('adds breakaway × tanh(v / smoothing speed) to the damper force, and makes a smooth road harsher', () => {
    const friction = { breakaway: 150, smoothingSpeed: 0.005 };
    const classA = { kind: 'iso8608', class: 'A', seed: 3 } as RoadInput;
    const plain = runCorner({ setup: pipit, road: classA, speed: 20, duration: 6 });
    const rough = runCorner({ setup: { ...pipit, friction }, road: classA, speed: 20, duration: 6 });
    if (!plain.ok || !rough.ok) throw new Error('run failed');
    const damper = compileDamperForce(Setup.parse(pipit).damper);
    const tr = rough.trace;
    for (let i = 0; i < tr.damperForce.length; i += 97) {
      const v = tr.damperVelocity[i];
      expect(tr.damperForce[i]).toBeCloseTo(damper(v) + 150 * Math.tanh(v / 0.005), 6);
    }
    // Friction locks the strut on small inputs, so the body follows the road more: common practice.
    expect(rough.result.metrics.bodyAccelWkRms).toBeGreaterThan(1.1 * plain.result.metrics.bodyAccelWkRms);
  });
});

describe('controlled damper', () => {
  const soft = { compression: [[1, 400]] as [number, number][], rebound: [[1, 400]] as [number, number][] };

  it('with an unbounded, instant actuator the continuous skyhook corner has the closed-form transmissibility of an ideal sky-hooked damper (Karnopp, Crosby and Harwood, 1974), within 1 %', () => {
    // Karnopp's single-mass result: |Zs/Zr| = √(k² + (cω)²)/√((k − mω²)² + ((c + csky)ω)²).
    // With a very stiff tyre and a light wheel the corner tends to that single mass.
    const m = 300;
    const k = 25000;
    const csky = 2 * 2 * Math.sqrt(k * m); // sky-hook ratio 2
    const sdof = (hz: number, c: number, sky: number) => {
      const w = 2 * Math.PI * hz;
      return Math.hypot(k, c * w) / Math.hypot(k - m * w * w, (c + sky) * w);
    };
    const setup = (sky: number): SetupInput =>
      linear(400, {
        unsprungMass: 5,
        tyreRate: 5e7,
        tyreDamping: 200,
        damper: { ...soft, control: { firm: soft, responseTime: 0, bounds: 'none', law: { kind: 'skyhook', gain: sky } } },
      });
    for (const hz of [0.5, 0.9, 1.5, 3, 6]) {
      const closed = sdof(hz, 400, csky) * (2 * Math.PI * hz) ** 2;
      expect(Math.abs(gainOf(setup(csky), hz) / closed - 1), `linear ${hz} Hz`).toBeLessThan(0.01);
      if (hz === 0.9 || hz === 3) expect(Math.abs(simulatedBodyGain(setup(csky), hz) / closed - 1), `run ${hz} Hz`).toBeLessThan(0.01);
    }
    // No resonant peak with a large sky-hook ratio: transmissibility ≤ 1 and falling; the
    // passive corner with the same small damper peaks well above 1 near 1.5 Hz.
    let prev = Infinity;
    for (let hz = 0.1; hz < 8; hz *= 1.1) {
      const t = sdof(hz, 400, csky);
      expect(t).toBeLessThanOrEqual(1);
      expect(t).toBeLessThan(prev);
      prev = t;
      expect(gainOf(setup(csky), hz) / (2 * Math.PI * hz) ** 2).toBeLessThanOrEqual(1.0001);
    }
    expect(sdof(Math.sqrt(k / m) / (2 * Math.PI), 400, 0)).toBeGreaterThan(3);
  });

  it('between its tables, a semi-active damper never leaves them, whatever the law; and each law uses the firm half of the range at times', () => {
    const pip = Setup.parse(pipit);
    const firm = { compression: pip.damper.compression.map(([v, f]) => [v, 3 * f]), rebound: pip.damper.rebound.map(([v, f]) => [v, 3 * f]) } as typeof soft;
    const lo = compileDamperForce(pip.damper);
    const hi = compileDamperForce(Damper.parse(firm));
    const laws = [
      { kind: 'skyhook', gain: 3000, mode: 'continuous' },
      { kind: 'skyhook', gain: 3000, mode: 'onOff' },
      { kind: 'groundhook', gain: 2000, mode: 'continuous' },
      { kind: 'blend', skyGain: 3000, groundGain: 2000, blend: 0.6, mode: 'continuous' },
    ] as const;
    for (const law of laws) {
      const out = runCorner({ setup: { ...pipit, damper: { ...pipit.damper, control: { firm, responseTime: 0.01, law } } }, road: isoC, speed: 20, duration: 4 });
      if (!out.ok) throw new Error(out.reason);
      const tr = out.trace;
      let firmSeen = 0;
      for (let i = 0; i < tr.damperForce.length; i++) {
        const v = tr.damperVelocity[i];
        const [a, b] = [lo(v), hi(v)].sort((x, y) => x - y);
        expect(tr.damperForce[i]).toBeGreaterThanOrEqual(a - 1e-9);
        expect(tr.damperForce[i]).toBeLessThanOrEqual(b + 1e-9);
        if (Math.abs(tr.damperForce[i] - lo(v)) > 0.5 * Math.abs(hi(v) - lo(v)) && Math.abs(v) > 0.01) firmSeen++;
      }
      expect(firmSeen, law.kind).toBeGreaterThan(0);
    }
  });

  it('the default integrator stays within 0.1 % of odex at 1e-8 with a mount and with a lagging controlled valve', () => {
    const pip = Setup.parse(pipit);
    const firm = { compression: pip.damper.compression.map(([v, f]) => [v, 2.5 * f]), rebound: pip.damper.rebound.map(([v, f]) => [v, 2.5 * f]) };
    const setups: SetupInput[] = [
      { ...pipit, topMount: { rate: 1.5e6 } },
      { ...pipit, damper: { ...pipit.damper, control: { firm: firm as never, responseTime: 0.01, law: { kind: 'skyhook', gain: 2500 } } } },
    ];
    for (const setup of setups) {
      const ref = runCorner({ setup, road: isoC, speed: 20, duration: 3, settleTime: 0.5, integrator: 'odex', tolerance: 1e-8 });
      const fast = runCorner({ setup, road: isoC, speed: 20, duration: 3, settleTime: 0.5 });
      if (!ref.ok || !fast.ok) throw new Error('run failed');
      for (const key of ['bodyAccelWkRms', 'tyreLoadRms', 'travelRms', 'damperVelocityRms'] as const) {
        expect(Math.abs(fast.result.metrics[key] / ref.result.metrics[key] - 1), key).toBeLessThan(1e-3);
      }
    }
  });
});
