import { Matrix, solve } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { complexGains } from './frequency-response.ts';
import type { LinearCorner } from './linear-corner.ts';
import { stateSpace } from './state-matrix.ts';

const corner: LinearCorner = { sprungMass: 420, unsprungMass: 45, wheelRate: 26000, wheelDamping: 2200, tyreRate: 240000, tyreDamping: 300 };

/** y(jω) = C (jωI − A)⁻¹ B + D + jω E, solved as a real 8×8 system with ml-matrix. */
function stateSpaceGains(fHz: number): [number, number][] {
  const { A, B, C, D, E } = stateSpace(corner);
  const w = 2 * Math.PI * fHz;
  // (jωI − A)(xr + j xi) = B  →  [[−A, −ωI], [ωI, −A]] [xr; xi] = [B; 0]
  const M = Matrix.zeros(8, 8);
  for (let i = 0; i < 4; i++) {
    for (let j = 0; j < 4; j++) {
      M.set(i, j, -A[i][j]);
      M.set(i + 4, j + 4, -A[i][j]);
    }
    M.set(i, i + 4, -w);
    M.set(i + 4, i, w);
  }
  const x = solve(M, Matrix.columnVector([...B, 0, 0, 0, 0])).to1DArray();
  return C.map((row, k) => {
    let re = D[k];
    let im = w * E[k];
    for (let j = 0; j < 4; j++) {
      re += row[j] * x[j];
      im += row[j] * x[j + 4];
    }
    return [re, im];
  });
}

describe('state-space form with road displacement input', () => {
  it.each([0.3, 1.2, 5, 11, 40])('reproduces the two-mass frequency-domain equations at %f Hz', (f) => {
    const direct = complexGains(corner, f);
    const ss = stateSpaceGains(f);
    for (let k = 0; k < 3; k++) {
      const scale = Math.hypot(...direct[k]);
      expect(Math.abs(ss[k][0] - direct[k][0]) / scale).toBeLessThan(1e-9);
      expect(Math.abs(ss[k][1] - direct[k][1]) / scale).toBeLessThan(1e-9);
    }
  });

  it('keeps a road-velocity feed-through only for the tyre load, equal to the tyre damping', () => {
    expect(stateSpace(corner).E).toEqual([0, 0, 300]);
    expect(stateSpace({ ...corner, tyreDamping: 0 }).B).toEqual([0, 0, 0, 240000 / 45]);
  });
});
