import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client.ts';

declare module '@tanstack/react-query' {
  interface Register {
    defaultError: ApiError;
  }
}

export interface QueryClientHooks {
  /** Called when any request finds the session gone (expired, signed out elsewhere). */
  onUnauthenticated?: () => void;
}

/** Errors a retry cannot fix: the request or the caller is wrong, not the network. */
function worthRetrying(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

/**
 * The app's QueryClient. Reads stay fresh for 30 s (team data changes slowly and every write
 * invalidates what it touched); 4xx answers are not retried.
 */
export function createQueryClient(hooks: QueryClientHooks = {}): QueryClient {
  const onError = (error: unknown) => {
    if (error instanceof ApiError && error.code === 'unauthenticated') hooks.onUnauthenticated?.();
  };
  return new QueryClient({
    queryCache: new QueryCache({ onError }),
    mutationCache: new MutationCache({ onError }),
    defaultOptions: {
      queries: { staleTime: 30_000, retry: worthRetrying, refetchOnWindowFocus: false },
      mutations: { retry: false },
    },
  });
}
