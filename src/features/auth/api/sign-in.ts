import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Me, type SignInInput } from '../../../../shared/schemas/account.ts';
import { api } from '../../../lib/api-client.ts';
import { meQueryKey } from './get-me.ts';

export const signIn = (input: SignInInput) => api.post('/api/auth/signin', input, Me);

/** Signs in and replaces whatever the cache knew about the previous session. */
export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (me) => {
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== 'config' });
      queryClient.setQueryData(meQueryKey, me);
    },
  });
}
