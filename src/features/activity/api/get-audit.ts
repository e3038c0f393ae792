import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { AuditResponse } from '../../../../shared/schemas/audit.ts';
import { api } from '../../../lib/api-client.ts';
import { workspaceKey } from '../../../lib/queries/query-keys.ts';

export const PAGE_SIZE = 50;

export const getAudit = (workspaceId: string, before?: string) =>
  api.get(`/api/workspaces/${encodeURIComponent(workspaceId)}/audit`, AuditResponse, { query: { limit: PAGE_SIZE, before } });

/** Newest first; each further page starts before the oldest entry already shown. */
export const auditQueryOptions = (workspaceId: string) =>
  infiniteQueryOptions({
    queryKey: [...workspaceKey(workspaceId), 'audit'],
    queryFn: ({ pageParam }) => getAudit(workspaceId, pageParam),
    initialPageParam: undefined as string | undefined,
    getNextPageParam: (last) => (last.entries.length < PAGE_SIZE ? undefined : last.entries.at(-1)?.at),
  });

export const useAudit = (workspaceId: string) => useInfiniteQuery(auditQueryOptions(workspaceId));
