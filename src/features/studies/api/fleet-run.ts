import { useEffect } from 'react';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { FleetProgress, FleetStatus } from '../../../../shared/schemas/fleet.ts';
import { api } from '../../../lib/api-client.ts';
import { studyDetailKey, studyKey, studyListKey, studyPath } from './query-keys.ts';

/** A study on the team's workers: its state, start and cancel, and the live stream of its progress. */
const fleetPath = (workspaceId: string, studyId: string) => `${studyPath(workspaceId, studyId)}/fleet`;
const fleetKey = (workspaceId: string, studyId: string) => [...studyKey(workspaceId, studyId), 'fleet'] as const;

const fleetQueryOptions = (workspaceId: string, studyId: string) =>
  queryOptions({ queryKey: fleetKey(workspaceId, studyId), queryFn: () => api.get(fleetPath(workspaceId, studyId), FleetStatus) });

const live = (s: FleetStatus | undefined) => s?.run?.state === 'running' || s?.run?.state === 'finishing';

/**
 * The study's last run on the workers; while it goes, the server's event stream keeps it current
 * (closing the page only closes the stream). When it ends, the study is read again for its results.
 */
export function useFleetRun(workspaceId: string, studyId: string) {
  const queryClient = useQueryClient();
  const status = useQuery(fleetQueryOptions(workspaceId, studyId));
  const streaming = live(status.data);
  useEffect(() => {
    if (!streaming) return;
    const source = new EventSource(`${fleetPath(workspaceId, studyId)}/events`);
    source.addEventListener('progress', (e) => {
      const parsed = FleetProgress.nullable().safeParse(JSON.parse((e as MessageEvent<string>).data));
      if (!parsed.success) return;
      queryClient.setQueryData(fleetKey(workspaceId, studyId), (old: FleetStatus | undefined) => ({ available: old?.available ?? true, run: parsed.data }));
      if (parsed.data && parsed.data.state !== 'running' && parsed.data.state !== 'finishing') {
        source.close();
        void queryClient.invalidateQueries({ queryKey: studyDetailKey(workspaceId, studyId) });
        void queryClient.invalidateQueries({ queryKey: studyListKey(workspaceId) });
      }
    });
    // the browser reconnects by itself after a dropped connection; nothing to do here
    return () => source.close();
  }, [streaming, workspaceId, studyId, queryClient]);
  return status;
}

function useFleetAction(workspaceId: string, studyId: string, suffix: '' | '/cancel') {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post(`${fleetPath(workspaceId, studyId)}${suffix}`, {}, FleetStatus),
    onSuccess: (status) => {
      queryClient.setQueryData(fleetKey(workspaceId, studyId), status);
      void queryClient.invalidateQueries({ queryKey: studyDetailKey(workspaceId, studyId) });
    },
  });
}

export const useStartFleetRun = (workspaceId: string, studyId: string) => useFleetAction(workspaceId, studyId, '');
export const useCancelFleetRun = (workspaceId: string, studyId: string) => useFleetAction(workspaceId, studyId, '/cancel');
