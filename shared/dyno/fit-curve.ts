import type { DynoDirectionFit, DynoFit, DynoFitResidual, DynoPeakPoints, DynoPoint } from '../schemas/dyno.ts';
import { solveSpd } from './solve-spd.ts';

export interface FitOptions {
  /**
   * `absolute` (default): every point counts in newtons, so fast points with big forces steer
   * the fit. `relative`: each residual is divided by max(|measured|, `relativeFloor`), so slow
   * points count as much in percent.
   */
  weighting?: 'absolute' | 'relative';
  /** N; default 10. */
  relativeFloor?: number;
}

/** A design row: the table force at `v` is Σ weight·f[knot]. Two entries at most. */
type Row = { k: number; a: number }[];

/**
 * Weights of the knot forces in the table force at speed v, for a table read like
 * `tableForce` in shared/sim/damper.ts: linear from the implied origin through the knots and
 * extrapolated with the last segment past the last knot.
 */
function designRow(knots: readonly number[], v: number): Row {
  const n = knots.length;
  let j = 0;
  while (j < n - 1 && v > knots[j]) j++;
  const lo = j === 0 ? 0 : knots[j - 1];
  const t = (v - lo) / (knots[j] - lo);
  const row: Row = [{ k: j, a: t }];
  if (j > 0) row.push({ k: j - 1, a: 1 - t });
  return row;
}

/** Non-negative least squares on normal equations (Lawson–Hanson active set). */
function nnls(h: number[][], c: number[]): number[] {
  const n = c.length;
  const g = new Array<number>(n).fill(0);
  const inSet = new Array<boolean>(n).fill(false);
  const tol = 1e-12 * (Math.max(...c.map(Math.abs)) + 1);
  for (let outer = 0; outer < 3 * n + 10; outer++) {
    const w = c.map((ci, i) => ci - h[i].reduce((s, hij, j) => s + hij * g[j], 0));
    let best = -1;
    for (let i = 0; i < n; i++) if (!inSet[i] && w[i] > tol && (best < 0 || w[i] > w[best])) best = i;
    if (best < 0) break;
    inSet[best] = true;
    for (let inner = 0; inner < 3 * n + 10; inner++) {
      const idx = inSet.flatMap((p, i) => (p ? [i] : []));
      const z = solveSpd(idx.map((i) => idx.map((j) => h[i][j])), idx.map((i) => c[i]));
      if (!z) throw new Error('nnls: singular sub-problem on a positive definite matrix');
      if (z.every((zi) => zi > 0)) {
        idx.forEach((i, m) => (g[i] = z[m]));
        break;
      }
      let alpha = 1;
      idx.forEach((i, m) => {
        if (z[m] <= 0) alpha = Math.min(alpha, g[i] / (g[i] - z[m]));
      });
      idx.forEach((i, m) => {
        g[i] += alpha * (z[m] - g[i]);
        if (g[i] <= 1e-14 * (Math.abs(z[m]) + 1)) {
          g[i] = 0;
          inSet[i] = false;
        }
      });
    }
  }
  return g;
}

const fmt = (x: number) => Number(x.toPrecision(4)).toString();

function checkKnots(knots: readonly number[]): string | undefined {
  if (knots.length === 0) return 'choose at least one fit velocity';
  if (knots.length > 64) return 'at most 64 fit velocities';
  if (knots.some((k) => !Number.isFinite(k) || k <= 0 || k > 20)) return 'fit velocities must lie above 0 and at most 20 m/s';
  for (let i = 1; i < knots.length; i++) {
    if (!(knots[i] > knots[i - 1])) return `fit velocities must rise (${fmt(knots[i])} m/s after ${fmt(knots[i - 1])} m/s)`;
  }
  return undefined;
}

/**
 * Fits one direction's damper table at chosen speeds (`knots`, m/s, rising, > 0) to measured
 * points: weighted least squares over the knot forces of a piecewise-linear curve through the
 * origin (extrapolated past the last knot with its last slope, as the simulation reads tables),
 * with force never falling as speed rises. When the plain least-squares answer would fall, the
 * constrained optimum is found exactly (non-negative least squares on the force increments)
 * and the knots held level are listed in `heldKnots`.
 *
 * Fails (as a value) when a knot has no measured point on either side of it within its
 * neighbouring knots, or when the data cannot fix every knot. The table is a valid
 * `DamperCurve` once parsed by that schema.
 */
