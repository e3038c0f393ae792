import { useMutation, useQueryClient } from '@tanstack/react-query';
import { DriveItem } from '../../../../shared/schemas/drive.ts';
import { api } from '../../../lib/api-client.ts';
import { drivesKey, drivesPath } from './query-keys.ts';

function uploadDrive(workspaceId: string, setupId: string, { file, note }: { file: File; note: string }) {
  const form = new FormData();
  if (note.trim()) form.set('note', note.trim());
  form.set('file', file);
  return api.post(drivesPath(workspaceId, setupId), form, DriveItem);
}

export function useUploadDrive(workspaceId: string, setupId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (upload: { file: File; note: string }) => uploadDrive(workspaceId, setupId, upload),
    onSuccess: () => client.invalidateQueries({ queryKey: drivesKey(workspaceId, setupId) }),
  });
}
