import { useMutation, useQueryClient } from '@tanstack/react-query';
import { type ApplyDynoFitInput, ApplyDynoFitResult } from '../../../../shared/schemas/dyno-file.ts';
import { api } from '../../../lib/api-client.ts';
import { invalidateAfterSetupWrite } from '../../../lib/queries/setups.ts';
import { dynoFilesPath } from './query-keys.ts';

export const applyDynoFit = (workspaceId: string, setupId: string, fileId: string, input: ApplyDynoFitInput) =>
  api.post(`${dynoFilesPath(workspaceId, setupId)}/${encodeURIComponent(fileId)}/apply`, input, ApplyDynoFitResult);

/** Saves the fit as a new revision: the setup, its revisions, its files and what reads them refresh. */
export function useApplyDynoFit(workspaceId: string, setupId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ fileId, input }: { fileId: string; input: ApplyDynoFitInput }) => applyDynoFit(workspaceId, setupId, fileId, input),
    onSuccess: () => invalidateAfterSetupWrite(client, workspaceId),
  });
}
