import { useEffect, useState } from 'react';
import { Spinner } from '../../../components/ui/spinner.tsx';
import { Notice } from '../../../components/ui/notice.tsx';
import { formatQuantityText } from '../../../lib/format.ts';
import type { SimulationState } from '../model/use-simulation.ts';

/** Running (with a clock), failed (with the reason), or nothing. */
export function RunStatus({ state }: { state: SimulationState }) {
  const [now, setNow] = useState(() => performance.now());
  useEffect(() => {
    if (state.status !== 'running') return;
    const timer = window.setInterval(() => setNow(performance.now()), 200);
    return () => window.clearInterval(timer);
  }, [state.status]);

  if (state.status === 'running') {
    return (
      <p role="status" aria-label="Run in progress" className="my-4 flex items-center gap-2 text-sm text-ink-soft">
        <Spinner label="Running" />
        Running {formatQuantityText(state.request.duration, 's')} of driving… <span className="figures text-ink-faint">{((now - state.startedAt) / 1000).toFixed(1)} s</span>
      </p>
    );
  }
  if (state.status === 'failed') {
    return (
      <Notice tone="danger" title="The run did not finish" className="my-4">
        <span data-testid="run-failure">{state.reason}</span>
      </Notice>
    );
  }
  return null;
}
