import { queryOptions, useQuery } from '@tanstack/react-query';
import { DrivesResponse } from '../../../../shared/schemas/drive.ts';
import { api } from '../../../lib/api-client.ts';
import { drivesKey, drivesPath } from './query-keys.ts';

const getDrives = (workspaceId: string, setupId: string) => api.get(drivesPath(workspaceId, setupId), DrivesResponse);

const drivesQueryOptions = (workspaceId: string, setupId: string) =>
  queryOptions({ queryKey: [...drivesKey(workspaceId, setupId), 'list'], queryFn: () => getDrives(workspaceId, setupId) });

export const useDrives = (workspaceId: string, setupId: string) => useQuery(drivesQueryOptions(workspaceId, setupId));
