import { useMutation, useQueryClient } from '@tanstack/react-query';
import { StudyDetail } from '../../../../shared/schemas/study-record.ts';
import { api } from '../../../lib/api-client.ts';
import { rememberStudy, studyPath } from './query-keys.ts';

export const setStudyBaseline = (workspaceId: string, studyId: string, pointIndex: number | null) => api.put(`${studyPath(workspaceId, studyId)}/baseline`, { pointIndex }, StudyDetail);

/** The lead's pick of a point as the baseline (null clears it). */
export function useSetStudyBaseline(workspaceId: string, studyId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (pointIndex: number | null) => setStudyBaseline(workspaceId, studyId, pointIndex),
    onSuccess: (detail) => rememberStudy(queryClient, workspaceId, detail),
  });
}
