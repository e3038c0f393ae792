import { queryOptions, useQuery } from '@tanstack/react-query';
import { SetupDetail } from '../../../../shared/schemas/setup-record.ts';
import { api } from '../../../lib/api-client.ts';
import { setupKey, setupPath } from './setup-keys.ts';

export const getSetup = (workspaceId: string, setupId: string) => api.get(setupPath(workspaceId, setupId), SetupDetail);

export const setupQueryOptions = (workspaceId: string, setupId: string) =>
  queryOptions({ queryKey: setupKey(workspaceId, setupId), queryFn: () => getSetup(workspaceId, setupId) });

/** One setup with its latest revision's document. */
export const useSetup = (workspaceId: string, setupId: string) => useQuery(setupQueryOptions(workspaceId, setupId));
