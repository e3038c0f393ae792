import { describe, expect, it } from 'vitest';
import { Damper } from '../schemas/setup.ts';
import { equivalentDampingLeastSquares, equivalentDampingSecant, leastSquaresSlope } from './damper-equivalent.ts';

// Closed forms of the least-squares slope through the origin, c = ∫F·v dv / ∫v² dv, worked by hand.
describe('equivalent linear coefficient', () => {
  it('least squares of a straight line is its slope', () => {
    expect(leastSquaresSlope([[1, 2500]], 0.3)).toBeCloseTo(2500, 9);
  });

  it('least squares equals the closed form for a two-slope curve', () => {
    // F = 4000·v up to 0.05 m/s, then 200 + 1000·(v − 0.05) = 150 + 1000·v.
    // ∫0^0.3 F v dv = 4000·0.05³/3 + ∫0.05^0.3 (150 + 1000 v) v dv, divided by 0.3³/3.
    const table = [[0.05, 200], [0.3, 450]] as const;
    const num = (4000 * 0.05 ** 3) / 3 + (150 * (0.3 ** 2 - 0.05 ** 2)) / 2 + (1000 * (0.3 ** 3 - 0.05 ** 3)) / 3;
    expect(leastSquaresSlope(table, 0.3)).toBeCloseTo(num / (0.3 ** 3 / 3), 9);
  });

  it('averages compression and rebound and states its definition', () => {
    const d = Damper.parse({ compression: [[1, 1000]], rebound: [[1, 3000]] });
    const ls = equivalentDampingLeastSquares(d);
    expect(ls.coefficient).toBeCloseTo(2000, 9);
    expect(ls.definition).toMatch(/least-squares.*0–0.3 m\/s/);
    const damper = Damper.parse({
      compression: [[0.05, 100], [0.1, 150], [0.3, 250]],
      rebound: [[0, 0], [0.05, 200], [0.2, 500]],
    });
    const sec = equivalentDampingSecant(damper, 0.1);
    expect(sec.compression).toBeCloseTo(1500, 9);
    expect(sec.rebound).toBeCloseTo(3000, 9);
    expect(sec.coefficient).toBeCloseTo(2250, 9);
    expect(sec.definition).toMatch(/secant.*0.1 m\/s/);
  });
});
