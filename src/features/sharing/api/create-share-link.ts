import { useMutation, useQueryClient } from '@tanstack/react-query';
import { CreatedShareLink, type ShareObjectType } from '../../../../shared/schemas/share-link.ts';
import { api } from '../../../lib/api-client.ts';
import { shareLinksKey, shareLinksPath } from './query-keys.ts';

export interface CreateShareLinkBody {
  objectType: ShareObjectType;
  objectId: string;
  expiresAt?: string | null;
}

export const createShareLink = (workspaceId: string, body: CreateShareLinkBody) => api.post(shareLinksPath(workspaceId), body, CreatedShareLink);

/** A new read-only link; the answer holds the token, which is never shown again. */
export function useCreateShareLink(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateShareLinkBody) => createShareLink(workspaceId, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shareLinksKey(workspaceId) }),
  });
}
