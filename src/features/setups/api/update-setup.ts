import { useMutation, useQueryClient } from '@tanstack/react-query';
import { SetupDetail, type Corner } from '../../../../shared/schemas/setup-record.ts';
import { api } from '../../../lib/api-client.ts';
import { invalidateAfterSetupWrite, setupKey, setupPath } from '../../../lib/queries/setups.ts';

export interface UpdateSetupBody {
  name?: string;
  vehicleId?: string | null;
  corner?: Corner | null;
  archived?: boolean;
}

export const updateSetup = (workspaceId: string, setupId: string, body: UpdateSetupBody) => api.patch(setupPath(workspaceId, setupId), body, SetupDetail);

/** Rename, regroup or archive: the setup's own facts, never a revision. */
export function useUpdateSetup(workspaceId: string, setupId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateSetupBody) => updateSetup(workspaceId, setupId, body),
    onSuccess: (detail) => {
      queryClient.setQueryData(setupKey(workspaceId, setupId), detail);
      return invalidateAfterSetupWrite(queryClient, workspaceId);
    },
  });
}
