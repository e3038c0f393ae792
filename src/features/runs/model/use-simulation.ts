import { useCallback, useEffect, useRef, useState } from 'react';
import type { Road } from '../../../../shared/schemas/road.ts';
import type { RunRequestInput } from '../../../../shared/schemas/run.ts';
import type { Setup } from '../../../../shared/schemas/setup.ts';
import { simulate } from '../../../lib/simulate-client.ts';
import { type RunView, viewOfFresh } from './run-view.ts';

/** What a run looks like to the page. */
export type SimulationState =
  | { status: 'idle' }
  | { status: 'running'; startedAt: number; request: RunRequestInput }
  | { status: 'done'; view: RunView; request: RunRequestInput; elapsedMs: number }
  | { status: 'failed'; reason: string; request: RunRequestInput };

export interface RunInput {
  setup: Setup;
  road: Road;
  speed: number;
  duration: number;
  seed?: number;
}

/**
 * One run at a time in a worker. `start` cancels a run still going; `cancel` stops it and
 * returns to idle (a cancelled run leaves no result behind: the last one is cleared too, so a
 * stale figure is never read as the current one).
 */
export function useSimulation() {
  const [state, setState] = useState<SimulationState>({ status: 'idle' });
  const controller = useRef<AbortController | null>(null);

  useEffect(() => () => controller.current?.abort(), []);

  const start = useCallback(async (input: RunInput) => {
    controller.current?.abort();
    const mine = new AbortController();
    controller.current = mine;
    const request: RunRequestInput = { setup: input.setup, road: input.road, speed: input.speed, duration: input.duration, seed: input.seed };
    const startedAt = performance.now();
    setState({ status: 'running', startedAt, request });
    const outcome = await simulate(request, { signal: mine.signal });
    if (controller.current !== mine) return;
    controller.current = null;
    if (outcome.ok) {
      setState({ status: 'done', view: viewOfFresh(outcome, input.setup, input.road, input.seed), request, elapsedMs: performance.now() - startedAt });
    } else if ('cancelled' in outcome) {
      setState({ status: 'idle' });
    } else {
      setState({ status: 'failed', reason: outcome.reason, request });
    }
  }, []);

  const cancel = useCallback(() => {
    controller.current?.abort();
    controller.current = null;
    setState({ status: 'idle' });
  }, []);

  return { state, start, cancel };
}
