import { Button } from '../../../components/ui/button.tsx';
import { Notice } from '../../../components/ui/notice.tsx';
import { formatSig } from '../../../lib/format.ts';
import type { StudyRunState } from '../run/use-study-run.ts';

const clock = (s: number) => (s >= 90 ? `${Math.floor(s / 60)} min ${Math.round(s % 60)} s` : `${formatSig(s, 2)} s`);

/**
 * The run as it goes: a progress bar over all runs, the rate, the time left, and cancel. After
 * it: how it ended, and whether it was saved or only previewed.
 */
export function RunPanel({ state, onCancel }: { state: StudyRunState; onCancel: () => void }) {
  const p = state.progress;
  if (state.phase === 'idle' || !p) return null;
  const share = p.totalRuns ? p.doneRuns / p.totalRuns : 0;
  const running = state.phase === 'running';
  return (
    <section aria-label="Study run" className="rounded border border-rule bg-paper-raised px-4 py-3">
      <div className="flex flex-wrap items-center gap-x-5 gap-y-2">
        <div className="min-w-[16rem] flex-1">
          <div
            role="progressbar"
            aria-label="Runs done"
            aria-valuemin={0}
            aria-valuemax={p.totalRuns}
            aria-valuenow={p.doneRuns}
            className="h-2.5 overflow-hidden rounded-sm bg-paper-sunk"
          >
            <div className={`h-full ${running ? 'bg-accent' : state.end?.status === 'cancelled' ? 'bg-signal' : 'bg-ok'} transition-[width] duration-150`} style={{ width: `${(100 * share).toFixed(1)}%` }} />
          </div>
        </div>
        <p className="figures text-sm text-ink-soft" aria-live="off">
          {p.doneRuns} / {p.totalRuns} runs · {p.donePoints} / {p.totalPoints} points
        </p>
        <p className="figures text-sm text-ink-soft" data-testid="study-rate">
          {p.rate ? `${formatSig(p.rate, 3)} runs/s` : 'starting…'}
          {running && p.secondsLeft !== null ? ` · about ${clock(p.secondsLeft)} left` : ''}
          {!running ? ` · took ${clock(p.elapsedMs / 1000)}` : ''}
        </p>
        {running && (
          <Button size="sm" variant="danger" onClick={onCancel}>
            Stop the run
          </Button>
        )}
      </div>
      <RunOutcome state={state} />
    </section>
  );
}

function RunOutcome({ state }: { state: StudyRunState }) {
  const { end } = state;
  if (state.phase === 'saving') return <p className="mt-2 text-sm text-ink-soft">Saving the results…</p>;
  if (state.phase !== 'finished' || !end) return state.saving ? null : <p className="mt-2 text-sm text-ink-soft">Preview: these results stay in this browser and are not saved.</p>;
  const partial = end.status === 'cancelled';
  return (
    <div className="mt-2 space-y-2">
      {partial && (
        <Notice tone="signal">
          Stopped after {end.points.length} of the points. The finished points are kept{state.saving && end.points.length > 0 ? ' and saved as a partial result' : ''}; run again to
          complete the study.
        </Notice>
      )}
      {state.saveError && <Notice tone="danger" title="The results were not saved">{state.saveError}</Notice>}
      {state.saving && !state.saveError && state.savedDetail && <p className="text-sm text-ok">Saved: {state.savedDetail.status === 'complete' ? 'complete results' : 'partial results'}.</p>}
      {!state.saving && <p className="text-sm text-ink-soft">Preview only: nothing was saved.</p>}
    </div>
  );
}
