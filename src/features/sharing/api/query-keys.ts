import { workspaceKey } from '../../../lib/queries/query-keys.ts';

export const shareLinksKey = (workspaceId: string) => [...workspaceKey(workspaceId), 'share-links'] as const;
export const shareLinksPath = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}/share-links`;
/** Public reads are keyed by token, outside any workspace. */
export const sharedKey = (token: string) => ['shared', token] as const;
