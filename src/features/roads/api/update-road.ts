import { useMutation, useQueryClient } from '@tanstack/react-query';
import { RoadDetail, type UpdateRoadInput } from '../../../../shared/schemas/road-record.ts';
import { api } from '../../../lib/api-client.ts';
import { roadsKey, roadsPath } from '../../../lib/queries/roads.ts';

export const updateRoad = (workspaceId: string, roadId: string, input: UpdateRoadInput) =>
  api.put(`${roadsPath(workspaceId)}/${encodeURIComponent(roadId)}`, input, RoadDetail);

export function useUpdateRoad(workspaceId: string, roadId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateRoadInput) => updateRoad(workspaceId, roadId, input),
    onSuccess: () => client.invalidateQueries({ queryKey: roadsKey(workspaceId) }),
  });
}
