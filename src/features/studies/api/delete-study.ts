import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client.ts';
import { studiesKey, studyPath } from './query-keys.ts';

export const deleteStudy = (workspaceId: string, studyId: string) => api.delete(studyPath(workspaceId, studyId));

export function useDeleteStudy(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (studyId: string) => deleteStudy(workspaceId, studyId),
    onSuccess: (_r, studyId) => {
      queryClient.removeQueries({ queryKey: [...studiesKey(workspaceId), studyId] });
      void queryClient.invalidateQueries({ queryKey: [...studiesKey(workspaceId), 'list'] });
    },
  });
}
