import { queryOptions, useQuery } from '@tanstack/react-query';
import { AppConfig } from '../../../../shared/schemas/config.ts';
import { api } from '../../../lib/api-client.ts';

export const getConfig = () => api.get('/api/config', AppConfig);

/** Demo mode and demo users; fixed for the life of the server process. */
export const configQueryOptions = () => queryOptions({ queryKey: ['config'], queryFn: getConfig, staleTime: Infinity });

export const useConfig = () => useQuery(configQueryOptions());
