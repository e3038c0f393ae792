import { useMutation, useQueryClient } from '@tanstack/react-query';
import { type CreateRoadInput, RoadDetail } from '../../../../shared/schemas/road-record.ts';
import { api } from '../../../lib/api-client.ts';
import { roadsKey, roadsPath } from '../../../lib/queries/roads.ts';

export const createRoad = (workspaceId: string, input: CreateRoadInput) => api.post(roadsPath(workspaceId), input, RoadDetail);

export function useCreateRoad(workspaceId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateRoadInput) => createRoad(workspaceId, input),
    onSuccess: () => client.invalidateQueries({ queryKey: roadsKey(workspaceId) }),
  });
}
