import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Invitation, type InviteInput } from '../../../../shared/schemas/workspace.ts';
import { api } from '../../../lib/api-client.ts';
import { membersQueryKey } from './query-keys.ts';

const base = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}/invitations`;

export const createInvitation = (workspaceId: string, input: InviteInput) => api.post(base(workspaceId), input, Invitation);

export const revokeInvitation = (workspaceId: string, invitationId: string) =>
  api.delete(`${base(workspaceId)}/${encodeURIComponent(invitationId)}`);

/** Sends an invitation e-mail and refreshes the pending list. */
export function useCreateInvitation(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: InviteInput) => createInvitation(workspaceId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: membersQueryKey(workspaceId) }),
  });
}

export function useRevokeInvitation(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: string) => revokeInvitation(workspaceId, invitationId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: membersQueryKey(workspaceId) }),
  });
}
