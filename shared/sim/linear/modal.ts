import type { Eigenvalue, ModalResult, ModeFigures } from '../../schemas/modal.ts';
import { eigenvalues } from './eigen.ts';
import type { LinearCorner } from './linear-corner.ts';
import { stateSpace } from './state-matrix.ts';

const TWO_PI = 2 * Math.PI;

/**
 * Modal figures of the linear corner. `dampingDefinition` states how the wheel damping was
 * obtained from the damper curves (shown to the user beside the figures).
 */
export function modalAnalysis(c: LinearCorner, dampingDefinition = 'linear damper coefficient'): ModalResult {
  const lambdas = eigenvalues(stateSpace(c).A);
  const [body, wheel] = pairModes(lambdas);
  const undamped = undampedFrequencies(c);
  const { sprungMass: ms, unsprungMass: mu, wheelRate: ks, tyreRate: kt, wheelDamping: cw } = c;
  const rideRate = (ks * kt) / (ks + kt);
  return {
    body,
    wheel,
    bodyUndampedHz: undamped[0],
    wheelUndampedHz: undamped[1],
    classic: {
      bodyHz: Math.sqrt(rideRate / ms) / TWO_PI,
      wheelHz: Math.sqrt((ks + kt) / mu) / TWO_PI,
      bodyDampingRatio: cw / (2 * Math.sqrt(ks * ms)),
    },
    equivalentDamping: { wheelDamping: cw, definition: dampingDefinition },
    eigenvalues: lambdas,
  };
}

/**
 * Undamped natural frequencies (Hz, ascending) from det(K − ω²M) = 0 with
 * M = diag(ms, mu) and K = [[ks, −ks], [−ks, ks + kt]].
 */
export function undampedFrequencies(c: LinearCorner): [number, number] {
  const { sprungMass: ms, unsprungMass: mu, wheelRate: ks, tyreRate: kt } = c;
  // ms·mu·ω⁴ − (ks·mu + (ks + kt)·ms)·ω² + ks·kt = 0
  const a = ms * mu;
  const b = ks * mu + (ks + kt) * ms;
  const cc = ks * kt;
  const root = Math.sqrt(b * b - 4 * a * cc);
  const high = (b + root) / (2 * a);
  // Product of the roots is cc/a: avoids cancellation in the small root.
  const low = cc / (a * high);
  return [Math.sqrt(low) / TWO_PI, Math.sqrt(high) / TWO_PI];
}

/** Figures of a conjugate pair (or of two real roots taken as one overdamped mode). */
function figuresOf(a: Eigenvalue, b: Eigenvalue): ModeFigures {
  if (a.im !== 0) {
    const wn = Math.hypot(a.re, a.im);
    return { naturalHz: wn / TWO_PI, dampedHz: Math.abs(a.im) / TWO_PI, dampingRatio: -a.re / wn };
  }
  // λ² + 2ζωλ + ω² = (λ − a)(λ − b): ω = √(ab), ζ = −(a + b)/(2ω) ≥ 1.
  const wn = Math.sqrt(a.re * b.re);
  return { naturalHz: wn / TWO_PI, dampedHz: 0, dampingRatio: -(a.re + b.re) / (2 * wn) };
}

/**
 * Groups four eigenvalues into two modes and names them by natural frequency (lower = body).
 * Real roots pair with each other: the two smallest together when all four are real.
 */
function pairModes(lambdas: Eigenvalue[]): [ModeFigures, ModeFigures] {
  const complex = lambdas.filter((l) => l.im > 0);
  const real = lambdas.filter((l) => l.im === 0).sort((x, y) => Math.abs(x.re) - Math.abs(y.re));
  // A top mount adds one real root, the mount relaxing through the damper: the fastest one.
  if (real.length % 2 === 1) real.pop();
  const modes: ModeFigures[] = complex.map((l) => figuresOf(l, { re: l.re, im: -l.im }));
  for (let i = 0; i + 1 < real.length; i += 2) modes.push(figuresOf(real[i], real[i + 1]));
  if (modes.length !== 2) throw new Error(`modalAnalysis: expected two modes, got ${modes.length}`);
  modes.sort((x, y) => x.naturalHz - y.naturalHz);
  return [modes[0], modes[1]];
}
