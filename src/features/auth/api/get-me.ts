import { queryOptions, useQuery } from '@tanstack/react-query';
import { MeAnswer, type Me } from '../../../../shared/schemas/account.ts';
import { api } from '../../../lib/api-client.ts';
import { meKey } from '../../../lib/queries/query-keys.ts';

export const meQueryKey = meKey;

/** The signed-in person and their workspaces, or null when nobody is signed in (a 200 answer, not an error). */
export async function getMe(): Promise<Me | null> {
  const answer = await api.get('/api/auth/me', MeAnswer);
  return answer.user ? answer : null;
}

export const meQueryOptions = () => queryOptions({ queryKey: meQueryKey, queryFn: getMe, staleTime: 60_000 });

export const useMe = () => useQuery(meQueryOptions());
