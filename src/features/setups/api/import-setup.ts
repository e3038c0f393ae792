import { useMutation, useQueryClient } from '@tanstack/react-query';
import { SetupDetail, type Corner } from '../../../../shared/schemas/setup-record.ts';
import { request } from '../../../lib/api-client.ts';
import { invalidateAfterSetupWrite, setupsPath } from '../../../lib/queries/setups.ts';

/** Uploads a setup file's JSON as it is; the server validates it and answers 400 with the paths inside the file. */
export const importSetup = (workspaceId: string, file: unknown, place: { vehicleId?: string; corner?: Corner } = {}) =>
  request('POST', `${setupsPath(workspaceId)}/import`, { body: file, query: place, schema: SetupDetail });

export function useImportSetup(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, corner }: { file: unknown; corner?: Corner }) => importSetup(workspaceId, file, corner ? { corner } : {}),
    onSuccess: () => invalidateAfterSetupWrite(queryClient, workspaceId),
  });
}

