import type { StudyDefinition } from '../../../../shared/schemas/study.ts';

/** What the views read of a definition: a shared study's (without base ids) will do. */
type ViewedDefinition = Omit<StudyDefinition, 'base' | 'roads'> & { roads: ReadonlyArray<Pick<StudyDefinition['roads'][number], 'name' | 'seed' | 'source'>> };
import type { StudyCompromise, StudyPointResult, StudyTradeOff } from '../../../../shared/schemas/study-result.ts';
import { studyBestCompromise, studyTradeOff } from '../../../../shared/study/study-compromise.ts';
import { defaultStudyDisplay, type StudyDisplay } from './display.ts';

/**
 * What the study views draw: the points in sweep order and, once a run is over, the best
 * compromise and the comfort/grip front. Positions in `compromise` and `tradeOff` index into
 * `points` (which may have gaps in sweep order after a cancelled run), not point indices.
 */
export interface StudyView {
  definition: ViewedDefinition;
  points: StudyPointResult[];
  base: StudyPointResult | null;
  /** null while a run is going: the verdict is worked out once, on the final set. */
  compromise: StudyCompromise | null;
  tradeOff: StudyTradeOff | null;
}

/** `d` names the points in the compromise's sentences in the reader's units. */
export function studyView(definition: ViewedDefinition, points: readonly StudyPointResult[], base: StudyPointResult | null, final: boolean, d: StudyDisplay = defaultStudyDisplay): StudyView {
  const sorted = [...points].sort((a, b) => a.index - b.index);
  return {
    definition,
    points: sorted,
    base,
    compromise: final && sorted.length > 0 ? studyBestCompromise(definition, sorted, d.parameterWords, base) : null,
    tradeOff: final ? studyTradeOff(definition, sorted, base) : null,
  };
}

/** Position in `view.points` of the point with sweep index `index`, or −1. */
export const positionOf = (view: Pick<StudyView, 'points'>, index: number) => view.points.findIndex((p) => p.index === index);
