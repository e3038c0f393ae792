import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { SavedRun } from '../../../../shared/schemas/run-record.ts';
import { api } from '../../../lib/api-client.ts';
import { runDetailKey } from './query-keys.ts';

export const getRun = (workspaceId: string, runId: string) =>
  api.get(`/api/workspaces/${encodeURIComponent(workspaceId)}/runs/${encodeURIComponent(runId)}`, SavedRun);

/** A saved run never changes once stored, so it is read once per session. */
export const runQueryOptions = (workspaceId: string, runId: string | undefined) =>
  queryOptions({
    queryKey: runDetailKey(workspaceId, runId),
    queryFn: runId ? () => getRun(workspaceId, runId) : skipToken,
    staleTime: Infinity,
  });

export const useSavedRun = (workspaceId: string, runId: string | undefined) => useQuery(runQueryOptions(workspaceId, runId));
