import { useMutation, useQueryClient } from '@tanstack/react-query';
import { TargetSheetTransitionResult } from '../../../../shared/schemas/target-sheet.ts';
import { api } from '../../../lib/api-client.ts';
import { invalidateSheets, sheetKey, sheetPath } from './query-keys.ts';

/**
 * The four life-cycle steps are four routes of one shape (POST …/:sheetId/<step>), so they share
 * this file: submit and reopen (engineer), release and return (lead; return carries a reason).
 */
export type SheetStep = 'submit' | 'release' | 'return' | 'reopen';

/** `text` is the reason of a return or the comment of a release. */
export const moveSheet = (workspaceId: string, sheetId: string, step: SheetStep, text?: string) =>
  api.post(`${sheetPath(workspaceId, sheetId)}/${step}`, step === 'return' ? { reason: text } : step === 'release' && text ? { comment: text } : {}, TargetSheetTransitionResult);

export function useMoveSheet(workspaceId: string, sheetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ step, reason }: { step: SheetStep; reason?: string }) => moveSheet(workspaceId, sheetId, step, reason),
    onSuccess: ({ sheet, history, replaces }) => {
      queryClient.setQueryData(sheetKey(workspaceId, sheetId), { sheet, history, replaces });
      return invalidateSheets(queryClient, workspaceId);
    },
  });
}
