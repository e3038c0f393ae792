import { describe, expect, test } from 'vitest';
import { Damper } from '../../../../shared/schemas/setup.ts';
import { signedCurveData } from './chart-data.ts';
import { draftFromDamper, draftMatches, readDraft } from './draft.ts';
import { dampingFigures } from './figures.ts';

const damper = Damper.parse({
  compression: [
    [0.05, 80],
    [0.2, 200],
  ],
  rebound: [
    [0.05, 180],
    [0.2, 460],
    [0.5, 800],
  ],
});

describe('signed curve data', () => {
  test('rebound goes left with negative force, compression right, one rising x column through the origin', () => {
    const { data, index } = signedCurveData(damper);
    expect(data[0]).toEqual([-0.5, -0.2, -0.05, 0, 0.05, 0.2]);
    expect(data[1]).toEqual([null, null, null, 0, 80, 200]);
    expect(data[2]).toEqual([-800, -460, -180, 0, null, null]);
    expect(index.compression).toEqual([4, 5]);
    expect(index.rebound).toEqual([2, 1, 0]);
  });
});

describe('draft', () => {
  test('reads back the damper it was made from', () => {
    const draft = draftFromDamper(damper);
    const out = readDraft(draft, damper);
    expect(out.ok && out.damper).toEqual(damper);
    expect(draftMatches(draft, damper)).toBe(true);
  });

  test('places text and rule problems on their cells', () => {
    const draft = draftFromDamper(damper);
    draft.compression[1].force = 'abc';
    draft.rebound[2].force = '100';
    const out = readDraft(draft, damper);
    expect(out.ok).toBe(false);
    expect(out.errors.compression[1].force).toBe('Compression force at 0.2 m/s must be a number in N');
    // with the text fixed, the schema's rule lands on the falling force
    draft.compression[1].force = '200';
    const again = readDraft(draft, damper);
    expect(again.ok).toBe(false);
    expect(again.errors.rebound[2].force).toMatch(/must not fall/);
  });
});

describe('damping figures', () => {
  test('wheel coefficient is the damper coefficient times MR², and the classic ratio follows c/(2√(k·m))', () => {
    const f = dampingFigures(damper, { motionRatio: 0.9, sprungMass: 300, wheelRate: 25000 });
    expect(f.atWheel).toBeCloseTo(f.atDamper * 0.81, 9);
    expect(f.classicZeta).toBeCloseTo(f.atWheel / (2 * Math.sqrt(25000 * 300)), 12);
    expect(f.exactZeta).toBeNull();
  });

  test('with a near-rigid tyre the exact body ratio tends to the single-mass estimate', () => {
    // tyre 40 000× the wheel rate and a light wheel: the two-mass corner is the single mass on ks
    const f = dampingFigures(damper, { motionRatio: 1, sprungMass: 300, wheelRate: 25000, unsprungMass: 5, tyreRate: 1e9 });
    expect(f.exactZeta).not.toBeNull();
    expect((f.exactZeta ?? 0) / f.classicZeta).toBeCloseTo(1, 2);
  });
});
