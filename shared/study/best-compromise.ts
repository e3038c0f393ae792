import type { StudyCompromise } from '../schemas/study-result.ts';
import { dominates, paretoFront } from './pareto.ts';

/** A figure judged by the compromise. */
export interface CompromiseObjective {
  /** Words for the explanation, e.g. "Wk-weighted body acceleration". */
  label: string;
  /** Unit for absolute differences, e.g. "m/s²". */
  unit: string;
  /** Share of the score; 0 leaves the figure out of the score and the explanation. */
  weight: number;
  /** `min`: lower is better (most figures); `max`: higher is better (e.g. minimum tyre load). */
  goal: 'min' | 'max';
}

export interface CompromisePoint {
  /** Words naming the point, e.g. "rebound ×1.20, spring rate 28 000 N/m". */
  label: string;
  /** One raw value per objective, in the objectives' order. */
  values: readonly (number | null)[];
  feasible: boolean;
}

/** How the winner compares with one neighbour on the Pareto front. */
export type NeighbourComparison = Extract<StudyCompromise, { ok: true }>['neighbours'][number];

/** The answer: the winner with scores, front and explanation, or why there is none. */
export type CompromiseResult = StudyCompromise;

const fmt = (x: number, digits = 3) => String(Number(x.toPrecision(digits)));
const pctText = (x: number) => `${Math.abs(x) < 0.05 ? Math.abs(x).toFixed(2) : Math.abs(x).toFixed(1)} %`;

/** "3.1 % more Wk-weighted body acceleration" (or an absolute difference when the other is 0). */
function deltaWords(o: CompromiseObjective, winner: number, other: number): string {
  const more = winner > other ? 'more' : 'less';
  if (other === 0) return `${fmt(Math.abs(winner - other))} ${o.unit} ${more} ${o.label}`.replace('  ', ' ');
  return `${pctText((100 * (winner - other)) / Math.abs(other))} ${more} ${o.label}`;
}

/**
 * The best compromise. Each weighed objective is scaled, the score is the weighted mean of the
 * scaled figures, and the lowest score wins. With a `reference` (the base setup's values, every
 * weighed one present and not 0) a figure is scaled as its change from the base's, relative to
 * it (−0.05 = 5 % better than the base): a point's score then does not depend on which other
 * points the sweep happened to include, so widening the grid cannot change the winner among
 * the points already there. Without one, each figure is scaled to [0, 1] over the feasible
 * points with every value present (0 = best seen, 1 = worst seen; equal everywhere scores 0),
 * which does depend on the grid, and the explanation says so. Ties go to a
 * point no other tied point dominates, then to the lowest index (sweep order).
 *
 * The explanation says why the winner wins and, against its neighbours on the Pareto front of
 * the weighed figures (the adjacent front points in 2-D, the two nearest in scaled space
 * otherwise), what it gives up for what it gains, e.g. "Compared with rebound ×1.40: 3.1 % more
 * Wk-weighted body acceleration for 8.0 % less tyre load variation."
 */
