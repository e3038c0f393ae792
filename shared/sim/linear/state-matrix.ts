import type { LinearCorner } from './linear-corner.ts';

/**
 * State-space form of the linear corner with road displacement zr as input.
 *
 * The plain states (zs, żs, zu, żu) would need road velocity żr as a second input because the
 * tyre damper ct pushes with ct·(żr − żu). We use w = żu − (ct/mu)·zr as the fourth state
 * instead, which absorbs that term: ẋ = A x + B zr with x = (zs, żs, zu, w), and A equals the
 * plain A. Displacements are measured from static equilibrium, z up.
 *
 * Outputs y = C x + D zr + E żr, in this order: body acceleration (m/s²), suspension travel
 * zu − zs (m, compression positive) and dynamic tyre load Fz − Fz0 (N). Only the tyre load keeps
 * a road-velocity feed-through (E = ct): a damped point-contact tyre passes road velocity
 * straight to the contact force.
 */
export interface StateSpace {
  A: number[][];
  B: number[];
  C: number[][];
  D: number[];
  E: number[];
}

export function stateSpace(corner: LinearCorner): StateSpace {
  const { sprungMass: ms, unsprungMass: mu, wheelRate: ks, wheelDamping: c, tyreRate: kt, tyreDamping: ct } = corner;
  const A = [
    [0, 1, 0, 0],
    [-ks / ms, -c / ms, ks / ms, c / ms],
    [0, 0, 0, 1],
    [ks / mu, c / mu, -(ks + kt) / mu, -(c + ct) / mu],
  ];
  const r = ct / mu;
  const B = [0, (c * r) / ms, r, (kt - (c + ct) * r) / mu];
  const C = [A[1].slice(), [0, 0, 0, 0], [0, 0, -kt, -ct]];
  C[1][0] = -1;
  C[1][2] = 1;
  const D = [B[1], 0, kt - ct * r];
  const E = [0, 0, ct];
  return { A, B, C, D, E };
}
