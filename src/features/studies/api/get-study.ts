import { queryOptions, useQuery } from '@tanstack/react-query';
import { StudyDetail } from '../../../../shared/schemas/study-record.ts';
import { api } from '../../../lib/api-client.ts';
import { studyDetailKey, studyPath } from './query-keys.ts';

export const getStudy = (workspaceId: string, studyId: string) => api.get(studyPath(workspaceId, studyId), StudyDetail);

export const studyQueryOptions = (workspaceId: string, studyId: string) =>
  queryOptions({ queryKey: studyDetailKey(workspaceId, studyId), queryFn: () => getStudy(workspaceId, studyId) });

export const useStudy = (workspaceId: string, studyId: string) => useQuery(studyQueryOptions(workspaceId, studyId));
