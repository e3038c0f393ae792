import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Member, type Role } from '../../../../shared/schemas/workspace.ts';
import { api } from '../../../lib/api-client.ts';
import { meKey, workspaceInfoKey } from '../../../lib/queries/query-keys.ts';
import { membersQueryKey } from './query-keys.ts';

const memberPath = (workspaceId: string, userId: string) =>
  `/api/workspaces/${encodeURIComponent(workspaceId)}/members/${encodeURIComponent(userId)}`;

export const changeRole = (workspaceId: string, userId: string, role: Role) => api.patch(memberPath(workspaceId, userId), { role }, Member);

export const removeMember = (workspaceId: string, userId: string) => api.delete(memberPath(workspaceId, userId));

/** Role changes also touch the caller's own `me` when they change themselves, so refresh it too. */
export function useChangeRole(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: Role }) => changeRole(workspaceId, userId, role),
    onSettled: () => {
      void queryClient.invalidateQueries({ queryKey: membersQueryKey(workspaceId) });
      void queryClient.invalidateQueries({ queryKey: meKey });
      void queryClient.invalidateQueries({ queryKey: workspaceInfoKey(workspaceId) });
    },
  });
}

export function useRemoveMember(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) => removeMember(workspaceId, userId),
    onSettled: () => queryClient.invalidateQueries({ queryKey: membersQueryKey(workspaceId) }),
  });
}
