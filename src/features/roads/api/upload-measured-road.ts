import { useMutation, useQueryClient } from '@tanstack/react-query';
import { type MeasuredUploadFields, RoadDetail } from '../../../../shared/schemas/road-record.ts';
import { api } from '../../../lib/api-client.ts';
import { roadsKey, roadsPath } from '../../../lib/queries/roads.ts';

export interface MeasuredUpload {
  file: File;
  fields: MeasuredUploadFields;
}

export function uploadMeasuredRoad(workspaceId: string, { file, fields }: MeasuredUpload) {
  const form = new FormData();
  for (const [key, value] of Object.entries(fields)) if (value !== undefined) form.set(key, String(value));
  form.set('file', file);
  return api.post(`${roadsPath(workspaceId)}/measured`, form, RoadDetail);
}

export function useUploadMeasuredRoad(workspaceId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (upload: MeasuredUpload) => uploadMeasuredRoad(workspaceId, upload),
    onSuccess: () => client.invalidateQueries({ queryKey: roadsKey(workspaceId) }),
  });
}
