import type { StudyParameter, SweepAxis } from '../schemas/study.ts';
import type { StudyPointValues } from '../schemas/study-result.ts';
import { studyParameterInfo } from './describe-point.ts';
import { sweepValues } from './expand.ts';

/** A swept value of the chosen point that sits at the end of its range. */
export interface GridEdge {
  parameter: StudyParameter;
  side: 'lowest' | 'highest';
  value: number;
  sentence: string;
}

/**
 * Where the chosen point lies on the edge of the grid: for each swept setup parameter with at
 * least two values, whether its value is the lowest or highest tried. A best point on an edge
 * may be better still outside the range, so the sentence says which way to widen it. Speed is
 * left out: it is a condition of the run, not a choice of setup.
 */
export function gridEdges(
  axes: readonly Pick<SweepAxis, 'parameter' | 'from' | 'to' | 'steps' | 'spacing'>[],
  values: StudyPointValues,
  format: Partial<Record<StudyParameter, (x: number) => string>> = {},
): GridEdge[] {
  return axes.flatMap((axis) => {
    const v = values[axis.parameter];
    if (axis.parameter === 'speed' || v === undefined || axis.steps < 2) return [];
    const tried = sweepValues(axis);
    const low = Math.min(...tried);
    const high = Math.max(...tried);
    if (low === high) return [];
    const side = v === high ? 'highest' : v === low ? 'lowest' : null;
    if (!side) return [];
    const label = studyParameterInfo[axis.parameter].label;
    const shown = (format[axis.parameter] ?? studyParameterInfo[axis.parameter].format)(v);
    const way = side === 'highest' ? 'upward' : 'downward';
    return [{ parameter: axis.parameter, side, value: v, sentence: `Best point at the ${side} ${label} tried (${shown}) — widen the range ${way}.` }];
  });
}
