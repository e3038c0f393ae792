import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { RoadDetail, RoadsResponse } from '../../../../shared/schemas/road-record.ts';
import { api } from '../../../lib/api-client.ts';
import { workspaceKey } from '../../../lib/query-keys.ts';

/** The workspace's road library, as the run form offers it (read-only, keyed under the roads prefix). */
const roadsKey = (workspaceId: string) => [...workspaceKey(workspaceId), 'roads'] as const;
const ws = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}/roads`;

export const roadChoicesQueryOptions = (workspaceId: string) =>
  queryOptions({
    queryKey: [...roadsKey(workspaceId), 'run-choices'],
    queryFn: () => api.get(ws(workspaceId), RoadsResponse),
    retry: false,
  });
export const useRoadChoices = (workspaceId: string) => useQuery(roadChoicesQueryOptions(workspaceId));

export const roadQueryOptions = (workspaceId: string, roadId: string | undefined) =>
  queryOptions({
    queryKey: [...roadsKey(workspaceId), roadId ?? null, 'run-road'],
    queryFn: roadId ? () => api.get(`${ws(workspaceId)}/${encodeURIComponent(roadId)}`, RoadDetail) : skipToken,
  });
export const useRoad = (workspaceId: string, roadId: string | undefined) => useQuery(roadQueryOptions(workspaceId, roadId));
