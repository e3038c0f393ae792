import { useMutation, useQueryClient } from '@tanstack/react-query';
import { ShareLink } from '../../../../shared/schemas/share-link.ts';
import { api } from '../../../lib/api-client.ts';
import { shareLinksKey, shareLinksPath } from './query-keys.ts';

export const revokeShareLink = (workspaceId: string, linkId: string) => api.delete(`${shareLinksPath(workspaceId)}/${encodeURIComponent(linkId)}`, ShareLink);

/** Withdraws a link for good (it then answers "withdrawn"). */
export function useRevokeShareLink(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (linkId: string) => revokeShareLink(workspaceId, linkId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shareLinksKey(workspaceId) }),
  });
}
