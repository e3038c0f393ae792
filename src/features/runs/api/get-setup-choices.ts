import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { RevisionsResponse, SetupRevision, SetupsResponse } from '../../../../shared/schemas/setup-record.ts';
import { api } from '../../../lib/api-client.ts';
import { workspaceKey } from '../../../lib/query-keys.ts';

/**
 * The setups a run can start from. Read-only views of the setups API, keyed under the setups
 * prefix so a change made on the setups pages refreshes them too.
 */
const setupsKey = (workspaceId: string) => [...workspaceKey(workspaceId), 'setups'] as const;
const ws = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}/setups`;

export const setupChoicesQueryOptions = (workspaceId: string) =>
  queryOptions({
    queryKey: [...setupsKey(workspaceId), 'run-choices'],
    queryFn: () => api.get(ws(workspaceId), SetupsResponse),
  });
export const useSetupChoices = (workspaceId: string) => useQuery(setupChoicesQueryOptions(workspaceId));

export const revisionChoicesQueryOptions = (workspaceId: string, setupId: string | undefined) =>
  queryOptions({
    queryKey: [...setupsKey(workspaceId), setupId ?? null, 'run-revisions'],
    queryFn: setupId ? () => api.get(`${ws(workspaceId)}/${encodeURIComponent(setupId)}/revisions`, RevisionsResponse) : skipToken,
  });
export const useRevisionChoices = (workspaceId: string, setupId: string | undefined) => useQuery(revisionChoicesQueryOptions(workspaceId, setupId));

/** One revision with its document. Revisions are immutable, so it never goes stale. */
export const revisionQueryOptions = (workspaceId: string, setupId: string | undefined, number: number | undefined) =>
  queryOptions({
    queryKey: [...setupsKey(workspaceId), setupId ?? null, 'run-revision', number ?? null],
    queryFn: setupId && number ? () => api.get(`${ws(workspaceId)}/${encodeURIComponent(setupId)}/revisions/${number}`, SetupRevision) : skipToken,
    staleTime: Infinity,
  });
export const useRevision = (workspaceId: string, setupId: string | undefined, number: number | undefined) =>
  useQuery(revisionQueryOptions(workspaceId, setupId, number));
