import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { SetupRevision } from '../../../../shared/schemas/setup-record.ts';
import { api } from '../../../lib/api-client.ts';
import { revisionKey, setupKey, setupPath } from './setup-keys.ts';

export const getRevision = (workspaceId: string, setupId: string, number: number) => api.get(`${setupPath(workspaceId, setupId)}/revisions/${number}`, SetupRevision);

/** One revision with its document. Revisions never change, so the answer never goes stale. */
export const revisionQueryOptions = (workspaceId: string, setupId: string, number: number | undefined) =>
  queryOptions({
    queryKey: number ? revisionKey(workspaceId, setupId, number) : [...setupKey(workspaceId, setupId), 'revision', null],
    queryFn: number ? () => getRevision(workspaceId, setupId, number) : skipToken,
    staleTime: Infinity,
  });

export const useRevision = (workspaceId: string, setupId: string, number: number | undefined) => useQuery(revisionQueryOptions(workspaceId, setupId, number));
