import { useMutation, useQueryClient } from '@tanstack/react-query';
import { DynoFileItem, type DynoUploadFields } from '../../../../shared/schemas/dyno-file.ts';
import { api } from '../../../lib/api-client.ts';
import { dynoFilesKey, dynoFilesPath } from './query-keys.ts';

export interface DynoUpload {
  file: File;
  fields: DynoUploadFields;
}

export function uploadDynoFile(workspaceId: string, setupId: string, { file, fields }: DynoUpload) {
  const form = new FormData();
  for (const [key, value] of Object.entries(fields)) if (value !== undefined) form.set(key, String(value));
  form.set('file', file);
  return api.post(dynoFilesPath(workspaceId, setupId), form, DynoFileItem);
}

export function useUploadDynoFile(workspaceId: string, setupId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (upload: DynoUpload) => uploadDynoFile(workspaceId, setupId, upload),
    onSuccess: () => client.invalidateQueries({ queryKey: dynoFilesKey(workspaceId, setupId) }),
  });
}
