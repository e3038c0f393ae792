import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { ApiTokensResponse, CreatedApiToken, type CreateApiTokenInput } from '../../../../shared/schemas/api-token.ts';
import { api } from '../../../lib/api-client.ts';

const path = '/api/account/api-tokens';
const apiTokensKey = ['account', 'api-tokens'] as const;

const apiTokensQueryOptions = () => queryOptions({ queryKey: apiTokensKey, queryFn: () => api.get(path, ApiTokensResponse) });

/** The signed-in person's tokens that are not revoked, newest first; token texts are never listed. */
export const useApiTokens = () => useQuery(apiTokensQueryOptions());

/** A new token; the answer holds the token text, which is never shown again. */
export function useCreateApiToken() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateApiTokenInput) => api.post(path, body, CreatedApiToken),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: apiTokensKey }),
  });
}

/** Revokes one of the person's tokens at once. */
export function useRevokeApiToken() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (tokenId: string) => api.delete(`${path}/${encodeURIComponent(tokenId)}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: apiTokensKey }),
  });
}