export function bestCompromise(points: readonly CompromisePoint[], objectives: readonly CompromiseObjective[], reference?: readonly (number | null)[]): CompromiseResult {
  const weighed = objectives.flatMap((o, k) => (o.weight > 0 ? [k] : []));
  if (weighed.length === 0) return { ok: false, reason: 'no-weight', explanation: ['Give at least one figure a weight above 0.'] };
  if (points.length === 0) return { ok: false, reason: 'no-points', explanation: ['The study has no finished points yet.'] };
  const complete = (p: CompromisePoint) => weighed.every((k) => typeof p.values[k] === 'number' && Number.isFinite(p.values[k]));
  const scored = points.flatMap((p, i) => (p.feasible && complete(p) ? [i] : []));
  const infeasible = points.filter((p) => !p.feasible).length;
  const incomplete = points.filter((p) => p.feasible && !complete(p)).length;
  if (scored.length === 0) {
    const why = infeasible === points.length ? `None of the ${points.length} points meets the limits.` : `No point meets the limits with every judged figure available.`;
    return { ok: false, reason: 'no-feasible-point', explanation: [why, 'Relax a limit or widen the sweep.'] };
  }
  const cost = (i: number, k: number) => (objectives[k].goal === 'max' ? -1 : 1) * (points[i].values[k] as number);
  const ranges = weighed.map((k) => {
    const cs = scored.map((i) => cost(i, k));
    return { objective: k, min: Math.min(...cs), max: Math.max(...cs) };
  });
  const refCost = (k: number) => (objectives[k].goal === 'max' ? -1 : 1) * (reference![k] as number);
  const byBase = !!reference && weighed.every((k) => typeof reference[k] === 'number' && Number.isFinite(reference[k]) && reference[k] !== 0);
  const scaled = (i: number) =>
    byBase
      ? weighed.map((k) => (cost(i, k) - refCost(k)) / Math.abs(reference![k] as number))
      : ranges.map((r) => (r.max > r.min ? (cost(i, r.objective) - r.min) / (r.max - r.min) : 0));
  const wSum = weighed.reduce((s, k) => s + objectives[k].weight, 0);
  const scores: (number | null)[] = points.map(() => null);
  for (const i of scored) scores[i] = scaled(i).reduce((s, x, m) => s + objectives[weighed[m]].weight * x, 0) / wSum;

  const best = Math.min(...scored.map((i) => scores[i]!));
  const tieTol = 1e-12 * Math.max(1, Math.abs(best));
  const tied = scored.filter((i) => scores[i]! - best <= tieTol);
  const costs = (i: number) => weighed.map((k) => cost(i, k));
  const winner = tied.find((i) => !tied.some((j) => j !== i && dominates(costs(j), costs(i)))) ?? tied[0];

  const frontLocal = paretoFront(scored.map(costs));
  const front = frontLocal.map((m) => scored[m]);
  const neighbours = pickNeighbours(winner, front, weighed.length === 2 ? costs : scaled).map((j) => compare(winner, j));

  function compare(i: number, j: number): NeighbourComparison {
    const deltas = weighed.map((k) => {
      const a = points[i].values[k] as number;
      const b = points[j].values[k] as number;
      return { objective: k, winner: a, other: b, pct: b !== 0 ? (100 * (a - b)) / Math.abs(b) : null };
    });
    const worse = deltas.filter((d) => cost(i, d.objective) > cost(j, d.objective)).map((d) => deltaWords(objectives[d.objective], d.winner, d.other));
    const better = deltas.filter((d) => cost(i, d.objective) < cost(j, d.objective)).map((d) => deltaWords(objectives[d.objective], d.winner, d.other));
    const head = `Compared with ${points[j].label}:`;
    const sentence =
      worse.length && better.length
        ? `${head} ${worse.join(' and ')} for ${better.join(' and ')}.`
        : worse.length
          ? `${head} ${worse.join(' and ')}, at a lower weighted score all the same.`
          : better.length
            ? `${head} ${better.join(' and ')}, giving up nothing.`
            : `${head} the same in every weighed figure.`;
    return { index: j, deltas, sentence };
  }

  const weights = weighed.map((k) => `${objectives[k].label} ${fmt(objectives[k].weight)}`).join(', ');
  const explanation = [
    `${points[winner].label} has the lowest weighted score, ${best.toFixed(3)}, of the ${scored.length} point${scored.length === 1 ? '' : 's'} that meet the limits (weights: ${weights}; ${
      byBase
        ? 'each figure as its change from the base setup, relative to the base: 0 is as good as the base, −0.05 is 5 % better'
        : 'each figure scaled from 0 at the best to 1 at the worst of those points, so the choice depends on the range swept; a base setup to compare with would remove that'
    }).`,
  ];
  if (infeasible) explanation.push(`${infeasible} point${infeasible === 1 ? ' was' : 's were'} left out for breaking a limit.`);
  if (incomplete) explanation.push(`${incomplete} point${incomplete === 1 ? ' was' : 's were'} left out for a missing figure.`);
  if (tied.length > 1) explanation.push(`It ties with ${tied.filter((i) => i !== winner).map((i) => points[i].label).join(', ')}; the first in sweep order not beaten outright is chosen.`);
  if (neighbours.length === 0) explanation.push(front.length <= 1 ? 'No other point matches it in any weighed figure.' : 'It has no neighbour on the trade-off front.');
  explanation.push(...neighbours.map((n) => n.sentence));
  return {
    ok: true,
    winner,
    score: best,
    scores,
    ranges,
    tiedWith: tied.filter((i) => i !== winner),
    front,
    neighbours,
    explanation,
  };
}

/**
 * The front points beside the winner: with two figures, the front's points just before and after
 * it along the first figure; with more, the two nearest in scaled space. The winner may sit off
 * the front (only when weights are 0 for some figure of a tie), then its nearest front points.
 */
function pickNeighbours(winner: number, front: number[], coords: (i: number) => number[]): number[] {
  const others = front.filter((i) => i !== winner);
  if (others.length === 0) return [];
  const w = coords(winner);
  if (w.length === 2 && front.includes(winner)) {
    const sorted = [...front].sort((a, b) => coords(a)[0] - coords(b)[0] || coords(a)[1] - coords(b)[1] || a - b);
    const at = sorted.indexOf(winner);
    return [sorted[at - 1], sorted[at + 1]].filter((i): i is number => i !== undefined);
  }
  const dist = (i: number) => coords(i).reduce((s, x, m) => s + (x - w[m]) ** 2, 0);
  return others.sort((a, b) => dist(a) - dist(b) || a - b).slice(0, 2);
}
