import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { bestCompromise, type CompromiseObjective, type CompromisePoint } from './best-compromise.ts';
import { dominates } from './pareto.ts';

const comfort: CompromiseObjective = { label: 'Wk-weighted body acceleration', unit: 'm/s²', weight: 1, goal: 'min' };
const grip: CompromiseObjective = { label: 'tyre load variation', unit: '', weight: 1, goal: 'min' };

/** Exhaustive: every feasible point's weighted scaled score, written out independently. */
function exhaustive(points: CompromisePoint[], objectives: CompromiseObjective[]) {
  const feasible = points.map((p, i) => ({ p, i })).filter(({ p }) => p.feasible);
  const cost = (v: number, o: CompromiseObjective) => (o.goal === 'max' ? -v : v);
  let best = Infinity;
  const scores = new Map<number, number>();
  for (const { p, i } of feasible) {
    let s = 0;
    let w = 0;
    objectives.forEach((o, k) => {
      if (o.weight === 0) return;
      const cs = feasible.map(({ p: q }) => cost(q.values[k]!, o));
      const lo = Math.min(...cs);
      const hi = Math.max(...cs);
      s += o.weight * (hi > lo ? (cost(p.values[k]!, o) - lo) / (hi - lo) : 0);
      w += o.weight;
    });
    scores.set(i, s / w);
    best = Math.min(best, s / w);
  }
  return { best, scores };
}

describe('bestCompromise', () => {
  it('picks the minimum of the weighted scaled objective, as an exhaustive search does (random sets)', () => {
    const point = (d: number) => fc.record({ values: fc.array(fc.double({ min: -100, max: 100, noNaN: true }), { minLength: d, maxLength: d }), feasible: fc.boolean() });
    for (const d of [2, 3]) {
      fc.assert(
        fc.property(
          fc.array(point(d), { minLength: 1, maxLength: 40 }),
          fc.array(fc.integer({ min: 0, max: 5 }), { minLength: d, maxLength: d }),
          fc.array(fc.boolean(), { minLength: d, maxLength: d }),
          (raw, weights, maxGoals) => {
            const objectives = weights.map((w, k) => ({ label: `f${k}`, unit: '', weight: w, goal: maxGoals[k] ? 'max' : 'min' }) as CompromiseObjective);
            const points = raw.map((p, i) => ({ label: `p${i}`, values: p.values, feasible: p.feasible }));
            const r = bestCompromise(points, objectives);
            if (weights.every((w) => w === 0)) {
              expect(r).toMatchObject({ ok: false, reason: 'no-weight' });
              return;
            }
            if (!points.some((p) => p.feasible)) {
              expect(r).toMatchObject({ ok: false, reason: 'no-feasible-point' });
              return;
            }
            if (!r.ok) throw new Error('expected a winner');
            const { best, scores } = exhaustive(points, objectives);
            expect(points[r.winner].feasible).toBe(true);
            expect(r.score).toBeCloseTo(best, 9);
            expect(scores.get(r.winner)).toBeCloseTo(best, 9);
            for (const [i, s] of scores) expect(r.scores[i]).toBeCloseTo(s, 9);
            points.forEach((p, i) => {
              if (!p.feasible) expect(r.scores[i]).toBeNull();
            });
          },
        ),
        { numRuns: 300, seed: d },
      );
    }
  });

  it('with every weight above 0, the winner is on the Pareto front', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.integer({ min: 0, max: 9 }), fc.integer({ min: 0, max: 9 })), { minLength: 1, maxLength: 50 }), (vals) => {
        const points = vals.map((v, i) => ({ label: `p${i}`, values: v, feasible: true }));
        const r = bestCompromise(points, [comfort, grip]);
        if (!r.ok) throw new Error('expected a winner');
        expect(points.some((q) => dominates(q.values as number[], points[r.winner].values as number[]))).toBe(false);
        expect(r.front).toContain(r.winner);
      }),
      { numRuns: 200, seed: 3 },
    );
  });

  it('explains the trade against its front neighbours in plain words', () => {
    // Three front points: soft, middle, firm. The middle one wins with equal weights.
    const points: CompromisePoint[] = [
      { label: 'damper ×0.80', values: [0.5, 0.2], feasible: true },
      { label: 'damper ×1.00', values: [0.515, 0.0736], feasible: true },
      { label: 'damper ×1.20', values: [0.6, 0.07], feasible: true },
      { label: 'damper ×1.40', values: [0.7, 0.075], feasible: true }, // beaten by ×1.20
      { label: 'damper ×0.60', values: [0.45, 0.3], feasible: false },
    ];
    const r = bestCompromise(points, [comfort, grip]);
    if (!r.ok) throw new Error('expected a winner');
    expect(r.winner).toBe(1);
    expect(r.front).toEqual([0, 1, 2]);
    expect(r.neighbours.map((n) => n.index)).toEqual([0, 2]);
    expect(r.explanation[0]).toMatch(/^damper ×1.00 has the lowest weighted score, 0\.\d{3}, of the 4 points that meet the limits \(weights: Wk-weighted body acceleration 1, tyre load variation 1;/);
    expect(r.explanation[1]).toBe('1 point was left out for breaking a limit.');
    expect(r.neighbours[0].sentence).toBe('Compared with damper ×0.80: 3.0 % more Wk-weighted body acceleration for 63.2 % less tyre load variation.');
    expect(r.neighbours[1].sentence).toBe('Compared with damper ×1.20: 5.1 % more tyre load variation for 14.2 % less Wk-weighted body acceleration.');
  });

  it('treats a maximised figure as better when higher', () => {
    const minLoad: CompromiseObjective = { label: 'minimum tyre load', unit: 'N', weight: 1, goal: 'max' };
    const r = bestCompromise(
      [
        { label: 'a', values: [100], feasible: true },
        { label: 'b', values: [900], feasible: true },
      ],
      [minLoad],
    );
    expect(r.ok && r.winner).toBe(1);
  });

  it('breaks a tie by sweep order, preferring a point not beaten outright, and says so', () => {
    const points: CompromisePoint[] = [
      { label: 'p0', values: [1, 0], feasible: true },
      { label: 'p1', values: [0, 1], feasible: true },
      { label: 'p2', values: [0, 1], feasible: true },
    ];
    const r = bestCompromise(points, [comfort, grip]);
    if (!r.ok) throw new Error('expected a winner');
    expect(r.winner).toBe(0);
    expect(r.tiedWith).toEqual([1, 2]);
    expect(r.explanation.join(' ')).toMatch(/It ties with p1, p2; the first in sweep order/);
    // with grip weighed 0 the tied pair differs only in an unweighed figure: p1 still first
    const w = bestCompromise(points, [comfort, { ...grip, weight: 0 }]);
    expect(w.ok && w.winner).toBe(1);
  });

  it('reports when no point meets the limits', () => {
    const r = bestCompromise([{ label: 'a', values: [1, 2], feasible: false }, { label: 'b', values: [2, 1], feasible: false }], [comfort, grip]);
    expect(r).toEqual({ ok: false, reason: 'no-feasible-point', explanation: ['None of the 2 points meets the limits.', 'Relax a limit or widen the sweep.'] });
  });

  it('leaves out points missing a weighed figure, and scores a flat figure as 0', () => {
    const r = bestCompromise(
      [
        { label: 'a', values: [1, null], feasible: true },
        { label: 'b', values: [2, 5], feasible: true },
        { label: 'c', values: [3, 5], feasible: true },
      ],
      [comfort, grip],
    );
    if (!r.ok) throw new Error('expected a winner');
    expect(r.winner).toBe(1);
    expect(r.scores).toEqual([null, 0, 0.5]);
    expect(r.explanation).toContain('1 point was left out for a missing figure.');
  });
});

