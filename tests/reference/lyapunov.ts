import { Matrix, solve } from 'ml-matrix';

/**
 * Stationary covariance P of ẋ = A x + B u with u white of two-sided intensity q
 * (E[u(t)u(t+τ)] = q δ(τ)): A P + P Aᵀ + q B Bᵀ = 0, solved as the vectorised Kronecker
 * system (I ⊗ A + A ⊗ I) vec P = −q vec(B Bᵀ) with ml-matrix. Test helper: outside reference.
 */
export function lyapunovCovariance(A: number[][], B: number[], q: number): Matrix {
  const n = A.length;
  const a = new Matrix(A);
  const eye = Matrix.eye(n);
  const kron = eye.kroneckerProduct(a).add(a.kroneckerProduct(eye));
  const rhs = new Matrix(n * n, 1);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) rhs.set(j * n + i, 0, -q * B[i] * B[j]);
  const vec = solve(kron, rhs).to1DArray();
  const P = new Matrix(n, n);
  // Column-major vec: P(i, j) = vec[j·n + i].
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) P.set(i, j, vec[j * n + i]);
  return P;
}

/** Variance of y = c·x. */
export function outputVariance(P: Matrix, c: number[]): number {
  const v = Matrix.rowVector(c);
  return v.mmul(P).mmul(v.transpose()).get(0, 0);
}
