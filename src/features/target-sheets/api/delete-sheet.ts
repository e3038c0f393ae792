import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client.ts';
import { invalidateSheets, sheetKey, sheetPath } from './query-keys.ts';

export const deleteSheet = (workspaceId: string, sheetId: string) => api.delete(sheetPath(workspaceId, sheetId));

/** Deletes a draft that was never released. */
export function useDeleteSheet(workspaceId: string, sheetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => deleteSheet(workspaceId, sheetId),
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: sheetKey(workspaceId, sheetId) });
      return invalidateSheets(queryClient, workspaceId);
    },
  });
}
