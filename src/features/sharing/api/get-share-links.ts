import { queryOptions, useQuery } from '@tanstack/react-query';
import { ShareLinksResponse } from '../../../../shared/schemas/share-link.ts';
import { api } from '../../../lib/api-client.ts';
import { shareLinksKey, shareLinksPath } from './query-keys.ts';

export const getShareLinks = (workspaceId: string, setupId?: string) => api.get(shareLinksPath(workspaceId), ShareLinksResponse, { query: { setupId } });

export const shareLinksQueryOptions = (workspaceId: string, setupId?: string) =>
  queryOptions({ queryKey: [...shareLinksKey(workspaceId), setupId ?? 'all'], queryFn: () => getShareLinks(workspaceId, setupId) });

/** Links of the workspace (or of one setup's revisions), newest first; tokens are never listed. */
export const useShareLinks = (workspaceId: string, setupId?: string) => useQuery(shareLinksQueryOptions(workspaceId, setupId));
