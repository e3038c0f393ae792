import { queryOptions, useQuery } from '@tanstack/react-query';
import { Me } from '../../../../shared/schemas/account.ts';
import { api, isApiError } from '../../../lib/api-client.ts';
import { meKey } from '../../../lib/queries/query-keys.ts';

export const meQueryKey = meKey;

/** The signed-in person and their workspaces, or null when nobody is signed in. */
export async function getMe(): Promise<Me | null> {
  try {
    return await api.get('/api/auth/me', Me);
  } catch (error) {
    if (isApiError(error, 'unauthenticated')) return null;
    throw error;
  }
}

export const meQueryOptions = () => queryOptions({ queryKey: meQueryKey, queryFn: getMe, staleTime: 60_000 });

export const useMe = () => useQuery(meQueryOptions());
