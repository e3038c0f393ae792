import { useQuery } from '@tanstack/react-query';
import { StudyPointDraft } from '../../../../shared/schemas/study-record.ts';
import { api } from '../../../lib/api-client.ts';
import { studyKey, studyPath } from './query-keys.ts';

export const getPointDraft = (workspaceId: string, studyId: string, index: number) => api.get(`${studyPath(workspaceId, studyId)}/points/${index}/draft`, StudyPointDraft);

/** A study point applied to the study's base revision, for the bench to show unsaved; `enabled` false asks nothing. */
export const usePointDraft = (workspaceId: string, studyId: string, index: number, enabled: boolean) =>
  useQuery({
    queryKey: [...studyKey(workspaceId, studyId), 'point-draft', index],
    queryFn: () => getPointDraft(workspaceId, studyId, index),
    enabled,
    // The draft is loaded into the form once; refetching would not change what the engineer edits.
    staleTime: Infinity,
    retry: false,
  });
