import type { StudyFigureKey, StudyFigures } from '../schemas/study.ts';
import { studyFigureInfo } from './figures.ts';

/**
 * Combines the figures of one point's runs (its roads and speeds) into one set. `mean`: the
 * arithmetic mean of each figure (an RMS figure averages as is, not as a pooled RMS); `worst`:
 * the worst value by the figure's sense (the highest, or the lowest for higher-is-better figures
 * such as minimum tyre load). A figure is kept only when every run has it; no runs, no figures.
 */
export function aggregateFigures(runs: readonly StudyFigures[], mode: 'mean' | 'worst'): StudyFigures {
  const out: StudyFigures = {};
  if (runs.length === 0) return out;
  for (const key of Object.keys(studyFigureInfo) as StudyFigureKey[]) {
    const values = runs.map((r) => r[key]);
    if (values.some((v) => v === undefined)) continue;
    const xs = values as number[];
    if (mode === 'mean') out[key] = xs.reduce((s, x) => s + x, 0) / xs.length;
    else out[key] = studyFigureInfo[key].goal === 'max' ? Math.min(...xs) : Math.max(...xs);
  }
  return out;
}
