import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { RoadsResponse } from '../../../../shared/schemas/road-record.ts';
import { RevisionsResponse, SetupsResponse } from '../../../../shared/schemas/setup-record.ts';
import { api } from '../../../lib/api-client.ts';
import { workspaceKey } from '../../../lib/query-keys.ts';

/**
 * What a study can start from and drive over: read-only views of the setups and roads APIs,
 * keyed under those features' prefixes so their changes refresh these lists too.
 */
const ws = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}`;

export const setupChoicesQueryOptions = (workspaceId: string) =>
  queryOptions({ queryKey: [...workspaceKey(workspaceId), 'setups', 'study-choices'], queryFn: () => api.get(`${ws(workspaceId)}/setups`, SetupsResponse) });
export const useStudySetupChoices = (workspaceId: string) => useQuery(setupChoicesQueryOptions(workspaceId));

export const revisionChoicesQueryOptions = (workspaceId: string, setupId: string | undefined) =>
  queryOptions({
    queryKey: [...workspaceKey(workspaceId), 'setups', setupId ?? null, 'study-revisions'],
    queryFn: setupId ? () => api.get(`${ws(workspaceId)}/setups/${encodeURIComponent(setupId)}/revisions`, RevisionsResponse) : skipToken,
  });
export const useStudyRevisionChoices = (workspaceId: string, setupId: string | undefined) => useQuery(revisionChoicesQueryOptions(workspaceId, setupId));

export const roadChoicesQueryOptions = (workspaceId: string) =>
  queryOptions({ queryKey: [...workspaceKey(workspaceId), 'roads', 'study-choices'], queryFn: () => api.get(`${ws(workspaceId)}/roads`, RoadsResponse), retry: false });
export const useStudyRoadChoices = (workspaceId: string) => useQuery(roadChoicesQueryOptions(workspaceId));
