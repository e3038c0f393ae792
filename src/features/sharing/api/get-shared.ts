import { queryOptions, useQuery } from '@tanstack/react-query';
import { SharedObject } from '../../../../shared/schemas/share-link.ts';
import { api } from '../../../lib/api-client.ts';
import { sharedKey } from './query-keys.ts';

export const getShared = (token: string) => api.get(`/api/shared/${encodeURIComponent(token)}`, SharedObject);

/** What a share link shows; works signed out. A withdrawn or expired link fails with code `gone`. */
export const sharedQueryOptions = (token: string) => queryOptions({ queryKey: sharedKey(token), queryFn: () => getShared(token), retry: false });

export const useShared = (token: string) => useQuery(sharedQueryOptions(token));
