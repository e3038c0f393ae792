import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, useState } from 'react';
import { revisionQueryOptions } from '../../../lib/queries/revisions.ts';
import { simulate } from '../../../lib/simulate-client.ts';
import { runQueryOptions } from '../api/get-run.ts';
import { type CompareEntry, type ComparedRun, entryKey } from './compare.ts';
import { viewOfFresh, viewOfSaved } from './run-view.ts';
import type { Scenario } from './scenario.ts';

export type ComparisonState =
  | { status: 'idle' }
  | { status: 'running' }
  | { status: 'done'; runs: ComparedRun[]; failures: { label: string; reason: string }[] };

type Item = { ok: true; run: ComparedRun } | { ok: false; label: string; reason: string } | { ok: false; cancelled: true };

const reasonOf = (e: unknown) => (e instanceof Error ? e.message : String(e));

/**
 * Brings every entry to a RunView: setup revisions are run on the scenario in the worker pool
 * (in parallel, one worker each as far as the pool allows), saved runs are read back as stored.
 * Each entry keeps its position as its colour slot.
 */
export function useComparison(workspaceId: string) {
  const client = useQueryClient();
  const [state, setState] = useState<ComparisonState>({ status: 'idle' });
  const controller = useRef<AbortController | null>(null);
  useEffect(() => () => controller.current?.abort(), []);

  const compare = useCallback(
    async (entries: CompareEntry[], scenario: Scenario | null) => {
      controller.current?.abort();
      const mine = new AbortController();
      controller.current = mine;
      setState({ status: 'running' });

      const one = async (entry: CompareEntry, slot: number): Promise<Item> => {
        const key = entryKey(entry);
        if (entry.kind === 'saved') {
          try {
            const saved = await client.fetchQuery(runQueryOptions(workspaceId, entry.runId));
            const view = viewOfSaved(saved);
            return view.ok ? { ok: true, run: { key, label: saved.name, slot, view: view.view } } : { ok: false, label: saved.name, reason: view.reason };
          } catch (e) {
            return { ok: false, label: 'A saved run', reason: reasonOf(e) };
          }
        }
        let label = `Revision ${entry.revision}`;
        try {
          const revision = await client.fetchQuery(revisionQueryOptions(workspaceId, entry.setupId, entry.revision));
          label = `${revision.document.name} r${entry.revision}`;
          if (!scenario) return { ok: false, label, reason: 'no road, speed and duration to run it on' };
          const outcome = await simulate({ setup: revision.document, road: scenario.road, speed: scenario.speed, duration: scenario.duration, seed: scenario.seed }, { signal: mine.signal });
          if (outcome.ok) return { ok: true, run: { key, label, slot, view: viewOfFresh(outcome, revision.document, scenario.road, scenario.seed) } };
          return 'cancelled' in outcome ? { ok: false, cancelled: true } : { ok: false, label, reason: outcome.reason };
        } catch (e) {
          return { ok: false, label, reason: reasonOf(e) };
        }
      };

      const items = await Promise.all(entries.map(one));
      if (controller.current !== mine) return;
      controller.current = null;
      if (items.some((i) => !i.ok && 'cancelled' in i)) return setState({ status: 'idle' });
      setState({
        status: 'done',
        runs: items.flatMap((i) => (i.ok ? [i.run] : [])),
        failures: items.flatMap((i) => (!i.ok && 'reason' in i ? [{ label: i.label, reason: i.reason }] : [])),
      });
    },
    [client, workspaceId],
  );

  const cancel = useCallback(() => {
    controller.current?.abort();
    controller.current = null;
    setState({ status: 'idle' });
  }, []);

  return { state, compare, cancel };
}
