import type { ReactNode } from 'react';
import type { ErrorCode } from '../../../shared/errors.ts';
import type { ApiError } from '../../lib/api-client.ts';
import { Notice } from './notice.tsx';
import { Loading } from './spinner.tsx';

/** What the guard needs of a query (a TanStack Query result fits, plain or infinite). */
interface GuardedQuery<T> {
  status: 'pending' | 'error' | 'success';
  data: T | undefined;
  error: ApiError | null;
}

interface QueryGuardProps<T> {
  query: GuardedQuery<T>;
  /** Words for the spinner: "Loading {what}…". */
  what: string;
  /** Shown instead of the error notice when the server answers `not_found`. */
  notFound?: ReactNode;
  /** Answers for other expected refusals (e.g. `forbidden`), by error code. */
  byCode?: Partial<Record<ErrorCode, ReactNode>>;
  /** Heading of the error notice (fixed, or by the error); without it the message stands alone. */
  errorTitle?: string | ((error: ApiError) => string);
  /** A page's own error view, for a page that keeps its frame around the message. */
  renderError?: (error: ApiError) => ReactNode;
  children: (data: T) => ReactNode;
}

/**
 * The one way a page or panel waits for a read: a spinner while pending, the answer the caller
 * chose for an expected refusal, otherwise the server's message; the content once data is there.
 */
export function QueryGuard<T>({ query, what, notFound, byCode, errorTitle, renderError, children }: QueryGuardProps<T>) {
  if (query.status === 'pending') return <Loading what={what} />;
  if (query.status === 'error' && query.error) {
    const chosen = query.error.code === 'not_found' && notFound !== undefined ? notFound : byCode?.[query.error.code];
    if (chosen !== undefined) return <>{chosen}</>;
    if (renderError) return <>{renderError(query.error)}</>;
    return (
      <Notice tone="danger" title={typeof errorTitle === 'function' ? errorTitle(query.error) : errorTitle}>
        {query.error.message}
      </Notice>
    );
  }
  return <>{children(query.data as T)}</>;
}
