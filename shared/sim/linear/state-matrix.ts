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
  if (corner.mountRate !== undefined || corner.skyDamping !== undefined || corner.groundDamping !== undefined) return withParts(corner);
  const B = [0, (c * r) / ms, r, (kt - (c + ct) * r) / mu];
  const C = [A[1].slice(), [0, 0, 0, 0], [0, 0, -kt, -ct]];
  C[1][0] = -1;
  C[1][2] = 1;
  const D = [B[1], 0, kt - ct * r];
  const E = [0, 0, ct];
  return { A, B, C, D, E };
}

/**
 * The state matrix with the optional parts, for the modal figures: skyhook damping on the body
 * velocity, groundhook on the wheel velocity, and with a top mount a fifth state δ, its
 * deflection at the wheel. The damper c in series with the mount (km, cm) carries
 * F = c·(ẋ − δ̇) = km·δ + cm·δ̇, so δ̇ = (c·ẋ − km·δ)/(c + cm) and F = c·(km·δ + cm·ẋ)/(c + cm),
 * with ẋ = żu − żs (a rigid mount, km → ∞, gives F = c·ẋ again). Only A is filled: the road
 * input columns are not needed for eigenvalues.
 */
function withParts(corner: LinearCorner): StateSpace {
  const { sprungMass: ms, unsprungMass: mu, wheelRate: ks, wheelDamping: c, tyreRate: kt, tyreDamping: ct } = corner;
  const sky = corner.skyDamping ?? 0;
  const ground = corner.groundDamping ?? 0;
  const km = corner.mountRate;
  // Branch force F = fd·δ + fv·ẋ; mount rate δ̇ = gd·δ + gv·ẋ.
  const n = km === undefined ? 4 : 5;
  const cm = corner.mountDamping ?? 0;
  const fd = km === undefined ? 0 : (c * km) / (c + cm);
  const fv = km === undefined ? c : (c * cm) / (c + cm);
  const A = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  // States zs, żs, zu, żu (road input aside), [δ].
  A[0][1] = 1;
  A[2][3] = 1;
  A[1][0] = -ks / ms;
  A[1][2] = ks / ms;
  A[1][1] = (-fv - sky) / ms;
  A[1][3] = fv / ms;
  A[3][0] = ks / mu;
  A[3][2] = -(ks + kt) / mu;
  A[3][1] = fv / mu;
  A[3][3] = (-fv - ct - ground) / mu;
  if (km !== undefined) {
    A[1][4] = fd / ms;
    A[3][4] = -fd / mu;
    const gd = -km / (c + cm);
    const gv = c / (c + cm);
    A[4][4] = gd;
    A[4][1] = -gv;
    A[4][3] = gv;
  }
  return { A, B: new Array<number>(n).fill(0), C: [], D: [], E: [] };
}
