import { infiniteQueryOptions, queryOptions, skipToken } from '@tanstack/react-query';
import { RevisionsResponse, SetupRevision } from '../../../shared/schemas/setup-record.ts';
import { api } from '../api-client.ts';
import { setupKey, setupPath, setupsKey } from './setups.ts';

/**
 * A setup's revisions, read by the setups, runs, studies and target-sheets features. Keys sit
 * under the setup's own key, so a setup write refreshes them with it. A form that has not picked
 * a setup yet asks with `undefined` and nothing is fetched.
 */
const revisionsBase = (workspaceId: string, setupId: string | undefined) => (setupId ? setupKey(workspaceId, setupId) : [...setupsKey(workspaceId), 'detail', null]);
export const revisionsKey = (workspaceId: string, setupId: string) => [...setupKey(workspaceId, setupId), 'revisions'] as const;

/** One page of a setup's revisions, newest first; `before` continues from the previous page. */
export const getRevisions = (workspaceId: string, setupId: string, before?: number) =>
  api.get(`${setupPath(workspaceId, setupId)}/revisions`, RevisionsResponse, { query: { before } });

/** All revisions a page at a time (`fetchNextPage` for older ones), for the history view. */
export const revisionsQueryOptions = (workspaceId: string, setupId: string) =>
  infiniteQueryOptions({
    queryKey: revisionsKey(workspaceId, setupId),
    queryFn: ({ pageParam }) => getRevisions(workspaceId, setupId, pageParam),
    initialPageParam: undefined as number | undefined,
    getNextPageParam: (last) => last.nextBefore ?? undefined,
  });

/** The newest page of revisions, which is what a form offers to pick from. */
export const latestRevisionsQueryOptions = (workspaceId: string, setupId: string | undefined) =>
  queryOptions({
    queryKey: [...revisionsBase(workspaceId, setupId), 'revisions', 'latest'],
    queryFn: setupId ? () => getRevisions(workspaceId, setupId) : skipToken,
  });

export const getRevision = (workspaceId: string, setupId: string, number: number) => api.get(`${setupPath(workspaceId, setupId)}/revisions/${number}`, SetupRevision);

/** One revision with its document. Revisions never change, so the answer never goes stale. */
export const revisionQueryOptions = (workspaceId: string, setupId: string | undefined, number: number | undefined) =>
  queryOptions({
    queryKey: [...revisionsBase(workspaceId, setupId), 'revision', number ?? null],
    queryFn: setupId && number ? () => getRevision(workspaceId, setupId, number) : skipToken,
    staleTime: Infinity,
  });
