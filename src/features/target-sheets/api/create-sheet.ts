import { useMutation, useQueryClient } from '@tanstack/react-query';
import { type CreateTargetSheetInput, TargetSheetDetail } from '../../../../shared/schemas/target-sheet.ts';
import { api } from '../../../lib/api-client.ts';
import { invalidateSheets, sheetsPath } from './query-keys.ts';

export const createSheet = (workspaceId: string, input: CreateTargetSheetInput) => api.post(sheetsPath(workspaceId), input, TargetSheetDetail);

/** Drafts a sheet from one setup revision. */
export function useCreateSheet(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateTargetSheetInput) => createSheet(workspaceId, input),
    onSuccess: () => invalidateSheets(queryClient, workspaceId),
  });
}
