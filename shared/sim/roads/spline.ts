/**
 * Cubic spline through evenly spaced samples. A road on a grid is handed to the integrator
 * through this spline because it is C² (elevation, slope and curvature continuous): the
 * extrapolation integrator assumes a smooth right-hand side, and the road's slope enters the
 * tyre damping force, so a merely C¹ interpolant (Catmull-Rom, Hermite with estimated slopes)
 * would put a kink into the forces at every grid point.
 */
export interface GridSpline {
  dx: number;
  /** Samples (not copied). */
  z: Float64Array;
  /** Second derivatives at the samples. */
  m: Float64Array;
  periodic: boolean;
  /** Writes z(x) to out[0] and dz/dx to out[1]. */
  at(x: number, out: Float64Array): void;
}

/** Padding on each side for the periodic solve: the end effect decays as (2 − √3)^k. */
const PERIODIC_PAD = 40;

/**
 * Second derivatives of the natural cubic spline of `rhs`-weighted data: solves
 * m[i−1] + 4 m[i] + m[i+1] = r[i] for i in 1..n−2 with m[0] = m[n−1] = 0 (Thomas algorithm).
 */
function solveNatural(r: Float64Array): Float64Array {
  const n = r.length;
  const m = new Float64Array(n);
  if (n < 3) return m;
  const c = new Float64Array(n);
  const d = new Float64Array(n);
  c[1] = 1 / 4;
  d[1] = r[1] / 4;
  for (let i = 2; i < n - 1; i++) {
    const den = 4 - c[i - 1];
    c[i] = 1 / den;
    d[i] = (r[i] - d[i - 1]) / den;
  }
  m[n - 2] = d[n - 2];
  for (let i = n - 3; i >= 1; i--) m[i] = d[i] - c[i] * m[i + 1];
  return m;
}

/**
 * Builds the spline. `periodic`: the samples are one period (z[n] ≡ z[0]) and x wraps;
 * otherwise natural end conditions, held flat outside [0, (n−1)·dx].
 */
export function gridSpline(z: Float64Array, dx: number, periodic: boolean): GridSpline {
  const n = z.length;
  const k = 6 / (dx * dx);
  let m: Float64Array;
  if (periodic) {
    const pad = Math.min(PERIODIC_PAD, n);
    const ext = n + 2 * pad;
    const at = (i: number) => z[(((i - pad) % n) + n) % n];
    const r = new Float64Array(ext);
    for (let i = 1; i < ext - 1; i++) r[i] = k * (at(i + 1) - 2 * at(i) + at(i - 1));
    m = solveNatural(r).slice(pad, pad + n);
  } else {
    const r = new Float64Array(n);
    for (let i = 1; i < n - 1; i++) r[i] = k * (z[i + 1] - 2 * z[i] + z[i - 1]);
    m = solveNatural(r);
  }
  const length = periodic ? n * dx : (n - 1) * dx;
  const h6 = (dx * dx) / 6;
  const d6 = dx / 6;
  return {
    dx,
    z,
    m,
    periodic,
    at(x, out) {
      let s = x;
      if (periodic) {
        s = x - Math.floor(x / length) * length;
      } else if (x <= 0 || x >= length) {
        // Held flat beyond the ends (callers check the run fits inside the profile).
        out[0] = x <= 0 ? z[0] : z[n - 1];
        out[1] = 0;
        return;
      }
      let i = Math.floor(s / dx);
      if (i >= (periodic ? n : n - 1)) i = periodic ? n - 1 : n - 2;
      const j = periodic && i === n - 1 ? 0 : i + 1;
      const u = s / dx - i;
      const w = 1 - u;
      const zi = z[i];
      const zj = z[j];
      const mi = m[i];
      const mj = m[j];
      out[0] = w * zi + u * zj + h6 * ((w * w * w - w) * mi + (u * u * u - u) * mj);
      out[1] = (zj - zi) / dx + d6 * ((1 - 3 * w * w) * mi + (3 * u * u - 1) * mj);
    },
  };
}
