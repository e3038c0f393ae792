import { useMutation, useQueryClient } from '@tanstack/react-query';
import { StudyDetail } from '../../../../shared/schemas/study-record.ts';
import type { StudyDefinition } from '../../../../shared/schemas/study.ts';
import { api } from '../../../lib/api-client.ts';
import { studiesKey, studiesPath, studyKey } from './query-keys.ts';

export const createStudy = (workspaceId: string, definition: StudyDefinition) => api.post(studiesPath(workspaceId), { definition }, StudyDetail);

/** Saves a new study (a draft until run); the list refreshes and the detail is cached. */
export function useCreateStudy(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (definition: StudyDefinition) => createStudy(workspaceId, definition),
    onSuccess: (detail) => {
      queryClient.setQueryData([...studyKey(workspaceId, detail.id), 'detail'], detail);
      void queryClient.invalidateQueries({ queryKey: [...studiesKey(workspaceId), 'list'] });
    },
  });
}
