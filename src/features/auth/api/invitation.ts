import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { Me } from '../../../../shared/schemas/account.ts';
import { InvitationInfo, type AcceptInvitationInput } from '../../../../shared/schemas/workspace.ts';
import { api } from '../../../lib/api-client.ts';
import { meQueryKey } from './get-me.ts';

const path = (token: string) => `/api/invitations/${encodeURIComponent(token)}`;

export const getInvitation = (token: string) => api.get(path(token), InvitationInfo);

export const invitationQueryOptions = (token: string) =>
  queryOptions({ queryKey: ['invitations', token], queryFn: () => getInvitation(token), staleTime: Infinity });

export const useInvitation = (token: string) => useQuery(invitationQueryOptions(token));

export const acceptInvitation = (token: string, input: AcceptInvitationInput) => api.post(`${path(token)}/accept`, input, Me);

/** Accepts and signs in as the invited person; the answer is the new session's `Me`. */
export function useAcceptInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: AcceptInvitationInput) => acceptInvitation(token, input),
    onSuccess: (me) => {
      // keep the invitation itself: the page still shows it while it moves on
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== 'config' && q.queryKey[0] !== 'invitations' });
      queryClient.setQueryData(meQueryKey, me);
    },
  });
}
