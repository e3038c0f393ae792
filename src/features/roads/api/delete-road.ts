import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client.ts';
import { roadsKey, roadsPath } from '../../../lib/queries/roads.ts';

export const deleteRoad = (workspaceId: string, roadId: string) => api.delete(`${roadsPath(workspaceId)}/${encodeURIComponent(roadId)}`);

export function useDeleteRoad(workspaceId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (roadId: string) => deleteRoad(workspaceId, roadId),
    onSuccess: () => client.invalidateQueries({ queryKey: roadsKey(workspaceId) }),
  });
}
