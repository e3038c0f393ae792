import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DamperCurve } from '../schemas/setup.ts';
import { DynoDirectionFit, type DynoPoint } from '../schemas/dyno.ts';
import { tableForce } from '../sim/damper-force.ts';
import { fitDamperCurve, fitDamperCurves, suggestFitKnots } from './fit-curve.ts';

const sse = (table: [number, number][], pts: DynoPoint[]) => pts.reduce((s, p) => s + (p.force - tableForce(table, p.velocity)) ** 2, 0);

function fitted(points: DynoPoint[], knots: number[], opts = {}) {
  const r = fitDamperCurve(points, knots, opts);
  if (!r.ok) throw new Error(r.message);
  expect(DynoDirectionFit.safeParse(r).success).toBe(true);
  return r;
}

describe('fitDamperCurve', () => {
  it('returns the curve itself when the points lie on a table with the same knots', () => {
    const truth: [number, number][] = [[0.05, 250], [0.1, 350], [0.3, 750], [1, 1310]];
    const pts = [0.02, 0.04, 0.07, 0.1, 0.2, 0.25, 0.5, 0.8, 1.2].map((v) => ({ velocity: v, force: tableForce(truth, v) }));
    const r = fitted(pts, [0.05, 0.1, 0.3, 1]);
    r.table.forEach(([v, f], i) => {
      expect(v).toBe(truth[i][0]);
      expect(f).toBeCloseTo(truth[i][1], 8);
    });
    expect(r.rmsResidual).toBeLessThan(1e-8);
    expect(r.heldKnots).toEqual([]);
    expect(DamperCurve.safeParse(r.table).success).toBe(true);
  });

  it('reports residuals per point in N and % (measured − fitted)', () => {
    const pts = [{ velocity: 0.1, force: 110 }, { velocity: 0.1, force: 90 }];
    const r = fitted(pts, [0.1]);
    expect(r.table[0][1]).toBeCloseTo(100, 10);
    expect(r.residuals[0]).toMatchObject({ measured: 110, residual: expect.closeTo(10, 9), residualPct: expect.closeTo(100 / 11, 9) });
    expect(r.rmsResidual).toBeCloseTo(10, 9);
    expect(r.maxAbsResidual).toBeCloseTo(10, 9);
  });

  it('is the least-squares optimum among all non-decreasing tables on those knots (random data)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ velocity: fc.double({ min: 0.01, max: 1.2, noNaN: true }), force: fc.double({ min: -50, max: 2000, noNaN: true }) }), { minLength: 12, maxLength: 40 }),
        fc.array(fc.tuple(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true })), { minLength: 20, maxLength: 20 }),
        (pts, trials) => {
          const knots = [0.1, 0.3, 0.6, 1.0];
          const r = fitDamperCurve(pts, knots);
          if (!r.ok) return; // a knot without data near it: covered by its own test
          const best = sse(r.table, pts);
          for (let i = 1; i < r.table.length; i++) expect(r.table[i][1]).toBeGreaterThanOrEqual(r.table[i - 1][1]);
          expect(r.table[0][1]).toBeGreaterThanOrEqual(0);
          // small feasible moves around the answer, and random feasible tables, never do better
          for (const [a, b] of trials) {
            const k = Math.min(knots.length - 1, Math.floor(a * knots.length));
            const moved = r.table.map(([v, f]) => [v, f] as [number, number]);
            moved[k][1] += (b - 0.5) * 20;
            const feasible = moved.every(([, f], i) => f >= (i ? moved[i - 1][1] : 0));
            if (feasible) expect(sse(moved, pts)).toBeGreaterThanOrEqual(best * (1 - 1e-9) - 1e-9);
            let acc = 0;
            const random = knots.map((v, i) => [v, (acc += (i === 0 ? a : b) * 800)] as [number, number]);
            expect(sse(random, pts)).toBeGreaterThanOrEqual(best * (1 - 1e-9) - 1e-9);
          }
        },
      ),
      { numRuns: 150, seed: 42 },
    );
  });

  it('holds force level where the data would make it fall, and says so', () => {
    const pts = [
      { velocity: 0.1, force: 500 },
      { velocity: 0.2, force: 700 },
      { velocity: 0.3, force: 600 },
      { velocity: 0.4, force: 900 },
    ];
    const r = fitted(pts, [0.1, 0.2, 0.3, 0.4]);
    expect(r.table[2][1]).toBeCloseTo(r.table[1][1], 9);
    expect(r.table[1][1]).toBeCloseTo(650, 9); // the pair 700/600 is best met by their mean
    expect(r.heldKnots).toEqual([0.3]);
    expect(r.notes.join(' ')).toMatch(/force at 0.3 m\/s held equal to the force at 0.2 m\/s/);
    expect(DamperCurve.safeParse(r.table).success).toBe(true);
  });

  it('holds the first knot at 0 N rather than going negative', () => {
    const r = fitted([{ velocity: 0.05, force: -20 }, { velocity: 0.2, force: 400 }], [0.05, 0.2]);
    expect(r.table[0][1]).toBe(0);
    expect(r.heldKnots).toEqual([0.05]);
  });

  it('fits points beyond the last knot through its extrapolation and notes a knot past the data', () => {
    const truth: [number, number][] = [[0.1, 200], [0.3, 500]];
    const pts = [0.05, 0.2, 0.6, 0.9].map((v) => ({ velocity: v, force: tableForce(truth, v) }));
    expect(fitted(pts, [0.1, 0.3]).table[1][1]).toBeCloseTo(500, 8);
    const past = fitted(pts.slice(0, 2), [0.1, 0.3]);
    expect(past.notes[0]).toMatch(/0.3 m\/s lies beyond the fastest measured point \(0.2 m\/s\)/);
  });

  it('gives slow points more say with relative weighting', () => {
    const pts = [{ velocity: 0.05, force: 100 }, { velocity: 0.5, force: 1300 }, { velocity: 1, force: 1700 }];
    const abs = fitted(pts, [1]);
    const rel = fitted(pts, [1], { weighting: 'relative' });
    expect(Math.abs(rel.residuals[0].residualPct!)).toBeLessThan(Math.abs(abs.residuals[0].residualPct!));
  });

  it.each([
    [[0.1, 0.5, 0.9], /no measured point near 0.9 m\/s; measured speeds reach 0.4 m\/s/],
    [[], /at least one fit velocity/],
    [[0.2, 0.1], /must rise \(0.1 m\/s after 0.2 m\/s\)/],
    [[0, 0.1], /above 0/],
  ])('fails with a reason for knots %j', (knots, message) => {
    const pts = [0.1, 0.2, 0.4].map((v) => ({ velocity: v, force: 1000 * v }));
    const r = fitDamperCurve(pts, knots);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(message);
  });

  it('fits both directions with their own knots', () => {
    const r = fitDamperCurves(
      { compression: [{ velocity: 0.1, force: 300 }], rebound: [{ velocity: 0.2, force: 900 }] },
      { compression: [0.1], rebound: [0.2] },
    );
    expect(r.compression.ok && r.compression.table).toEqual([[0.1, 300]]);
    expect(r.rebound.ok && r.rebound.table[0][1]).toBeCloseTo(900, 9);
  });
});

describe('suggestFitKnots', () => {
  it('keeps the spread inside the measured range and adds the top speed', () => {
    const pts = [0.03, 0.06, 0.12, 0.25, 0.4, 0.8].map((v) => ({ velocity: v, force: v * 1000 }));
    expect(suggestFitKnots(pts, [0.025, 0.05, 0.1, 0.2, 0.3, 0.5, 1.0])).toEqual([0.05, 0.1, 0.2, 0.3, 0.5, 0.8]);
  });

  it('drops speeds no point can fix', () => {
    const pts = [0.05, 1.0].map((v) => ({ velocity: v, force: v * 1000 }));
    const knots = suggestFitKnots(pts, [0.05, 0.1, 0.2, 0.5, 1.0]);
    expect(fitDamperCurve(pts, knots).ok).toBe(true);
    expect(knots).toContain(0.05);
    expect(knots).toContain(1.0);
  });
});
