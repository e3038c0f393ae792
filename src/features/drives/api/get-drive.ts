import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { DriveDetail } from '../../../../shared/schemas/drive.ts';
import { api } from '../../../lib/api-client.ts';
import { drivesKey, drivesPath } from './query-keys.ts';

const getDrive = (workspaceId: string, setupId: string, driveId: string) => api.get(`${drivesPath(workspaceId, setupId)}/${encodeURIComponent(driveId)}`, DriveDetail);

const driveQueryOptions = (workspaceId: string, setupId: string, driveId: string | null) =>
  queryOptions({
    queryKey: [...drivesKey(workspaceId, setupId), 'detail', driveId],
    queryFn: driveId ? () => getDrive(workspaceId, setupId, driveId) : skipToken,
    // a drive never changes once kept
    staleTime: Infinity,
  });

export const useDrive = (workspaceId: string, setupId: string, driveId: string | null) => useQuery(driveQueryOptions(workspaceId, setupId, driveId));
