import type { Eigenvalue } from '../../schemas/modal.ts';

/**
 * Eigenvalues of a small real square matrix, kept dependency-free for the browser bundle.
 * Method: characteristic polynomial by Faddeev–LeVerrier (exact in exact arithmetic, fine in
 * double precision for the 4×4 corner, whose modes are an order of magnitude apart), then all
 * roots at once by the Aberth–Ehrlich iteration and a Newton polish of each root. The tests
 * compare against ml-matrix's EigenvalueDecomposition.
 */
export function characteristicPolynomial(A: readonly (readonly number[])[]): number[] {
  const n = A.length;
  // coeffs[k] multiplies λ^k; monic.
  const coeffs = new Array<number>(n + 1).fill(0);
  coeffs[n] = 1;
  let M = zeros(n);
  for (let k = 1; k <= n; k++) {
    const AM = matMul(A, M);
    for (let i = 0; i < n; i++) AM[i][i] += coeffs[n - k + 1];
    M = AM;
    const AMk = matMul(A, M);
    let trace = 0;
    for (let i = 0; i < n; i++) trace += AMk[i][i];
    coeffs[n - k] = -trace / k;
  }
  return coeffs;
}

/** Roots of the polynomial Σ coeffs[k] λ^k (coeffs[n] ≠ 0). */
export function polynomialRoots(coeffs: readonly number[]): Eigenvalue[] {
  const n = coeffs.length - 1;
  const lead = coeffs[n];
  const c = coeffs.map((v) => v / lead);
  // Start on a circle whose radius is the geometric mean of the root magnitudes, at angles
  // that avoid the real axis and conjugate symmetry (which would stall the iteration).
  const radius = Math.max(Math.pow(Math.abs(c[0]), 1 / n), 1e-3);
  const re = new Float64Array(n);
  const im = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const angle = (2 * Math.PI * k) / n + 0.4;
    re[k] = radius * Math.cos(angle);
    im[k] = radius * Math.sin(angle);
  }
  for (let iter = 0; iter < 500; iter++) {
    let biggest = 0;
    for (let k = 0; k < n; k++) {
      const [pr, pi, dr, di] = evalWithDerivative(c, re[k], im[k]);
      // ratio = p / p'
      const dd = dr * dr + di * di;
      if (dd === 0) continue;
      const qr = (pr * dr + pi * di) / dd;
      const qi = (pi * dr - pr * di) / dd;
      // sum of 1 / (z_k − z_j)
      let sr = 0;
      let si = 0;
      for (let j = 0; j < n; j++) {
        if (j === k) continue;
        const xr = re[k] - re[j];
        const xi = im[k] - im[j];
        const xx = xr * xr + xi * xi;
        sr += xr / xx;
        si -= xi / xx;
      }
      // step = ratio / (1 − ratio · sum)
      const tr = 1 - (qr * sr - qi * si);
      const ti = -(qr * si + qi * sr);
      const tt = tr * tr + ti * ti;
      const wr = (qr * tr + qi * ti) / tt;
      const wi = (qi * tr - qr * ti) / tt;
      re[k] -= wr;
      im[k] -= wi;
      biggest = Math.max(biggest, Math.hypot(wr, wi) / Math.max(Math.hypot(re[k], im[k]), 1e-300));
    }
    if (biggest < 1e-15) break;
  }
  const roots: Eigenvalue[] = [];
  for (let k = 0; k < n; k++) roots.push(polish(c, re[k], im[k]));
  return symmetrise(roots);
}

/** Eigenvalues of A, sorted by magnitude then by imaginary part. */
export function eigenvalues(A: readonly (readonly number[])[]): Eigenvalue[] {
  return polynomialRoots(characteristicPolynomial(A)).sort((a, b) => Math.hypot(a.re, a.im) - Math.hypot(b.re, b.im) || a.im - b.im);
}

function zeros(n: number): number[][] {
  return Array.from({ length: n }, () => new Array<number>(n).fill(0));
}

function matMul(A: readonly (readonly number[])[], B: readonly (readonly number[])[]): number[][] {
  const n = A.length;
  const out = zeros(n);
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < n; k++) {
      const a = A[i][k];
      if (a === 0) continue;
      for (let j = 0; j < n; j++) out[i][j] += a * B[k][j];
    }
  }
  return out;
}

/** p(z) and p'(z) by Horner: [Re p, Im p, Re p', Im p']. */
function evalWithDerivative(c: readonly number[], zr: number, zi: number): [number, number, number, number] {
  const n = c.length - 1;
  let pr = c[n];
  let pi = 0;
  let dr = 0;
  let di = 0;
  for (let k = n - 1; k >= 0; k--) {
    const ndr = dr * zr - di * zi + pr;
    di = dr * zi + di * zr + pi;
    dr = ndr;
    const npr = pr * zr - pi * zi + c[k];
    pi = pr * zi + pi * zr;
    pr = npr;
  }
  return [pr, pi, dr, di];
}

function polish(c: readonly number[], zr: number, zi: number): Eigenvalue {
  for (let i = 0; i < 4; i++) {
    const [pr, pi, dr, di] = evalWithDerivative(c, zr, zi);
    const dd = dr * dr + di * di;
    if (dd === 0) break;
    zr -= (pr * dr + pi * di) / dd;
    zi -= (pi * dr - pr * di) / dd;
  }
  return { re: zr, im: zi };
}

/** A real polynomial's roots are real or conjugate pairs; remove round-off that breaks this. */
function symmetrise(roots: Eigenvalue[]): Eigenvalue[] {
  const out = roots.map((r) => ({ ...r }));
  const used = new Array<boolean>(out.length).fill(false);
  for (let i = 0; i < out.length; i++) {
    if (used[i]) continue;
    const mag = Math.hypot(out[i].re, out[i].im);
    if (Math.abs(out[i].im) <= 1e-9 * mag) {
      out[i].im = 0;
      used[i] = true;
      continue;
    }
    let best = -1;
    let bestGap = Infinity;
    for (let j = i + 1; j < out.length; j++) {
      if (used[j]) continue;
      const gap = Math.hypot(out[j].re - out[i].re, out[j].im + out[i].im);
      if (gap < bestGap) {
        bestGap = gap;
        best = j;
      }
    }
    used[i] = true;
    if (best >= 0 && bestGap <= 1e-6 * mag) {
      const r = (out[i].re + out[best].re) / 2;
      const m = (Math.abs(out[i].im) + Math.abs(out[best].im)) / 2;
      out[i] = { re: r, im: m };
      out[best] = { re: r, im: -m };
      used[best] = true;
    }
  }
  return out;
}
