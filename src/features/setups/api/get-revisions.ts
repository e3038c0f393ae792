import { queryOptions, useQuery } from '@tanstack/react-query';
import { RevisionsResponse } from '../../../../shared/schemas/setup-record.ts';
import { api } from '../../../lib/api-client.ts';
import { revisionsKey, setupPath } from './setup-keys.ts';

export const getRevisions = (workspaceId: string, setupId: string) => api.get(`${setupPath(workspaceId, setupId)}/revisions`, RevisionsResponse);

export const revisionsQueryOptions = (workspaceId: string, setupId: string) =>
  queryOptions({ queryKey: revisionsKey(workspaceId, setupId), queryFn: () => getRevisions(workspaceId, setupId) });

/** Every revision of a setup, newest first, without documents. */
export const useRevisions = (workspaceId: string, setupId: string) => useQuery(revisionsQueryOptions(workspaceId, setupId));
