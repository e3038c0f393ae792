import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { RevisionsResponse, SetupsResponse } from '../../../../shared/schemas/setup-record.ts';
import { api } from '../../../lib/api-client.ts';
import { workspaceKey } from '../../../lib/query-keys.ts';

/**
 * The setups and revisions a sheet can be drafted from: read-only views of the setups API, kept
 * under the setups key prefix so a change on the setups pages refreshes them too.
 */
const setupsKey = (workspaceId: string) => [...workspaceKey(workspaceId), 'setups'] as const;
const setupsPath = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}/setups`;

export const sheetSetupChoicesQueryOptions = (workspaceId: string) =>
  queryOptions({ queryKey: [...setupsKey(workspaceId), 'sheet-choices'], queryFn: () => api.get(setupsPath(workspaceId), SetupsResponse) });
export const useSheetSetupChoices = (workspaceId: string) => useQuery(sheetSetupChoicesQueryOptions(workspaceId));

export const sheetRevisionChoicesQueryOptions = (workspaceId: string, setupId: string | undefined) =>
  queryOptions({
    queryKey: [...setupsKey(workspaceId), setupId ?? null, 'sheet-revisions'],
    queryFn: setupId ? () => api.get(`${setupsPath(workspaceId)}/${encodeURIComponent(setupId)}/revisions`, RevisionsResponse) : skipToken,
  });
export const useSheetRevisionChoices = (workspaceId: string, setupId: string | undefined) => useQuery(sheetRevisionChoicesQueryOptions(workspaceId, setupId));
