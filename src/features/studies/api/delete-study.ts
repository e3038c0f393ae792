import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client.ts';
import { studyKey, studyListKey, studyPath } from './query-keys.ts';

export const deleteStudy = (workspaceId: string, studyId: string) => api.delete(studyPath(workspaceId, studyId));

export function useDeleteStudy(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (studyId: string) => deleteStudy(workspaceId, studyId),
    onSuccess: (_r, studyId) => {
      queryClient.removeQueries({ queryKey: studyKey(workspaceId, studyId) });
      void queryClient.invalidateQueries({ queryKey: studyListKey(workspaceId) });
    },
  });
}
