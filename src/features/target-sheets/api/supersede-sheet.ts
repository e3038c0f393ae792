import { useMutation, useQueryClient } from '@tanstack/react-query';
import { type SupersedeTargetSheetInput, TargetSheetDetail } from '../../../../shared/schemas/target-sheet.ts';
import { api } from '../../../lib/api-client.ts';
import { invalidateSheets, sheetPath } from './query-keys.ts';

export const supersedeSheet = (workspaceId: string, sheetId: string, input: SupersedeTargetSheetInput) =>
  api.post(`${sheetPath(workspaceId, sheetId)}/supersede`, input, TargetSheetDetail);

/** A new draft replacing a released sheet; the released one then names it. */
export function useSupersedeSheet(workspaceId: string, sheetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SupersedeTargetSheetInput) => supersedeSheet(workspaceId, sheetId, input),
    onSuccess: () => invalidateSheets(queryClient, workspaceId),
  });
}
