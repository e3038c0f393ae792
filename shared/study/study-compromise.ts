import type { StudyDefinition, StudyObjective, StudyParameter } from '../schemas/study.ts';
import type { StudyCompromise, StudyPointResult, StudyTradeOff, StudyViolationKind } from '../schemas/study-result.ts';
import { bestCompromise } from './best-compromise.ts';
import { describePoint } from './describe-point.ts';
import { studyFigureInfo } from './figures.ts';
import { paretoFront2d } from './pareto.ts';

const kindWords: Record<StudyViolationKind, string> = {
  maxStrokeUsed: 'use too much stroke',
  maxLiftOffFraction: 'lift the wheel off too long',
  minTyreLoad: 'let the tyre load fall too low',
  minStaticSag: 'sit too high (too little static sag)',
  maxStaticSag: 'sit too low (too much static sag)',
  notCheckable: 'cannot be checked against the stroke limit (no stroke in the setup)',
  runFailed: 'had a run fail',
  setupInvalid: 'do not make a valid setup',
};

/**
 * The best compromise of a study's points (see `bestCompromise`): objectives and weights from the
 * definition, points named by their swept values. When no point is feasible the explanation
 * counts the points per broken limit.
 */
export function studyBestCompromise(
  def: { axes: readonly { parameter: StudyParameter }[]; objectives: readonly StudyObjective[] },
  points: readonly StudyPointResult[],
  format?: Parameters<typeof describePoint>[2],
  /** The base setup's results: figures are then scaled by the base's, not by the grid's range. */
  base?: StudyPointResult | null,
): StudyCompromise {
  const objectives = def.objectives.map((o) => ({ ...studyFigureInfo[o.figure], weight: o.weight }));
  const result = bestCompromise(
    points.map((p) => ({ label: describePoint(def.axes, p.values, format), values: p.objectives, feasible: p.feasible })),
    objectives,
    base?.feasible !== false ? base?.objectives : undefined,
  );
  if (result.ok || result.reason !== 'no-feasible-point') return result;
  const counts = new Map<StudyViolationKind, number>();
  for (const p of points) for (const kind of new Set(p.violations.map((v) => v.kind))) counts.set(kind, (counts.get(kind) ?? 0) + 1);
  const parts = [...counts].map(([kind, n]) => `${n} ${kindWords[kind]}`);
  return parts.length ? { ...result, explanation: [...result.explanation.slice(0, 1), `Of them: ${parts.join('; ')}.`, ...result.explanation.slice(1)] } : result;
}

/**
 * The comfort-against-grip front for the chart: feasible points with both figures, the
 * non-dominated ones (both figures read by their sense) ordered along the comfort axis. The base
 * setup, when given and within the limits, competes on the same terms: a point it beats on both
 * figures leaves the front, and `baseOnFront` says whether the base itself is on it.
 */
export function studyTradeOff(def: Pick<StudyDefinition, 'comfortFigure' | 'gripFigure'>, points: readonly StudyPointResult[], base: StudyPointResult | null = null): StudyTradeOff {
  const sense = (k: typeof def.comfortFigure) => (studyFigureInfo[k].goal === 'max' ? -1 : 1);
  const candidates = base ? [...points, base] : points;
  const usable = candidates.flatMap((p, i) => {
    const c = p.figures[def.comfortFigure];
    const g = p.figures[def.gripFigure];
    return p.feasible && c !== undefined && g !== undefined ? [{ i, xy: [sense(def.comfortFigure) * c, sense(def.gripFigure) * g] as [number, number] }] : [];
  });
  const all = paretoFront2d(usable.map((u) => u.xy)).map((m) => usable[m].i);
  const front = all.filter((i) => i < points.length);
  const result: StudyTradeOff = { comfortFigure: def.comfortFigure, gripFigure: def.gripFigure, front };
  if (base) result.baseOnFront = all.includes(points.length);
  return result;
}