export function fitDamperCurve(points: readonly DynoPoint[], knots: readonly number[], opts: FitOptions = {}): DynoDirectionFit {
  const bad = checkKnots(knots);
  if (bad) return { ok: false, message: bad };
  const pts = points.filter((p) => Number.isFinite(p.velocity) && Number.isFinite(p.force) && p.velocity >= 0);
  if (pts.length === 0) return { ok: false, message: 'no measured points to fit' };
  const n = knots.length;
  const floor = opts.relativeFloor ?? 10;
  const weight = (p: DynoPoint) => (opts.weighting === 'relative' ? 1 / Math.max(Math.abs(p.force), floor) ** 2 : 1);

  const h = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  const c = new Array<number>(n).fill(0);
  const reach = new Array<number>(n).fill(0);
  for (const p of pts) {
    const row = designRow(knots, p.velocity);
    const w = weight(p);
    for (const { k, a } of row) {
      c[k] += w * a * p.force;
      reach[k] += Math.abs(a);
      for (const { k: k2, a: a2 } of row) h[k][k2] += w * a * a2;
    }
  }
  const vMaxMeasured = Math.max(...pts.map((p) => p.velocity));
  const unreached = knots.filter((_, k) => reach[k] === 0);
  if (unreached.length) {
    return {
      ok: false,
      message: `no measured point near ${unreached.map((k) => `${fmt(k)} m/s`).join(', ')}; measured speeds reach ${fmt(vMaxMeasured)} m/s. Remove those fit velocities or measure around them`,
    };
  }
  let f = solveSpd(h, c);
  if (!f) {
    return { ok: false, message: 'the measured points cannot fix every fit velocity (too few distinct speeds between some of them); use fewer fit velocities' };
  }
  const heldKnots: number[] = [];
  const rises = f[0] >= 0 && f.every((fi, i) => i === 0 || fi >= f![i - 1]);
  if (!rises) {
    // f = L·g with L lower-triangular ones and g ≥ 0: H_g = Lᵀ H L, c_g = Lᵀ c (suffix sums).
    const hs = h.map((row) => row.map((_, j) => row.slice(j).reduce((s, x) => s + x, 0)));
    const hg = hs.map((_, i) => hs[0].map((_, j) => hs.slice(i).reduce((s, row) => s + row[j], 0)));
    const cg = c.map((_, i) => c.slice(i).reduce((s, x) => s + x, 0));
    const g = nnls(hg, cg);
    let acc = 0;
    f = g.map((gi) => (acc += gi));
    const scale = Math.max(...f.map(Math.abs), 1);
    g.forEach((gi, i) => {
      if (gi <= 1e-9 * scale) heldKnots.push(knots[i]);
    });
  }
  const table = knots.map((k, i) => [k, f![i]] as [number, number]);
  const residuals: DynoFitResidual[] = pts.map((p) => {
    const fitted = designRow(knots, p.velocity).reduce((s, { k, a }) => s + a * f![k], 0);
    const residual = p.force - fitted;
    return { velocity: p.velocity, measured: p.force, fitted, residual, residualPct: p.force !== 0 ? (100 * residual) / Math.abs(p.force) : null };
  });
  const rms = (xs: number[]) => Math.sqrt(xs.reduce((s, x) => s + x * x, 0) / xs.length);
  const pct = residuals.flatMap((r) => (r.residualPct === null ? [] : [r.residualPct]));
  const notes: string[] = [];
  if (knots[n - 1] > vMaxMeasured) notes.push(`the fastest fit velocity ${fmt(knots[n - 1])} m/s lies beyond the fastest measured point (${fmt(vMaxMeasured)} m/s): its force is extrapolated`);
  for (const k of heldKnots) {
    const i = knots.indexOf(k);
    notes.push(i === 0 ? `force at ${fmt(k)} m/s held at 0 N (the data alone would make it negative)` : `force at ${fmt(k)} m/s held equal to the force at ${fmt(knots[i - 1])} m/s (the data alone would make it fall)`);
  }
  return {
    ok: true,
    table,
    residuals,
    rmsResidual: rms(residuals.map((r) => r.residual)),
    rmsResidualPct: pct.length ? rms(pct) : null,
    maxAbsResidual: Math.max(...residuals.map((r) => Math.abs(r.residual))),
    heldKnots,
    notes,
  };
}

/** Fits both directions; `knots` may be one list for both or one per direction. */
export function fitDamperCurves(
  peaks: DynoPeakPoints,
  knots: readonly number[] | { compression: readonly number[]; rebound: readonly number[] },
  opts: FitOptions = {},
): DynoFit {
  const per = Array.isArray(knots) ? { compression: knots, rebound: knots } : (knots as { compression: readonly number[]; rebound: readonly number[] });
  return {
    compression: fitDamperCurve(peaks.compression, per.compression, opts),
    rebound: fitDamperCurve(peaks.rebound, per.rebound, opts),
  };
}

/**
 * Suggested fit velocities for measured points: the given reference spread (m/s) kept between
 * the slowest and fastest measured speeds, plus the fastest measured speed when it lies more
 * than 20 % past the last kept one; velocities with no measured point between their
 * neighbours are dropped so the fit can fix every one.
 */
export function suggestFitKnots(points: readonly DynoPoint[], spread: readonly number[]): number[] {
  if (points.length === 0) return [];
  const speeds = points.map((p) => p.velocity).filter((v) => v > 0);
  if (speeds.length === 0) return [];
  const vMax = Math.max(...speeds);
  const vMin = Math.min(...speeds);
  let knots = [...spread].sort((a, b) => a - b).filter((v) => v >= vMin * (1 - 1e-9) && v <= vMax * (1 + 1e-9));
  if (vMax > (knots[knots.length - 1] ?? 0) * 1.2) knots.push(Number(vMax.toPrecision(3)) <= vMax ? Number(vMax.toPrecision(3)) : vMax);
  for (;;) {
    const reach = new Array<number>(knots.length).fill(0);
    for (const v of speeds) for (const { k, a } of designRow(knots, v)) reach[k] += Math.abs(a);
    const kept = knots.filter((_, k) => reach[k] > 0);
    if (kept.length === knots.length) return knots;
    knots = kept;
  }
}
