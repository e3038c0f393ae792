import { useMutation, useQueryClient } from '@tanstack/react-query';
import { type ApplyDriveFitInput, ApplyDriveFitResult } from '../../../../shared/schemas/drive.ts';
import { api } from '../../../lib/api-client.ts';
import { invalidateAfterSetupWrite } from '../../../lib/queries/setups.ts';
import { drivesPath } from './query-keys.ts';

const applyDriveFit = (workspaceId: string, setupId: string, driveId: string, input: ApplyDriveFitInput) =>
  api.post(`${drivesPath(workspaceId, setupId)}/${encodeURIComponent(driveId)}/apply`, input, ApplyDriveFitResult);

/** Saves the fitted corner as a new revision: the setup, its revisions, its drives and what reads them refresh. */
export function useApplyDriveFit(workspaceId: string, setupId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ driveId, input }: { driveId: string; input: ApplyDriveFitInput }) => applyDriveFit(workspaceId, setupId, driveId, input),
    onSuccess: () => invalidateAfterSetupWrite(client, workspaceId),
  });
}
