import { queryOptions, useQuery } from '@tanstack/react-query';
import { RunList } from '../../../../shared/schemas/run-record.ts';
import { api } from '../../../lib/api-client.ts';
import { runListKey } from './query-keys.ts';

/** Saved runs of the workspace, or of one setup; newest first. */
export const getRuns = (workspaceId: string, setupId?: string) =>
  api.get(`/api/workspaces/${encodeURIComponent(workspaceId)}/runs`, RunList, { query: { setupId } });

export const runsQueryOptions = (workspaceId: string, setupId?: string) =>
  queryOptions({
    queryKey: [...runListKey(workspaceId), { setupId: setupId ?? null }],
    queryFn: () => getRuns(workspaceId, setupId),
  });

export const useRuns = (workspaceId: string, setupId?: string) => useQuery(runsQueryOptions(workspaceId, setupId));
