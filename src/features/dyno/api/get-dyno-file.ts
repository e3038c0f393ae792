import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { DynoFileDetail } from '../../../../shared/schemas/dyno-file.ts';
import { api } from '../../../lib/api-client.ts';
import { dynoFilesKey, dynoFilesPath } from './query-keys.ts';

export const getDynoFile = (workspaceId: string, setupId: string, fileId: string) => api.get(`${dynoFilesPath(workspaceId, setupId)}/${encodeURIComponent(fileId)}`, DynoFileDetail);

export const dynoFileQueryOptions = (workspaceId: string, setupId: string, fileId: string | null) =>
  queryOptions({
    queryKey: [...dynoFilesKey(workspaceId, setupId), 'detail', fileId],
    queryFn: fileId ? () => getDynoFile(workspaceId, setupId, fileId) : skipToken,
  });

export const useDynoFile = (workspaceId: string, setupId: string, fileId: string | null) => useQuery(dynoFileQueryOptions(workspaceId, setupId, fileId));
