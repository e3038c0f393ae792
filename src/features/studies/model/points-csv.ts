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
 * numbers, full precision, so a spreadsheet can redo any sum. Over several road seeds each
 * figure (the mean over the seeds) is followed by its standard deviation, least and greatest.
 */
export function pointsCsv(view: StudyView, d: StudyDisplay = defaultStudyDisplay): string {
  const { figureLabel, figureToDisplay, parameterLabel, parameterToDisplay } = d;
  const { definition: def } = view;
  const present = studyFigureKeys.filter((k) => [view.base, ...view.points].some((p) => p?.figures[k] !== undefined));
  const scores = view.compromise?.ok ? view.compromise.scores : null;
  const front = new Set((view.compromise?.ok ? view.compromise.front : []).map((pos) => view.points[pos]?.index));
  const best = view.compromise?.ok ? view.points[view.compromise.winner]?.index : undefined;
  const seeded = (def.seeds ?? 1) > 1;
  const spreadOf = ['sd', 'min', 'max'] as const;
  const figureHeader = (k: (typeof present)[number]) => {
    if (!seeded) return [figureLabel(k)];
    // The unit stays last in each header, as elsewhere: "body acceleration RMS, sd over seeds [m/s²]".
    const label = figureLabel(k);
    const at = label.lastIndexOf(' [');
    const [name, unit] = at < 0 ? [label, ''] : [label.slice(0, at), label.slice(at)];
    return [`${name}, mean over seeds${unit}`, ...spreadOf.map((w) => `${name}, ${w} over seeds${unit}`)];
  };
  const header = ['point', 'description', ...def.axes.map((a) => parameterLabel(a.parameter)), 'meets limits', 'limits broken', 'score', 'on front', 'best compromise', ...present.flatMap(figureHeader)];
  const shown = (k: (typeof present)[number], v: number | undefined) => (v === undefined ? '' : csvNumber(figureToDisplay(k, v), FIGURE_DIGITS));
  const figureCells = (p: StudyPointResult, k: (typeof present)[number]) => {
    const mean = shown(k, p.figures[k]);
    if (!seeded) return [mean];
    const r = p.spread?.[k];
    // The sd is a difference, so it converts as one: the shown spread of mean ± sd, halved.
    const sd = r && p.figures[k] !== undefined ? csvNumber((figureToDisplay(k, p.figures[k]! + r.sd) - figureToDisplay(k, p.figures[k]! - r.sd)) / 2, FIGURE_DIGITS) : '';
    return [mean, sd, shown(k, r?.min), shown(k, r?.max)];
  };
  const row = (p: StudyPointResult, pos: number | null) => [
    p.index === -1 ? 'base' : p.index,
    describePoint(def.axes, p.values, d.parameterWords),
    ...def.axes.map((a) => (p.values[a.parameter] === undefined ? '' : Number(parameterToDisplay(a.parameter, p.values[a.parameter]!).toPrecision(12)))),
    p.feasible ? 'yes' : 'no',
    p.violations.map((v) => v.message).join('; '),
    pos !== null && scores?.[pos] != null ? csvNumber(scores[pos], FIGURE_DIGITS) : '',
    front.has(p.index) && p.index >= 0 ? 'yes' : '',
    p.index === best ? 'yes' : '',
    ...present.flatMap((k) => figureCells(p, k)),
  ];
  const rows = [...(view.base ? [row(view.base, null)] : []), ...view.points.map((p, pos) => row(p, pos))];
  return `${writeCsv([header, ...rows])}\n`;
}
