import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { dominates, paretoFront, paretoFront2d } from './pareto.ts';

/** The definition, checked pair by pair. */
const bruteForce = (pts: number[][]) => pts.flatMap((p, i) => (pts.some((q, j) => j !== i && dominates(q, p)) ? [] : [i]));

// Small integer grids force many ties and duplicates; doubles cover the general case.
const smallInt = fc.integer({ min: 0, max: 6 });
const anyDouble = fc.double({ min: -1e6, max: 1e6, noNaN: true });

describe('paretoFront', () => {
  it('matches the brute-force dominance check on random 2-D sets (ties and duplicates included)', () => {
    for (const value of [smallInt, anyDouble]) {
      fc.assert(
        fc.property(fc.array(fc.tuple(value, value), { maxLength: 80 }), (pts) => {
          expect(paretoFront(pts)).toEqual(bruteForce(pts));
        }),
        { numRuns: 300, seed: 7 },
      );
    }
  });

  it('matches the brute-force check in 1, 3 and 4 dimensions', () => {
    for (const d of [1, 3, 4]) {
      fc.assert(
        fc.property(fc.array(fc.array(smallInt, { minLength: d, maxLength: d }), { maxLength: 60 }), (pts) => {
          expect(paretoFront(pts)).toEqual(bruteForce(pts));
        }),
        { numRuns: 150, seed: d },
      );
    }
  });

  it('orders the 2-D front by the first objective, for drawing', () => {
    const pts = [[3, 1], [1, 3], [2, 2], [2, 3], [1, 3]];
    expect(paretoFront2d(pts)).toEqual([1, 4, 2, 0]);
  });

  it('keeps both of two equal points, drops a point beaten in one figure and tied in the other', () => {
    expect(paretoFront([[1, 1], [1, 1], [1, 2], [2, 1]])).toEqual([0, 1]);
  });

  it('refuses NaN as a bug', () => {
    expect(() => paretoFront([[1, Number.NaN]])).toThrow();
  });
});
