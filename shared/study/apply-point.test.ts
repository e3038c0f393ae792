import { describe, expect, it } from 'vitest';
import { EquivalentDampingChoice } from '../schemas/run.ts';
import { Setup } from '../schemas/setup.ts';
import { equivalentDampingLeastSquares, equivalentDampingSecant, staticGasForce } from '../sim/damper.ts';
import { modalAnalysis } from '../sim/linear/modal.ts';
import { linearCorner } from '../sim/quarter-car.ts';
import { applyPoint, classicBodyDampingRatio } from './apply-point.ts';

const base = Setup.parse({
  name: 'Brume Corrie rear, test',
  sprungMass: 420,
  unsprungMass: 45,
  springRate: 40000,
  motionRatio: 0.8,
  tyreRate: 230000,
  damper: {
    compression: [[0.05, 150], [0.2, 380], [1, 900]],
    rebound: [[0.05, 350], [0.2, 900], [1, 2000]],
    gas: { pressure: 1.5e6, rodArea: 2e-4, polytropic: { volume: 1e-4, exponent: 1.2 } },
  },
});

function applied(values: Parameters<typeof applyPoint>[1], opts = {}) {
  const r = applyPoint(base, values, opts);
  if (!r.ok) throw new Error(r.message);
  return r.setup;
}

describe('applyPoint', () => {
  it('multiplies forces, not speeds: damper scale both ways, then each direction by its own scale', () => {
    const s = applied({ damperScale: 1.5, reboundScale: 2 });
    expect(s.damper.compression).toEqual([[0.05, 225], [0.2, 570], [1, 1350]]);
    expect(s.damper.rebound.map(([v, f]) => [v, f])).toEqual([[0.05, 1050], [0.2, 2700], [1, 6000]]);
    expect(applied({ compressionScale: 0.5 }).damper.rebound).toEqual(base.damper.rebound);
  });

  it('scales the damper to a target body damping ratio, read back by the modal analysis', () => {
    for (const target of [0.15, 0.3, 0.6]) {
      const s = applied({ targetBodyDampingRatio: target, reboundScale: 1.3 });
      const modal = modalAnalysis(linearCorner(s, equivalentDampingLeastSquares(s.damper)));
      expect(modal.classic.bodyDampingRatio).toBeCloseTo(target, 10);
      // the compression/rebound split set by the other axis is kept
      expect(s.damper.rebound[1][1] / s.damper.compression[1][1]).toBeCloseTo((900 * 1.3) / 380, 10);
    }
  });

  it('uses the chosen equivalent-coefficient definition for the damping ratio', () => {
    const choice = EquivalentDampingChoice.parse({ method: 'secant', referenceSpeed: 0.1 });
    const s = applied({ targetBodyDampingRatio: 0.25 }, { equivalentDamping: choice });
    const modal = modalAnalysis(linearCorner(s, equivalentDampingSecant(s.damper, 0.1)));
    expect(modal.classic.bodyDampingRatio).toBeCloseTo(0.25, 10);
    expect(classicBodyDampingRatio(s, choice)).toBeCloseTo(0.25, 10);
    expect(classicBodyDampingRatio(s)).not.toBeCloseTo(0.25, 3);
  });

  it('replaces spring rate, tyre rate and unsprung mass, and leaves the base untouched', () => {
    const s = applied({ springRate: 52000, tyreRate: 250000, unsprungMass: 40, speed: 30 });
    expect([s.springRate, s.tyreRate, s.unsprungMass]).toEqual([52000, 250000, 40]);
    expect(base.springRate).toBe(40000);
  });

  it('sets the gas force through the pressure of a pressure-given charge, or removes it at 0', () => {
    const s = applied({ gasForce: 450 });
    expect(s.damper.gas?.pressure).toBeCloseTo(2.25e6, 6);
    expect(s.damper.gas?.polytropic).toEqual(base.damper.gas?.polytropic);
    expect(staticGasForce(s.damper.gas)).toBeCloseTo(450, 9);
    expect(applied({ gasForce: 0 }).damper.gas).toBeUndefined();
  });

  it('returns a failure naming the field when the result is not a valid setup', () => {
    const r = applyPoint(base, { damperScale: 1e4 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/^damper\.compression\.\d+\.1: /);
  });
});
