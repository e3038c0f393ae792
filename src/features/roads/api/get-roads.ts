import { queryOptions, useQuery } from '@tanstack/react-query';
import { RoadsResponse } from '../../../../shared/schemas/road-record.ts';
import { api } from '../../../lib/api-client.ts';
import { workspaceKey } from '../../../lib/query-keys.ts';

/** Everything about the road library sits under this key; writes invalidate it whole. */
export const roadsKey = (workspaceId: string) => [...workspaceKey(workspaceId), 'roads'] as const;
export const roadsPath = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}/roads`;

export const getRoads = (workspaceId: string) => api.get(roadsPath(workspaceId), RoadsResponse);

export const roadsQueryOptions = (workspaceId: string) => queryOptions({ queryKey: [...roadsKey(workspaceId), 'list'], queryFn: () => getRoads(workspaceId) });

export const useRoads = (workspaceId: string) => useQuery(roadsQueryOptions(workspaceId));
