import type { StudyFigureKey, StudyFigures } from '../schemas/study.ts';
import type { FigureSpread, StudyRunOutcome } from '../schemas/study-result.ts';
import { aggregateFigures } from './aggregate.ts';

/** Mean, sample standard deviation (n − 1; 0 for one value), least and greatest of a list. */
export function meanAndSpread(xs: readonly number[]): { mean: number; sd: number; min: number; max: number } {
  const n = xs.length;
  let sum = 0;
  let min = Infinity;
  let max = -Infinity;
  for (const x of xs) {
    sum += x;
    if (x < min) min = x;
    if (x > max) max = x;
  }
  // Equal values (an event road over every seed) give themselves and no spread, not a rounding residue.
  if (min === max) return { mean: min, sd: 0, min, max };
  const mean = sum / n;
  let ss = 0;
  for (const x of xs) ss += (x - mean) ** 2;
  return { mean, sd: n > 1 ? Math.sqrt(ss / (n - 1)) : 0, min, max };
}

/**
 * A point's figures over a seed ensemble: the runs of each seed are combined over roads and
 * speeds as a one-seed study would (mean or worst), then each figure is the mean of those
 * per-seed values, with their spread. A seed whose runs all failed is left out; a figure is kept
 * where every remaining seed has it. One seed (or runs without seed indices) gives exactly the
 * one-seed figures and no spread.
 */
export function ensembleFigures(runs: readonly StudyRunOutcome[], mode: 'mean' | 'worst', seeds: number): { figures: StudyFigures; spread?: Partial<Record<StudyFigureKey, FigureSpread>> } {
  const ok = (list: readonly StudyRunOutcome[]) => list.flatMap((r) => (r.figures ? [r.figures] : []));
  if (seeds <= 1) return { figures: aggregateFigures(ok(runs), mode) };
  const bySeed = new Map<number, StudyRunOutcome[]>();
  for (const r of runs) {
    const k = r.seedIndex ?? 0;
    const list = bySeed.get(k);
    if (list) list.push(r);
    else bySeed.set(k, [r]);
  }
  const perSeed = [...bySeed.keys()]
    .sort((a, b) => a - b)
    .map((k) => aggregateFigures(ok(bySeed.get(k)!), mode))
    .filter((f) => Object.keys(f).length > 0);
  const figures: StudyFigures = {};
  const spread: Partial<Record<StudyFigureKey, FigureSpread>> = {};
  if (perSeed.length === 0) return { figures, spread };
  for (const key of Object.keys(perSeed[0]) as StudyFigureKey[]) {
    const xs = perSeed.map((f) => f[key]);
    if (xs.some((x) => x === undefined)) continue;
    const s = meanAndSpread(xs as number[]);
    figures[key] = s.mean;
    spread[key] = { sd: s.sd, min: s.min, max: s.max, n: xs.length };
  }
  return { figures, spread };
}
