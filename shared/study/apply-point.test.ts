import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { Setup, type SetupInput } from '../schemas/setup.ts';
import { staticGasForce } from '../sim/damper-gas.ts';
import { applyPoint, classicBodyDampingRatio } from './apply-point.ts';

const pipit = Setup.parse(JSON.parse(readFileSync(new URL('../../examples/pipit-front.setup.json', import.meta.url), 'utf8')) as SetupInput);

const ok = (r: ReturnType<typeof applyPoint>) => {
  if (!r.ok) throw new Error(r.message);
  return r.setup;
};

describe('applyPoint', () => {
  it('with no values gives the base setup back', () => {
    expect(ok(applyPoint(pipit, {}))).toEqual(pipit);
  });

  it('scales forces, not speeds: both curves, or one direction, and the scales multiply', () => {
    const s = ok(applyPoint(pipit, { damperScale: 1.5, reboundScale: 2 }));
    s.damper.compression.forEach(([v, f], i) => {
      expect(v).toBe(pipit.damper.compression[i][0]);
      expect(f).toBeCloseTo(1.5 * pipit.damper.compression[i][1], 9);
    });
    s.damper.rebound.forEach(([v, f], i) => {
      expect(v).toBe(pipit.damper.rebound[i][0]);
      expect(f).toBeCloseTo(3 * pipit.damper.rebound[i][1], 9);
    });
  });

  it('a target body damping ratio is reached exactly, keeping the compression/rebound split', () => {
    for (const target of [0.15, 0.3, 0.55]) {
      const s = ok(applyPoint(pipit, { targetBodyDampingRatio: target, compressionScale: 0.8 }));
      expect(classicBodyDampingRatio(s)).toBeCloseTo(target, 9);
      // the split is the base's with compression ×0.8, whatever the overall factor
      const ratio = (setup: Setup) => setup.damper.rebound[2][1] / setup.damper.compression[2][1];
      expect(ratio(s)).toBeCloseTo(ratio(pipit) / 0.8, 9);
    }
  });

  it('replaces spring rate, tyre rate and unsprung mass; sets the gas force through its pressure when it has one', () => {
    const s = ok(applyPoint(pipit, { springRate: 41000, tyreRate: 250000, unsprungMass: 30, gasForce: 300 }));
    expect([s.springRate, s.tyreRate, s.unsprungMass]).toEqual([41000, 250000, 30]);
    expect(staticGasForce(s.damper.gas)).toBeCloseTo(300, 9);
    expect(s.damper.gas?.polytropic).toEqual(pipit.damper.gas?.polytropic);
    expect(ok(applyPoint(pipit, { gasForce: 0 })).damper.gas).toBeUndefined();
  });

  it('a value the setup schema refuses comes back as a failure naming the field', () => {
    const r = applyPoint(pipit, { unsprungMass: 2000 });
    expect(r).toMatchObject({ ok: false, message: expect.stringMatching(/^unsprungMass: /) });
  });

  it('sets the strut parts: adds a mount or friction, and the gains of a controlled damper the base has', () => {
    const s = ok(applyPoint(pipit, { mountRate: 1.2e6, frictionBreakaway: 120 }));
    expect(s.topMount).toEqual({ rate: 1.2e6, damping: 0 });
    expect(s.friction).toEqual({ breakaway: 120, smoothingSpeed: 0.005 });
    expect(ok(applyPoint({ ...pipit, friction: s.friction }, { frictionBreakaway: 0 })).friction).toBeUndefined();
    expect(applyPoint(pipit, { skyGain: 2000 })).toMatchObject({ ok: false, message: expect.stringMatching(/^damper\.control: /) });
    const blend = Setup.parse({
      ...pipit,
      damper: { ...pipit.damper, control: { firm: { compression: pipit.damper.rebound, rebound: pipit.damper.rebound }, law: { kind: 'blend', skyGain: 1000, groundGain: 500, blend: 0.5 } } },
    });
    const b = ok(applyPoint(blend, { skyGain: 3000, controlBlend: 0.8 }));
    expect(b.damper.control?.law).toEqual({ kind: 'blend', mode: 'continuous', skyGain: 3000, groundGain: 500, blend: 0.8 });
    // A 0–1 axis of `controlOn` puts the same corner passive (soft tables) and controlled on one chart.
    expect(ok(applyPoint(blend, { controlOn: 0, skyGain: 3000 })).damper.control).toBeUndefined();
    expect(ok(applyPoint(blend, { controlOn: 1 })).damper.control).toEqual(blend.damper.control);
    // The firm bound scales with the soft one, so "damper ×" keeps the valve's range in proportion.
    const scaledBlend = ok(applyPoint(blend, { damperScale: 2, skyGain: 3000 }));
    expect(scaledBlend.damper.control?.firm.rebound[0][1]).toBeCloseTo(2 * blend.damper.control!.firm.rebound[0][1], 9);
  });
});
