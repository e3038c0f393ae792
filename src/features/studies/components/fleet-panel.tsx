import type { FleetProgress } from '../../../../shared/schemas/fleet.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Notice } from '../../../components/ui/notice.tsx';
import { formatDateTime, formatSig } from '../../../lib/format.ts';

const clock = (s: number) => (s >= 3600 ? `${Math.floor(s / 3600)} h ${Math.round((s % 3600) / 60)} min` : s >= 90 ? `${Math.floor(s / 60)} min ${Math.round(s % 60)} s` : `${formatSig(s, 2)} s`);

const words: Record<FleetProgress['state'], string> = {
  running: 'Running on the team’s workers',
  finishing: 'All runs in; ranking the points',
  complete: 'Finished on the team’s workers',
  cancelled: 'Stopped',
  failed: 'Failed on the team’s workers',
};

/**
 * A study's run on the team's workers as anyone opening the page sees it: progress, rate and time
 * left while it goes (it carries on with the page closed), how it ended after.
 */
export function FleetPanel({ run, canStop, stopping, onStop }: { run: FleetProgress; canStop: boolean; stopping: boolean; onStop: () => void }) {
  const going = run.state === 'running' || run.state === 'finishing';
  const share = run.runsTotal ? run.runsDone / run.runsTotal : 0;
  return (
    <section aria-label="Run on the team’s workers" className="rounded border border-rule bg-paper-raised px-4 py-3">
      <p className="mb-2 text-sm font-medium text-ink">
        {words[run.state]} <span className="font-normal text-ink-faint">· started by {run.startedBy.name}, {formatDateTime(run.startedAt)}</span>
      </p>
      <div className="flex flex-wrap items-center gap-x-5 gap-y-2">
        <div className="min-w-[16rem] flex-1">
          <div role="progressbar" aria-label="Runs done on the workers" aria-valuemin={0} aria-valuemax={run.runsTotal} aria-valuenow={run.runsDone} className="h-2.5 overflow-hidden rounded-sm bg-paper-sunk">
            <div className={`h-full ${going ? 'bg-accent' : run.state === 'complete' ? 'bg-ok' : 'bg-signal'} transition-[width] duration-300`} style={{ width: `${(100 * share).toFixed(1)}%` }} />
          </div>
        </div>
        <p className="figures text-sm text-ink-soft">
          {run.runsDone} / {run.runsTotal} runs · {run.unitsDone} / {run.unitsTotal} points
        </p>
        <p className="figures text-sm text-ink-soft" data-testid="fleet-rate">
          {run.runsPerSecond ? `${formatSig(run.runsPerSecond, 3)} runs/s` : going ? 'waiting for a worker…' : ''}
          {going && run.secondsLeft !== null ? ` · about ${clock(run.secondsLeft)} left` : ''}
        </p>
        {going && canStop && (
          <Button size="sm" variant="danger" busy={stopping} onClick={onStop}>
            Stop the run
          </Button>
        )}
      </div>
      {going && <p className="mt-2 text-xs text-ink-faint">The run carries on if you close this page; anyone in the workspace can follow it here.</p>}
      {run.state === 'cancelled' && <p className="mt-2 text-sm text-ink-soft">The finished points are kept; start it again to run the rest.</p>}
      {run.state === 'failed' && run.error && (
        <div className="mt-2">
          <Notice tone="danger" title="The run stopped">
            {run.error}
          </Notice>
        </div>
      )}
    </section>
  );
}
