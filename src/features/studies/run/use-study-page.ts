import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useMemo, useRef } from 'react';
import { studyRoadNames } from '../../../../shared/study/collect.ts';
import { useDeleteStudy } from '../api/delete-study.ts';
import { useStudy } from '../api/get-study.ts';
import { rememberStudy } from '../api/query-keys.ts';
import { useSetStudyBaseline } from '../api/set-study-baseline.ts';
import { useShareStudy } from '../api/share-study.ts';
import { useStudyDisplay } from '../model/display.ts';
import { studyView } from '../model/study-view.ts';
import { prewarmStudyPool } from './study-pool.ts';
import { useStudyRun } from './use-study-run.ts';

/**
 * Everything the study page reads and does: the study, its run (saved for engineers, a preview
 * for viewers), the results view of whichever points are newest, and the point and study actions.
 */
export function useStudyPage(opts: { workspaceId: string; studyId: string; canSave: boolean }) {
  const { workspaceId, studyId, canSave } = opts;
  const queryClient = useQueryClient();
  const study = useStudy(workspaceId, studyId);
  const { state, start, cancel } = useStudyRun({
    workspaceId,
    studyId,
    save: canSave,
    onSaved: (detail) => rememberStudy(queryClient, workspaceId, detail),
  });
  const baseline = useSetStudyBaseline(workspaceId, studyId);
  const share = useShareStudy(workspaceId, studyId);
  const remove = useDeleteStudy(workspaceId);

  useEffect(() => prewarmStudyPool(), []);

  const detail = study.data;
  const running = state.phase === 'running' || state.phase === 'saving';
  const run = () => detail && start({ definition: detail.definition, baseSetup: detail.baseSetup, roads: detail.roads });

  const display = useStudyDisplay();
  const view = useMemo(() => {
    if (!detail) return null;
    if (state.phase !== 'idle') return studyView(detail.definition, state.points, state.base, state.phase === 'finished' || state.phase === 'saving', display);
    return studyView(detail.definition, detail.points, detail.basePoint, true, display);
  }, [detail, state.phase, state.points, state.base, display]);
  const roadNames = useMemo(() => (detail ? studyRoadNames(detail.definition, detail.roads) : []), [detail]);

  return { study, state, cancel, run, running, view, roadNames, baseline, share, remove, canStart: Boolean(detail) && canSave && state.phase === 'idle' };
}

/**
 * Starts a run once when the page was opened asking for one (a new study's first run) and a run
 * can start; `clearAsk` drops the request so a reload does not run again.
 */
export function useRunWhenAsked(asked: boolean, canStart: boolean, run: () => void, clearAsk: () => void) {
  // The latest callbacks, read when the effect fires: a new closure each render must not re-run it.
  const latest = useRef({ run, clearAsk });
  latest.current = { run, clearAsk };
  useEffect(() => {
    if (!asked || !canStart) return;
    latest.current.clearAsk();
    latest.current.run();
  }, [asked, canStart]);
}
