import { queryOptions, type QueryClient } from '@tanstack/react-query';
import { SetupDetail, SetupsResponse, type SetupsQuery } from '../../../shared/schemas/setup-record.ts';
import { api } from '../api-client.ts';
import { workspaceKey } from './query-keys.ts';

/**
 * Setups are read by the setups, runs, studies and target-sheets features alike: one cache entry
 * per read, under `[workspace, 'setups']`, so one invalidation refreshes every view of them.
 */
export const setupsKey = (workspaceId: string) => [...workspaceKey(workspaceId), 'setups'] as const;
export const setupListKey = (workspaceId: string, archived: SetupsQuery['archived']) => [...setupsKey(workspaceId), 'list', archived] as const;
export const setupKey = (workspaceId: string, setupId: string) => [...setupsKey(workspaceId), 'detail', setupId] as const;

export const setupsPath = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}/setups`;
export const setupPath = (workspaceId: string, setupId: string) => `${setupsPath(workspaceId)}/${encodeURIComponent(setupId)}`;

export const getSetups = (workspaceId: string, archived: SetupsQuery['archived']) => api.get(setupsPath(workspaceId), SetupsResponse, { query: { archived } });

/** Setups of the workspace with their latest revision and linear figures, newest change first. */
export const setupsQueryOptions = (workspaceId: string, archived: SetupsQuery['archived'] = 'exclude') =>
  queryOptions({ queryKey: setupListKey(workspaceId, archived), queryFn: () => getSetups(workspaceId, archived) });

export const getSetup = (workspaceId: string, setupId: string) => api.get(setupPath(workspaceId, setupId), SetupDetail);

/** One setup with its latest revision's document. */
export const setupQueryOptions = (workspaceId: string, setupId: string) =>
  queryOptions({ queryKey: setupKey(workspaceId, setupId), queryFn: () => getSetup(workspaceId, setupId) });

/**
 * After any setup write: the setups themselves, and what is computed from their latest
 * revisions elsewhere (vehicle figures, share-link labels, run lists), by their key prefixes.
 */
export function invalidateAfterSetupWrite(queryClient: QueryClient, workspaceId: string): Promise<unknown> {
  return Promise.all(
    ['setups', 'vehicles', 'share-links', 'runs'].map((prefix) => queryClient.invalidateQueries({ queryKey: [...workspaceKey(workspaceId), prefix] })),
  );
}
