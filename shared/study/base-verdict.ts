import type { StudyDefinition, StudyFigureKey } from '../schemas/study.ts';
import type { StudyCompromise, StudyPointResult } from '../schemas/study-result.ts';
import { studyFigureInfo } from './figures.ts';

/** How the unchanged base setup stands against the study's chosen point. */
export interface BaseVerdict {
  /** The base beats the chosen point on both axes of the trade-off chart. */
  beatsBestOnBoth: boolean;
  /** The base meets the study's limits. */
  feasible: boolean;
  /** Plain sentences, most important first; empty when there is nothing to say. */
  sentences: string[];
}

/** Figure value as text; the UI passes its own (display units), SI with three figures otherwise. */
export type FigureFormat = (key: StudyFigureKey, si: number) => string;
const siFormat: FigureFormat = (key, si) => `${Number(si.toPrecision(3))}${studyFigureInfo[key].unit ? ` ${studyFigureInfo[key].unit}` : ''}`;

/**
 * The base setup against the best compromise, on the two figures of the trade-off chart read by
 * their sense (lower or higher is better). When the base is no worse on both and better on at
 * least one, no point of the sweep improves on it there and the verdict says so plainly.
 */
export function baseVerdict(
  def: Pick<StudyDefinition, 'comfortFigure' | 'gripFigure'>,
  points: readonly StudyPointResult[],
  base: StudyPointResult | null,
  compromise: StudyCompromise | null,
  format: FigureFormat = siFormat,
): BaseVerdict | null {
  if (!base || !compromise?.ok) return null;
  const best = points[compromise.winner];
  if (!best) return null;
  const keys = [def.comfortFigure, def.gripFigure] as const;
  const cost = (k: StudyFigureKey, v: number) => (studyFigureInfo[k].goal === 'max' ? -v : v);
  const pairs = keys.map((k) => ({ k, base: base.figures[k], best: best.figures[k] }));
  if (pairs.some((p) => p.base === undefined || p.best === undefined)) return { beatsBestOnBoth: false, feasible: base.feasible, sentences: [] };
  const noWorse = pairs.every((p) => cost(p.k, p.base!) <= cost(p.k, p.best!));
  const better = pairs.some((p) => cost(p.k, p.base!) < cost(p.k, p.best!));
  const beatsBestOnBoth = noWorse && better;
  const figures = pairs.map((p) => `${studyFigureInfo[p.k].label} ${format(p.k, p.base!)} against ${format(p.k, p.best!)}`).join('; ');
  const sentences: string[] = [];
  if (beatsBestOnBoth && base.feasible) {
    sentences.push(`The base setup beats the best compromise on both axes (${figures}). No point of this sweep improves on it: keep the base, or sweep a range around it.`);
  } else if (beatsBestOnBoth) {
    sentences.push(`The base setup beats the best compromise on both axes (${figures}), but it breaks a limit: ${base.violations[0]?.message ?? 'see the table'}.`);
  } else if (!base.feasible) {
    sentences.push(`The base setup breaks a limit: ${base.violations[0]?.message ?? 'see the table'}.`);
  }
  return { beatsBestOnBoth, feasible: base.feasible, sentences };
}
