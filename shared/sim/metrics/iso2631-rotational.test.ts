import { describe, expect, it } from 'vitest';
import { rmsAndVdv } from './iso2631.ts';
import { AXIS_FACTORS, pointVibrationTotal, weFilter, weResponse } from './iso2631-rotational.ts';

/**
 * ISO 2631-1:1997 Annex A (from memory) writes each weighting as a product of |H| terms:
 * high-pass |1/(1 + √2/(jω/ω1) + 1/(jω/ω1)²)|, low-pass |1/(1 + √2·jω/ω2 + (jω/ω2)²)| and the
 * transition |(1 + jω/ω3)/(1 + jω/(Q4·ω4) + (jω/ω4)²)|, with We's f1 = 0.4 Hz, f2 = 100 Hz,
 * f3 = f4 = 1 Hz, Q4 = 0.63. Evaluated here term by term, independently of the product code.
 */
function annexA(f: number): number {
  const mag = (re: number, im: number) => Math.hypot(re, im);
  const r1 = f / 0.4;
  const hp = 1 / mag(1 - 1 / (r1 * r1), -Math.SQRT2 / r1);
  const r2 = f / 100;
  const lp = 1 / mag(1 - r2 * r2, Math.SQRT2 * r2);
  const r = f / 1;
  const t = mag(1, r) / mag(1 - r * r, r / 0.63);
  return hp * lp * t;
}

describe('ISO 2631-1 rotational weighting We', () => {
  it('matches the standard’s Annex A formula from 0.1 to 80 Hz', () => {
    for (let i = 0; i <= 60; i++) {
      const f = 0.1 * 800 ** (i / 60);
      expect(weResponse(f) / annexA(f)).toBeCloseTo(1, 9);
    }
  });

  it('has the shape of the standard’s We curve: near 1 below 1 Hz, falling as 1/f above', () => {
    // At the transition frequency |Ht| = √2·Q4 = 0.891 (times the band limit, 0.987 at 1 Hz).
    expect(weResponse(1)).toBeCloseTo(Math.SQRT2 * 0.63 * 0.987, 2);
    // Well above f4 the transition tends to f4²/(f3·f): halving per octave.
    expect(weResponse(16) / weResponse(8)).toBeCloseTo(0.5, 1);
    expect(weResponse(0.63)).toBeGreaterThan(0.9);
  });

  it('the digital filter passes a 2 Hz pitch acceleration at the analog gain (500 Hz sampling)', () => {
    const dt = 1 / 500;
    const x = Float64Array.from({ length: 20 * 500 }, (_, i) => Math.sin(2 * Math.PI * 2 * i * dt));
    const y = weFilter(x, dt);
    const { rms } = rmsAndVdv(y, dt, 5 * 500);
    expect(rms / (Math.SQRT1_2 * weResponse(2))).toBeCloseTo(1, 3);
  });

  it('axis factors for a seated person (clause 8.2.3, from memory) and the point total value', () => {
    expect(AXIS_FACTORS).toEqual({ vertical: 1, roll: 0.63, pitch: 0.4, yaw: 0.2 });
    expect(pointVibrationTotal(0.3, 0.5)).toBeCloseTo(Math.sqrt(0.09 + 0.04), 12);
  });
});
