import { useMutation, useQueryClient } from '@tanstack/react-query';
import { SetupDetail } from '../../../../shared/schemas/setup-record.ts';
import type { Corner } from '../../../../shared/schemas/setup-record.ts';
import type { SetupInput } from '../../../../shared/schemas/setup.ts';
import { api } from '../../../lib/api-client.ts';
import { invalidateAfterSetupWrite, setupsPath } from '../../../lib/queries/setups.ts';

export interface CreateSetupBody {
  setup: SetupInput;
  vehicleId?: string | null;
  corner?: Corner | null;
  message?: string;
}

export const createSetup = (workspaceId: string, body: CreateSetupBody) => api.post(setupsPath(workspaceId), body, SetupDetail);

/** A new setup with its revision 1. */
export function useCreateSetup(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateSetupBody) => createSetup(workspaceId, body),
    onSuccess: () => invalidateAfterSetupWrite(queryClient, workspaceId),
  });
}
