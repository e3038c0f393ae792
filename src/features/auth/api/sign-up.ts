import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Me, type SignUpInput } from '../../../../shared/schemas/account.ts';
import { api } from '../../../lib/api-client.ts';
import { meQueryKey } from './get-me.ts';

export const signUp = (input: SignUpInput) => api.post('/api/auth/signup', input, Me);

export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signUp,
    onSuccess: (me) => {
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== 'config' });
      queryClient.setQueryData(meQueryKey, me);
    },
  });
}
