import { useMutation, useQueryClient } from '@tanstack/react-query';
import { TargetSheetTransitionResult } from '../../../../shared/schemas/target-sheet.ts';
import { api } from '../../../lib/api-client.ts';
import { invalidateSheets, sheetKey, sheetPath } from './query-keys.ts';

/**
 * The four life-cycle steps are four routes of one shape (POST …/:sheetId/<step>), so they share
 * this file: submit and reopen (engineer), release and return (lead; return carries a reason).
 */
export type SheetStep = 'submit' | 'release' | 'return' | 'reopen';

export const moveSheet = (workspaceId: string, sheetId: string, step: SheetStep, reason?: string) =>
  api.post(`${sheetPath(workspaceId, sheetId)}/${step}`, step === 'return' ? { reason } : {}, TargetSheetTransitionResult);

export function useMoveSheet(workspaceId: string, sheetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ step, reason }: { step: SheetStep; reason?: string }) => moveSheet(workspaceId, sheetId, step, reason),
    onSuccess: ({ sheet, history }) => {
      queryClient.setQueryData(sheetKey(workspaceId, sheetId), { sheet, history });
      return invalidateSheets(queryClient, workspaceId);
    },
  });
}
