import { useMutation, useQueryClient } from '@tanstack/react-query';
import { StudyDetail } from '../../../../shared/schemas/study-record.ts';
import type { StudyDefinition } from '../../../../shared/schemas/study.ts';
import { api } from '../../../lib/api-client.ts';
import { rememberStudy, studiesPath } from './query-keys.ts';

export const createStudy = (workspaceId: string, definition: StudyDefinition) => api.post(studiesPath(workspaceId), { definition }, StudyDetail);

/** Saves a new study (a draft until run); the list refreshes and the detail is cached. */
export function useCreateStudy(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (definition: StudyDefinition) => createStudy(workspaceId, definition),
    onSuccess: (detail) => rememberStudy(queryClient, workspaceId, detail),
  });
}
