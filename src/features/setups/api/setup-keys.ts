import type { QueryClient } from '@tanstack/react-query';
import { workspaceKey } from '../../../lib/query-keys.ts';

/**
 * Keys of setup data. Everything sits under `[workspace, 'setups']` (other features read setups
 * under the same prefix, so one invalidation refreshes them too).
 */
export const setupsKey = (workspaceId: string) => [...workspaceKey(workspaceId), 'setups'] as const;
export const setupListKey = (workspaceId: string, archived: string) => [...setupsKey(workspaceId), 'list', archived] as const;
export const setupKey = (workspaceId: string, setupId: string) => [...setupsKey(workspaceId), 'detail', setupId] as const;
export const revisionsKey = (workspaceId: string, setupId: string) => [...setupKey(workspaceId, setupId), 'revisions'] as const;
export const revisionKey = (workspaceId: string, setupId: string, number: number) => [...setupKey(workspaceId, setupId), 'revision', number] as const;

export const setupsPath = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}/setups`;
export const setupPath = (workspaceId: string, setupId: string) => `${setupsPath(workspaceId)}/${encodeURIComponent(setupId)}`;

/**
 * After any setup write: the setups themselves, and what is computed from their latest
 * revisions elsewhere (vehicle figures, share-link labels, run lists), by their key prefixes.
 */
export function invalidateAfterSetupWrite(queryClient: QueryClient, workspaceId: string): Promise<unknown> {
  return Promise.all(
    ['setups', 'vehicles', 'share-links', 'runs'].map((prefix) => queryClient.invalidateQueries({ queryKey: [...workspaceKey(workspaceId), prefix] })),
  );
}
