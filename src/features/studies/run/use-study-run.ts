import { useCallback, useEffect, useRef, useState } from 'react';
import type { StudyDetail, StudyPointUpload } from '../../../../shared/schemas/study-record.ts';
import type { StudyPointResult } from '../../../../shared/schemas/study-result.ts';
import { studyPointUpload } from '../../../../shared/study/collect.ts';
import { isApiError } from '../../../lib/api-client.ts';
import { finishStudyRun } from '../api/finish-study-run.ts';
import { saveStudyPoints } from '../api/save-study-points.ts';
import { type StudyProgress, type StudyRunEnd, type StudyRunHandle, type StudyRunInput, startStudyRun } from './run-study.ts';

/**
 * A study run for a page: progress, the points as they finish, cancel, and (when `save` is on)
 * saving them to the server in slices during the run, then closing the run as complete or
 * partial. A viewer's run is a preview: nothing leaves the browser. Leaving the page stops it.
 */

export type RunPhase = 'idle' | 'running' | 'saving' | 'finished';

export interface StudyRunState {
  phase: RunPhase;
  progress: StudyProgress | null;
  /** Finished points so far, in the order they finished (sort by index for tables). */
  points: StudyPointResult[];
  base: StudyPointResult | null;
  end: StudyRunEnd | null;
  /** Whether this run is being saved (engineers) or only previewed. */
  saving: boolean;
  saveError: string | null;
  /** The study as the server has it after the run was closed. */
  savedDetail: StudyDetail | null;
}

const idle: StudyRunState = { phase: 'idle', progress: null, points: [], base: null, end: null, saving: false, saveError: null, savedDetail: null };

/** Runs sent per save request while the run goes on. */
const SLICE_RUNS = 300;
/** Shortest time between two repaints of a running study, ms. */
const PAINT_MS = 200;

const upload = (p: StudyPointResult): StudyPointUpload => studyPointUpload(p);

export function useStudyRun(opts: { workspaceId: string; studyId: string; save: boolean; onSaved?: (detail: StudyDetail) => void }) {
  const [state, setState] = useState<StudyRunState>(idle);
  const handle = useRef<StudyRunHandle | null>(null);
  const optsRef = useRef(opts);
  optsRef.current = opts;

  // Leaving the page stops the run. The check is deferred a tick because React's strict mode
  // unmounts and mounts again at once in development; only a real unmount stays unmounted.
  const mounted = useRef(false);
  useEffect(() => {
    mounted.current = true;
    return () => {
      mounted.current = false;
      setTimeout(() => {
        if (!mounted.current) handle.current?.cancel();
      }, 0);
    };
  }, []);

  const start = useCallback((input: StudyRunInput) => {
    if (handle.current) return;
    const { workspaceId, studyId, save } = optsRef.current;
    const finished: StudyPointResult[] = [];
    let base: StudyPointResult | null = null;
    let pending: StudyPointResult[] = [];
    let pendingRuns = 0;
    let chain: Promise<void> = Promise.resolve();
    let saveError: string | null = null;
    const message = (e: unknown) => (isApiError(e) ? e.message : 'The results could not be saved.');

    const flush = () => {
      if (!save || pending.length === 0 || saveError) return;
      const slice = pending.map(upload);
      pending = [];
      pendingRuns = 0;
      chain = chain.then(async () => {
        if (saveError) return;
        try {
          await saveStudyPoints(workspaceId, studyId, slice);
        } catch (e) {
          saveError = message(e);
          setState((s) => ({ ...s, saveError }));
        }
      });
    };

    setState({ ...idle, phase: 'running', saving: save });
    let latest: StudyProgress | null = null;
    let timer: ReturnType<typeof setTimeout> | undefined;
    const paint = () => {
      timer = undefined;
      const progress = latest;
      setState((s) => ({ ...s, progress, points: finished.slice(), base }));
    };
    const h = startStudyRun(input, {
      onPoints: (points) => {
        for (const p of points) {
          if (p.index === -1) base = p;
          else finished.push(p);
          pending.push(p);
          pendingRuns += p.runs.length;
        }
        if (pendingRuns >= SLICE_RUNS) flush();
      },
      onProgress: (progress) => {
        latest = progress;
        // Repaint at most every PAINT_MS: the charts and table redraw with each paint, and the
        // main thread must stay free for the page (the run itself is in the workers).
        if (timer === undefined) timer = setTimeout(paint, PAINT_MS);
      },
    });
    handle.current = h;

    void h.done.then(async (end) => {
      handle.current = null;
      if (timer !== undefined) clearTimeout(timer);
      paint();
      if (!save) {
        setState((s) => ({ ...s, phase: 'finished', end, points: end.points, base: end.base }));
        return;
      }
      setState((s) => ({ ...s, phase: 'saving', end, points: end.points, base: end.base }));
      flush();
      await chain;
      let savedDetail: StudyDetail | null = null;
      if (!saveError && end.points.length > 0) {
        try {
          savedDetail = await finishStudyRun(workspaceId, studyId, { status: end.status === 'complete' ? 'complete' : 'partial', elapsedMs: end.elapsedMs, workers: end.workers });
          optsRef.current.onSaved?.(savedDetail);
        } catch (e) {
          saveError = message(e);
        }
      }
      setState((s) => ({ ...s, phase: 'finished', saveError, savedDetail }));
    });
  }, []);

  const cancel = useCallback(() => handle.current?.cancel(), []);
  const reset = useCallback(() => {
    if (!handle.current) setState(idle);
  }, []);

  return { state, start, cancel, reset };
}
