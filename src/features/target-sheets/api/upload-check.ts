import { useMutation, useQueryClient } from '@tanstack/react-query';
import { ConformityRecordDetail } from '../../../../shared/schemas/target-sheet.ts';
import { api } from '../../../lib/api-client.ts';
import { checksKey, sheetPath } from './query-keys.ts';

export interface CheckUpload {
  /** One file per measured damper. */
  files: { file: File; label: string }[];
  /** Gas force to take out of every reading, N (0 when the readings exclude it). */
  gasForce: number;
  velocityUnit?: 'm/s' | 'mm/s';
  forceUnit?: 'N' | 'kN';
}

export function uploadCheck(workspaceId: string, sheetId: string, upload: CheckUpload) {
  const form = new FormData();
  for (const { file, label } of upload.files) {
    form.append('file', file, file.name);
    form.append('label', label);
  }
  form.append('gasForce', String(upload.gasForce));
  if (upload.velocityUnit) form.append('velocityUnit', upload.velocityUnit);
  if (upload.forceUnit) form.append('forceUnit', upload.forceUnit);
  return api.post(`${sheetPath(workspaceId, sheetId)}/checks`, form, ConformityRecordDetail);
}

/** Uploads dyno files of one or more dampers and checks them against the sheet. */
export function useUploadCheck(workspaceId: string, sheetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (upload: CheckUpload) => uploadCheck(workspaceId, sheetId, upload),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: checksKey(workspaceId, sheetId) }),
  });
}
