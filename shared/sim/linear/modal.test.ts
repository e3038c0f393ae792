import { describe, expect, it } from 'vitest';
import { ModalResult } from '../../schemas/modal.ts';
import type { LinearCorner } from './linear-corner.ts';
import { modalAnalysis, undampedFrequencies } from './modal.ts';

/** A small hatchback front corner (invented): 1.24 Hz body, 11.8 Hz wheel hop. */
const corner: LinearCorner = { sprungMass: 300, unsprungMass: 40, wheelRate: 20000, wheelDamping: 1500, tyreRate: 200000, tyreDamping: 100 };

describe('modalAnalysis', () => {
  it('returns a result the ModalResult schema accepts, with the body mode below the wheel hop', () => {
    const m = modalAnalysis(corner, 'secant at 0.1 m/s');
    expect(ModalResult.safeParse(m).success).toBe(true);
    expect(m.body.naturalHz).toBeLessThan(m.wheel.naturalHz);
    expect(m.equivalentDamping).toEqual({ wheelDamping: 1500, definition: 'secant at 0.1 m/s' });
  });

  it('lands in the typical passenger-car ranges (common practice): body 1–1.5 Hz, wheel 10–15 Hz, ζ 0.2–0.4', () => {
    const m = modalAnalysis(corner);
    expect(m.body.naturalHz).toBeGreaterThan(1);
    expect(m.body.naturalHz).toBeLessThan(1.5);
    expect(m.wheel.naturalHz).toBeGreaterThan(10);
    expect(m.wheel.naturalHz).toBeLessThan(15);
    expect(m.body.dampingRatio).toBeGreaterThan(0.2);
    expect(m.body.dampingRatio).toBeLessThan(0.4);
  });

  it('ties natural, damped frequency and ratio together: f_d = f_n·√(1 − ζ²)', () => {
    const m = modalAnalysis(corner);
    for (const mode of [m.body, m.wheel]) {
      expect(mode.dampedHz).toBeCloseTo(mode.naturalHz * Math.sqrt(1 - mode.dampingRatio ** 2), 10);
    }
  });

  it('without damping, gives undamped modes equal to the 2×2 mass/stiffness frequencies', () => {
    const m = modalAnalysis({ ...corner, wheelDamping: 0, tyreDamping: 0 });
    expect(m.body.dampingRatio).toBeCloseTo(0, 10);
    expect(m.body.naturalHz).toBeCloseTo(m.bodyUndampedHz, 9);
    expect(m.wheel.naturalHz).toBeCloseTo(m.wheelUndampedHz, 9);
  });

  it('undamped frequencies solve det(K − ω²M) = 0', () => {
    const { sprungMass: ms, unsprungMass: mu, wheelRate: ks, tyreRate: kt } = corner;
    for (const f of undampedFrequencies(corner)) {
      const w2 = (2 * Math.PI * f) ** 2;
      const det = (ks - w2 * ms) * (ks + kt - w2 * mu) - ks * ks;
      expect(Math.abs(det) / (ks * kt)).toBeLessThan(1e-9);
    }
  });

  it('classic estimates follow their formulas', () => {
    const m = modalAnalysis(corner);
    expect(m.classic.bodyHz).toBeCloseTo(Math.sqrt(((20000 * 200000) / 220000) / 300) / (2 * Math.PI), 12);
    expect(m.classic.wheelHz).toBeCloseTo(Math.sqrt(220000 / 40) / (2 * Math.PI), 12);
    expect(m.classic.bodyDampingRatio).toBeCloseTo(1500 / (2 * Math.sqrt(20000 * 300)), 12);
  });

  it('reports an overdamped pair with zero damped frequency and a ratio above 1', () => {
    const m = modalAnalysis({ ...corner, wheelDamping: 60000 });
    const over = [m.body, m.wheel].find((x) => x.dampedHz === 0);
    expect(over).toBeDefined();
    expect(over!.dampingRatio).toBeGreaterThan(1);
  });
});
