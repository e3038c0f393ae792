import { describe, expect, it } from 'vitest';
import type { RunRequestInput } from '../../shared/schemas/run.ts';
import type { LinearCorner } from '../../shared/sim/linear/linear-corner.ts';
import { runCorner } from '../../shared/sim/run-corner.ts';
import { bandMeanSquares } from './road-integral.ts';

/**
 * Time-domain run of a linear corner (symmetric linear damper, no stops, no lift-off) on an
 * ISO 8608 road (ISO 8608:2016, class values from memory) against the band-limited integral
 * ∫|H(f)|²·G(f) df over the band the generator actually produced, G(f) = Gd(f/V)/V (docs/model.md §3).
 * The integral itself is checked against an ml-matrix Lyapunov solution in
 * linear-road-rms.test.ts.
 *
 * Tolerance. On a Gaussian road (random amplitudes) the RMS of a finite record is itself a
 * random variable and a statistical tolerance of a few per cent would be needed. The
 * generator uses exact amplitudes and random phases and is periodic (1024 m, 51.2 s at
 * 20 m/s), so over whole periods the mean square of a linear response does not depend on the
 * phases at all: it is the harmonic sum Σ|H(fk)|²·Ak²/2, a Riemann sum of the integral with Δf = V/L ≈ 0.02 Hz.
 * What is left is that sum-versus-integral gap, the settling transient (5 s against a body-mode
 * decay time near 0.5 s), the integrator tolerance (1e-6), the road spline and, for the Wk
 * value, the digital filter at 500 Hz (< 0.3 % below 20 Hz). Measured for seeds 1–3 over
 * two periods: every ratio within 0.007 % of 1. We allow 0.1 %.
 */
const speed = 20;
const gdn0 = 64e-6; // class B: dynamic tyre load stays far from lift-off (RMS ≈ 12 % of Fz0)
const period = 1024 / speed;
const settle = 5;

const setup = {
  name: 'Pipit front, linear reference',
  sprungMass: 300,
  unsprungMass: 40,
  springRate: 20000,
  motionRatio: 1,
  tyreRate: 200000,
  tyreDamping: 100,
  damper: {
    compression: [[1, 1500]],
    rebound: [[1, 1500]],
  },
} satisfies RunRequestInput['setup'];

const corner: LinearCorner = { sprungMass: 300, unsprungMass: 40, wheelRate: 20000, wheelDamping: 1500, tyreRate: 200000, tyreDamping: 100 };

describe('linear corner on ISO 8608 class B at 20 m/s: runCorner vs ∫|H|²·PSD', () => {
  it.each([1, 2, 3])('seed %i: RMS of body acceleration, Wk-weighted, travel and tyre load within 0.1 %', (seed) => {
    const out = runCorner({
      setup,
      road: { kind: 'iso8608', class: 'B', seed },
      speed,
      duration: settle + 2 * period,
      settleTime: settle,
    });
    if (!out.ok) throw new Error(out.reason);
    const { metrics, road } = out.result;
    // Preconditions of the linear comparison.
    expect(metrics.liftOffFraction).toBe(0);
    expect(metrics.bumpStopTime + metrics.reboundStopTime).toBe(0);
    expect(out.result.linear.wheelDamping).toBeCloseTo(1500, 6);

    const ms = bandMeanSquares(corner, gdn0, speed, road.nMin! * speed, road.nMax! * speed);
    const ratios = {
      bodyAccel: metrics.bodyAccelRms / Math.sqrt(ms.bodyAccel),
      weighted: metrics.bodyAccelWkRms / Math.sqrt(ms.weighted),
      travel: metrics.travelRms / Math.sqrt(ms.travel),
      tyreLoad: metrics.tyreLoadRms / Math.sqrt(ms.tyreLoad),
    };
    for (const [name, r] of Object.entries(ratios)) expect(Math.abs(r - 1), name).toBeLessThan(0.001);
  });

  // A default 60 s run analyses 58 s, 1.13 road periods: the part period makes the mean square
  // depend on the phases. Measured over seeds 1–6: within 1.7 % (travel, the narrowest-band
  // output, scatters most); 300 s runs: within 0.4 %. We allow 3 %.
  it.each([1, 2, 3])('seed %i, default 60 s run (not whole periods): all four RMS values within 3 %', (seed) => {
    const out = runCorner({ setup, road: { kind: 'iso8608', class: 'B', seed }, speed, duration: 60 });
    if (!out.ok) throw new Error(out.reason);
    const { metrics, road } = out.result;
    const ms = bandMeanSquares(corner, gdn0, speed, road.nMin! * speed, road.nMax! * speed);
    expect(Math.abs(metrics.bodyAccelRms / Math.sqrt(ms.bodyAccel) - 1)).toBeLessThan(0.03);
    expect(Math.abs(metrics.bodyAccelWkRms / Math.sqrt(ms.weighted) - 1)).toBeLessThan(0.03);
    expect(Math.abs(metrics.travelRms / Math.sqrt(ms.travel) - 1)).toBeLessThan(0.03);
    expect(Math.abs(metrics.tyreLoadRms / Math.sqrt(ms.tyreLoad) - 1)).toBeLessThan(0.03);
  });
});
