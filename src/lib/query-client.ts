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

/** Tries after the first failure: a dropped connection or a busy server may answer next time. */
const MAX_RETRIES = 2;

/**
 * Whether a failed read may succeed if asked again: only when the server could not be reached
 * (status 0) or failed itself (5xx). A 4xx answer says the request or the caller is wrong, and a
 * body of the wrong shape will not change: asking again only repeats the error.
 */
export function worthRetrying(failureCount: number, error: unknown): boolean {
  if (!(error instanceof ApiError)) return false;
  const transient = error.status === 0 || error.status >= 500;
  return transient && failureCount < MAX_RETRIES;
}

/** A polling interval that stops once the query has failed with a 4xx (a viewer on an admin page). */
export function pollUnlessRefused(ms: number) {
  return (query: { state: { error: ApiError | null } }): number | false => {
    const error = query.state.error;
    return error && error.status >= 400 && error.status < 500 ? false : ms;
  };
}

/**
 * The app's QueryClient. Reads stay fresh for 30 s (team data changes slowly and every write
 * invalidates what it touched); only network failures and 5xx answers are retried, twice at most.
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
