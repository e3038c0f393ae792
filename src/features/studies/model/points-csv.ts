import { csvNumber, FIGURE_DIGITS } from '../../../../shared/csv/csv-number.ts';
import { writeCsv } from '../../../../shared/csv/write-csv.ts';
import { studyFigureKeys } from '../../../../shared/schemas/study.ts';
import type { StudyPointResult } from '../../../../shared/schemas/study-result.ts';
import { describePoint } from '../../../../shared/study/describe-point.ts';
import { defaultStudyDisplay, type StudyDisplay } from './display.ts';
import type { StudyView } from './study-view.ts';

/**
 * The points table as CSV: one row per point (the base setup first when it ran), the swept
 * values and figures in the units the page shows (named in each header), whether the point
 * meets the limits and why not, its weighted score and whether it is on the front. Plain
 * numbers, full precision, so a spreadsheet can redo any sum.
 */
export function pointsCsv(view: StudyView, d: StudyDisplay = defaultStudyDisplay): string {
  const { figureLabel, figureToDisplay, parameterLabel, parameterToDisplay } = d;
  const { definition: def } = view;
  const present = studyFigureKeys.filter((k) => [view.base, ...view.points].some((p) => p?.figures[k] !== undefined));
  const scores = view.compromise?.ok ? view.compromise.scores : null;
  const front = new Set((view.compromise?.ok ? view.compromise.front : []).map((pos) => view.points[pos]?.index));
  const best = view.compromise?.ok ? view.points[view.compromise.winner]?.index : undefined;
  const header = ['point', 'description', ...def.axes.map((a) => parameterLabel(a.parameter)), 'meets limits', 'limits broken', 'score', 'on front', 'best compromise', ...present.map((k) => figureLabel(k))];
  const row = (p: StudyPointResult, pos: number | null) => [
    p.index === -1 ? 'base' : p.index,
    describePoint(def.axes, p.values, d.parameterWords),
    ...def.axes.map((a) => (p.values[a.parameter] === undefined ? '' : Number(parameterToDisplay(a.parameter, p.values[a.parameter]!).toPrecision(12)))),
    p.feasible ? 'yes' : 'no',
    p.violations.map((v) => v.message).join('; '),
    pos !== null && scores?.[pos] != null ? csvNumber(scores[pos], FIGURE_DIGITS) : '',
    front.has(p.index) && p.index >= 0 ? 'yes' : '',
    p.index === best ? 'yes' : '',
    ...present.map((k) => (p.figures[k] === undefined ? '' : csvNumber(figureToDisplay(k, p.figures[k]!), FIGURE_DIGITS))),
  ];
  const rows = [...(view.base ? [row(view.base, null)] : []), ...view.points.map((p, pos) => row(p, pos))];
  return `${writeCsv([header, ...rows])}\n`;
}
