import { queryOptions, skipToken } from '@tanstack/react-query';
import { RoadDetail, RoadsResponse } from '../../../shared/schemas/road-record.ts';
import { api } from '../api-client.ts';
import { workspaceKey } from './query-keys.ts';

/**
 * The road library, read by the roads, runs and studies features. Everything sits under this
 * key; road writes invalidate it whole.
 */
export const roadsKey = (workspaceId: string) => [...workspaceKey(workspaceId), 'roads'] as const;
export const roadsPath = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}/roads`;

export const getRoads = (workspaceId: string) => api.get(roadsPath(workspaceId), RoadsResponse);

export const roadsQueryOptions = (workspaceId: string) => queryOptions({ queryKey: [...roadsKey(workspaceId), 'list'], queryFn: () => getRoads(workspaceId) });

export const getRoad = (workspaceId: string, roadId: string) => api.get(`${roadsPath(workspaceId)}/${encodeURIComponent(roadId)}`, RoadDetail);

/** One road with its profile; a form that has not picked a road yet asks with `undefined`. */
export const roadQueryOptions = (workspaceId: string, roadId: string | undefined) =>
  queryOptions({ queryKey: [...roadsKey(workspaceId), 'detail', roadId ?? null], queryFn: roadId ? () => getRoad(workspaceId, roadId) : skipToken });
