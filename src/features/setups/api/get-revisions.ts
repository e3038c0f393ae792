import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { RevisionsResponse } from '../../../../shared/schemas/setup-record.ts';
import { api } from '../../../lib/api-client.ts';
import { revisionsKey, setupPath } from './setup-keys.ts';

/** One page of a setup's revisions, newest first; `before` continues from the previous page. */
export const getRevisions = (workspaceId: string, setupId: string, before?: number) =>
  api.get(`${setupPath(workspaceId, setupId)}/revisions`, RevisionsResponse, { query: { before } });

export const revisionsQueryOptions = (workspaceId: string, setupId: string) =>
  infiniteQueryOptions({
    queryKey: revisionsKey(workspaceId, setupId),
    queryFn: ({ pageParam }) => getRevisions(workspaceId, setupId, pageParam),
    initialPageParam: undefined as number | undefined,
    getNextPageParam: (last) => last.nextBefore ?? undefined,
  });

/** A setup's revisions, newest first, without documents, a page at a time (`fetchNextPage` for older ones). */
export const useRevisions = (workspaceId: string, setupId: string) => useInfiniteQuery(revisionsQueryOptions(workspaceId, setupId));
