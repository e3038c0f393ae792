import { queryOptions, useQuery } from '@tanstack/react-query';
import { SetupsResponse, type SetupsQuery } from '../../../../shared/schemas/setup-record.ts';
import { api } from '../../../lib/api-client.ts';
import { setupListKey, setupsPath } from './setup-keys.ts';

export const getSetups = (workspaceId: string, archived: SetupsQuery['archived']) => api.get(setupsPath(workspaceId), SetupsResponse, { query: { archived } });

export const setupsQueryOptions = (workspaceId: string, archived: SetupsQuery['archived'] = 'exclude') =>
  queryOptions({ queryKey: setupListKey(workspaceId, archived), queryFn: () => getSetups(workspaceId, archived) });

/** Setups of the workspace with their latest revision and linear figures, newest change first. */
export const useSetups = (workspaceId: string, archived: SetupsQuery['archived'] = 'exclude') => useQuery(setupsQueryOptions(workspaceId, archived));