describe('best compromise scaled by the base setup', () => {
  // Two figures, both lower-is-better, equal weights. Scaled by the grid's range, adding a point
  // that is worse than both candidates moves the range and flips the winner between them; scaled
  // by the base's figures, each point's score is its own and the winner stays (issue: the
  // choice must not depend on how wide the grid was swept).
  const objectives = [
    { label: 'comfort', unit: 'm/s²', weight: 1, goal: 'min' as const },
    { label: 'grip', unit: '%', weight: 1, goal: 'min' as const },
  ];
  const p1 = { label: 'P1', values: [1.0, 10], feasible: true };
  const p2 = { label: 'P2', values: [1.2, 8], feasible: true };
  const worseInGrip = { label: 'wide-grip', values: [1.0, 30], feasible: true };
  const worseInComfort = { label: 'wide-comfort', values: [3.0, 8], feasible: true };
  const base = [1.1, 9];
  const winnerOf = (points: (typeof p1)[], reference?: number[]) => {
    const r = bestCompromise(points, objectives, reference);
    if (!r.ok) throw new Error(r.explanation.join(' '));
    return points[r.winner].label;
  };

  it('by the grid range, a wider sweep changes which of two points wins', () => {
    expect(winnerOf([p1, p2, worseInGrip])).toBe('P1');
    expect(winnerOf([p1, p2, worseInComfort])).toBe('P2');
  });

  it('by the base, the winner and its score stay whatever else was swept', () => {
    // P1: (1.0 − 1.1)/1.1 and (10 − 9)/9 average to +0.0101; P2: −0.0101 (hand-worked)
    expect(winnerOf([p1, p2, worseInGrip], base)).toBe('P2');
    expect(winnerOf([p1, p2, worseInComfort], base)).toBe('P2');
    const r = bestCompromise([p1, p2], objectives, base);
    if (!r.ok) throw new Error('no winner');
    expect(r.score).toBeCloseTo((0.1 / 1.1 - 1 / 9) / 2, 12);
    expect(r.explanation[0]).toMatch(/change from the base setup/);
  });

  it('falls back to the grid range, and says the choice depends on it, when the base lacks a figure', () => {
    const r = bestCompromise([p1, p2, worseInGrip], objectives, [1.1, null]);
    if (!r.ok) throw new Error('no winner');
    expect(r.explanation[0]).toMatch(/depends on the range swept/);
  });
});
