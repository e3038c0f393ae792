import { useMutation, useQueryClient } from '@tanstack/react-query';
import { CopiedShared } from '../../../../shared/schemas/share-link.ts';
import { api } from '../../../lib/api-client.ts';
import { workspaceKey } from '../../../lib/queries/query-keys.ts';

export const copyShared = (token: string, workspaceId: string) => api.post(`/api/shared/${encodeURIComponent(token)}/copy`, { workspaceId }, CopiedShared);

/** Copies the shared object into a workspace where the caller is engineer or above. */
export function useCopyShared(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (workspaceId: string) => copyShared(token, workspaceId),
    onSuccess: (copied) => queryClient.invalidateQueries({ queryKey: workspaceKey(copied.workspaceId) }),
  });
}
