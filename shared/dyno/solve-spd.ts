/**
 * Solves H z = c for a small symmetric positive definite H (row-major, n×n) by Cholesky.
 * Returns `undefined` when H is singular or nearly so: a pivot below `relTol` times the largest
 * diagonal entry. Sizes here are the number of knots of a fit (tens at most).
 */
export function solveSpd(h: readonly number[][], c: readonly number[], relTol = 1e-12): number[] | undefined {
  const n = c.length;
  if (n === 0) return [];
  const scale = Math.max(...h.map((row, i) => Math.abs(row[i])));
  if (!(scale > 0)) return undefined;
  const l: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let j = 0; j < n; j++) {
    let d = h[j][j];
    for (let k = 0; k < j; k++) d -= l[j][k] * l[j][k];
    if (!(d > relTol * scale)) return undefined;
    l[j][j] = Math.sqrt(d);
    for (let i = j + 1; i < n; i++) {
      let s = h[i][j];
      for (let k = 0; k < j; k++) s -= l[i][k] * l[j][k];
      l[i][j] = s / l[j][j];
    }
  }
  const y = new Array<number>(n);
  for (let i = 0; i < n; i++) {
    let s = c[i];
    for (let k = 0; k < i; k++) s -= l[i][k] * y[k];
    y[i] = s / l[i][i];
  }
  const z = new Array<number>(n);
  for (let i = n - 1; i >= 0; i--) {
    let s = y[i];
    for (let k = i + 1; k < n; k++) s -= l[k][i] * z[k];
    z[i] = s / l[i][i];
  }
  return z;
}
