import { useMutation, useQueryClient } from '@tanstack/react-query';
import { SetupDetail } from '../../../../shared/schemas/setup-record.ts';
import { api } from '../../../lib/api-client.ts';
import { invalidateAfterSetupWrite, setupKey, setupPath } from '../../../lib/queries/setups.ts';

export const restoreRevision = (workspaceId: string, setupId: string, number: number, message?: string) =>
  api.post(`${setupPath(workspaceId, setupId)}/revisions/${number}/restore`, message ? { message } : {}, SetupDetail);

/** Saves an old revision's document again as the next revision. */
export function useRestoreRevision(workspaceId: string, setupId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ number, message }: { number: number; message?: string }) => restoreRevision(workspaceId, setupId, number, message),
    onSuccess: (detail) => {
      queryClient.setQueryData(setupKey(workspaceId, setupId), detail);
      return invalidateAfterSetupWrite(queryClient, workspaceId);
    },
  });
}
