import { queryOptions, useQuery } from '@tanstack/react-query';
import { DynoFilesResponse } from '../../../../shared/schemas/dyno-file.ts';
import { api } from '../../../lib/api-client.ts';
import { workspaceKey } from '../../../lib/query-keys.ts';

/** Dyno files sit under the setup's key prefix, so a setup refresh refreshes them too. */
export const dynoFilesKey = (workspaceId: string, setupId: string) => [...workspaceKey(workspaceId), 'setups', 'detail', setupId, 'dyno-files'] as const;
export const dynoFilesPath = (workspaceId: string, setupId: string) =>
  `/api/workspaces/${encodeURIComponent(workspaceId)}/setups/${encodeURIComponent(setupId)}/dyno-files`;

export const getDynoFiles = (workspaceId: string, setupId: string) => api.get(dynoFilesPath(workspaceId, setupId), DynoFilesResponse);

export const dynoFilesQueryOptions = (workspaceId: string, setupId: string) =>
  queryOptions({ queryKey: [...dynoFilesKey(workspaceId, setupId), 'list'], queryFn: () => getDynoFiles(workspaceId, setupId) });

export const useDynoFiles = (workspaceId: string, setupId: string) => useQuery(dynoFilesQueryOptions(workspaceId, setupId));
