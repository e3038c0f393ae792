import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client.ts';
import { meQueryKey } from './get-me.ts';

export const signOut = () => api.post('/api/auth/signout');

/** Signs out and forgets every cached answer that belonged to the session. */
export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSettled: () => {
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== 'config' });
      queryClient.setQueryData(meQueryKey, null);
    },
  });
}
