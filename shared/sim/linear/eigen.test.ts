import { describe, expect, it } from 'vitest';
import { characteristicPolynomial, eigenvalues, polynomialRoots } from './eigen.ts';

const byRe = (a: { re: number; im: number }, b: { re: number; im: number }) => a.re - b.re || a.im - b.im;

describe('small real eigenvalue solver', () => {
  it('finds the characteristic polynomial of a 3×3 by hand: λ³ − 6λ² + 11λ − 6', () => {
    // Upper triangular with diagonal 1, 2, 3.
    const c = characteristicPolynomial([
      [1, 5, -2],
      [0, 2, 7],
      [0, 0, 3],
    ]);
    [-6, 11, -6, 1].forEach((v, k) => expect(c[k]).toBeCloseTo(v, 10));
  });

  it('finds real and complex roots of (λ + 1)(λ + 50)(λ² + 2λ + 101)', () => {
    // λ² + 2λ + 101 → −1 ± 10j
    const p1 = [50, 51, 1];
    const p2 = [101, 2, 1];
    const coeffs = [0, 0, 0, 0, 0];
    p1.forEach((a, i) => p2.forEach((b, j) => (coeffs[i + j] += a * b)));
    const roots = polynomialRoots(coeffs).sort(byRe);
    const expected = [
      { re: -50, im: 0 },
      { re: -1, im: -10 },
      { re: -1, im: 0 },
      { re: -1, im: 10 },
    ];
    roots.forEach((r, i) => {
      expect(r.re).toBeCloseTo(expected[i].re, 10);
      expect(r.im).toBeCloseTo(expected[i].im, 10);
    });
  });

  it('returns exact conjugate pairs and zero imaginary parts for real roots', () => {
    const A = [
      [0, 1, 0, 0],
      [-100, -3, 100, 3],
      [0, 0, 0, 1],
      [800, 24, -6000, -30],
    ];
    const ev = eigenvalues(A);
    const complex = ev.filter((e) => e.im !== 0);
    for (const e of complex) expect(complex.some((o) => o.re === e.re && o.im === -e.im)).toBe(true);
    // Sum of eigenvalues = trace, product = determinant (the constant coefficient).
    const sum = ev.reduce((s, e) => s + e.re, 0);
    expect(sum).toBeCloseTo(-33, 8);
  });

  it('handles a rotation (purely imaginary pair) and a repeated real root', () => {
    const rot = eigenvalues([
      [0, -2],
      [2, 0],
    ]);
    expect(rot.map((e) => e.re)).toEqual([expect.closeTo(0, 10), expect.closeTo(0, 10)]);
    expect(rot.map((e) => e.im).sort()).toEqual([expect.closeTo(-2, 10), expect.closeTo(2, 10)]);
    const rep = eigenvalues([
      [-3, 1],
      [0, -3],
    ]);
    for (const e of rep) {
      expect(e.re).toBeCloseTo(-3, 6);
      expect(Math.abs(e.im)).toBeLessThan(1e-6);
    }
  });
});
