import { queryOptions, useQuery } from '@tanstack/react-query';
import { RoadDetail } from '../../../../shared/schemas/road-record.ts';
import { api } from '../../../lib/api-client.ts';
import { roadsKey, roadsPath } from './get-roads.ts';

export const getRoad = (workspaceId: string, roadId: string) => api.get(`${roadsPath(workspaceId)}/${encodeURIComponent(roadId)}`, RoadDetail);

export const roadQueryOptions = (workspaceId: string, roadId: string) =>
  queryOptions({ queryKey: [...roadsKey(workspaceId), 'detail', roadId], queryFn: () => getRoad(workspaceId, roadId) });

export const useRoad = (workspaceId: string, roadId: string) => useQuery(roadQueryOptions(workspaceId, roadId));
