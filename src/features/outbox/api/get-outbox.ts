import { queryOptions, useQuery } from '@tanstack/react-query';
import { OutboxResponse } from '../../../../shared/schemas/outbox.ts';
import { api } from '../../../lib/api-client.ts';
import { pollUnlessRefused } from '../../../lib/query-client.ts';

export const getOutbox = () => api.get('/api/outbox', OutboxResponse);

/** Mail the local sink caught; refreshed every few seconds while the page is open, unless the server refused (not an admin, or no sink). */
export const outboxQueryOptions = () =>
  queryOptions({ queryKey: ['outbox'], queryFn: getOutbox, staleTime: 0, refetchInterval: pollUnlessRefused(5_000) });

export const useOutbox = () => useQuery(outboxQueryOptions());
