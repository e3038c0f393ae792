import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ForceUnit, SignConvention, VelocityUnit } from '../../../../shared/schemas/dyno.ts';
import { ConformityRecordDetail } from '../../../../shared/schemas/target-sheet.ts';
import { api } from '../../../lib/api-client.ts';
import { checksKey, sheetPath } from './query-keys.ts';

/** How one file is read where its header says nothing: blank keeps the header's word (else SI, compression positive). */
export interface FileReading {
  velocityUnit: '' | VelocityUnit;
  forceUnit: '' | ForceUnit;
  sign: '' | SignConvention;
}

export interface CheckUpload {
  /** One file per measured damper, each with its own label and reading settings. */
  files: ({ file: File; label: string } & FileReading)[];
  /** Gas force to take out of every reading, N (0 when the readings exclude it). */
  gasForce: number;
}

export function uploadCheck(workspaceId: string, sheetId: string, upload: CheckUpload) {
  const form = new FormData();
  for (const f of upload.files) {
    form.append('file', f.file, f.file.name);
    form.append('label', f.label);
    form.append('fileVelocityUnit', f.velocityUnit);
    form.append('fileForceUnit', f.forceUnit);
    form.append('fileSign', f.sign);
  }
  form.append('gasForce', String(upload.gasForce));
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
