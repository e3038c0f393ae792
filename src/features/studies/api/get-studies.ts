import { queryOptions, useQuery } from '@tanstack/react-query';
import { StudiesResponse } from '../../../../shared/schemas/study-record.ts';
import { api } from '../../../lib/api-client.ts';
import { studiesPath, studyListKey } from './query-keys.ts';

export const getStudies = (workspaceId: string) => api.get(studiesPath(workspaceId), StudiesResponse);

export const studiesQueryOptions = (workspaceId: string) => queryOptions({ queryKey: studyListKey(workspaceId), queryFn: () => getStudies(workspaceId) });

export const useStudies = (workspaceId: string) => useQuery(studiesQueryOptions(workspaceId));
