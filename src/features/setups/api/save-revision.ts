import { useMutation, useQueryClient } from '@tanstack/react-query';
import { SetupDetail } from '../../../../shared/schemas/setup-record.ts';
import type { SetupInput } from '../../../../shared/schemas/setup.ts';
import { api } from '../../../lib/api-client.ts';
import { invalidateAfterSetupWrite, setupKey, setupPath } from '../../../lib/queries/setups.ts';

export interface SaveRevisionBody {
  setup: SetupInput;
  message: string;
  /** The revision the draft was edited from; the server refuses the save if a newer one exists. */
  basedOn?: number;
}

export const saveRevision = (workspaceId: string, setupId: string, body: SaveRevisionBody) =>
  api.post(`${setupPath(workspaceId, setupId)}/revisions`, body, SetupDetail);

/** Saves the draft as the next revision; older revisions are never touched. */
export function useSaveRevision(workspaceId: string, setupId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SaveRevisionBody) => saveRevision(workspaceId, setupId, body),
    onSuccess: (detail) => {
      queryClient.setQueryData(setupKey(workspaceId, setupId), detail);
      return invalidateAfterSetupWrite(queryClient, workspaceId);
    },
  });
}
