import { queryOptions, useQuery } from '@tanstack/react-query';
import { DynoFilesResponse } from '../../../../shared/schemas/dyno-file.ts';
import { api } from '../../../lib/api-client.ts';
import { dynoFilesKey, dynoFilesPath } from './query-keys.ts';

export const getDynoFiles = (workspaceId: string, setupId: string) => api.get(dynoFilesPath(workspaceId, setupId), DynoFilesResponse);

export const dynoFilesQueryOptions = (workspaceId: string, setupId: string) =>
  queryOptions({ queryKey: [...dynoFilesKey(workspaceId, setupId), 'list'], queryFn: () => getDynoFiles(workspaceId, setupId) });

export const useDynoFiles = (workspaceId: string, setupId: string) => useQuery(dynoFilesQueryOptions(workspaceId, setupId));
