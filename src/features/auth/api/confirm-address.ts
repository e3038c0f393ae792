import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Me } from '../../../../shared/schemas/account.ts';
import { api } from '../../../lib/api-client.ts';
import { meQueryKey } from './get-me.ts';

/** Uses a mailed confirmation link; the answer signs the account in. */
export function useConfirmAddress() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (token: string) => api.post('/api/auth/confirm', { token }, Me),
    onSuccess: (me) => {
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== 'config' });
      queryClient.setQueryData(meQueryKey, me);
    },
  });
}

/** Mails a new confirmation link to the signed-in account. */
export const useResendAddressCheck = () => useMutation({ mutationFn: () => api.post('/api/auth/confirm/resend') });
