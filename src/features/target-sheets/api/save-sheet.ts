import { useMutation, useQueryClient } from '@tanstack/react-query';
import { type TargetSheetContent, TargetSheetDetail } from '../../../../shared/schemas/target-sheet.ts';
import { api } from '../../../lib/api-client.ts';
import { invalidateSheets, sheetKey, sheetPath } from './query-keys.ts';

export const saveSheet = (workspaceId: string, sheetId: string, content: TargetSheetContent) => api.put(sheetPath(workspaceId, sheetId), content, TargetSheetDetail);

/** Saves a draft's targets, bands, gas force and notes (a returned sheet becomes a draft again). */
export function useSaveSheet(workspaceId: string, sheetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (content: TargetSheetContent) => saveSheet(workspaceId, sheetId, content),
    onSuccess: (detail) => {
      queryClient.setQueryData(sheetKey(workspaceId, sheetId), detail);
      return invalidateSheets(queryClient, workspaceId);
    },
  });
}
