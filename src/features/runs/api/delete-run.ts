import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client.ts';
import { runDetailKey, runListKey } from './query-keys.ts';

export const deleteRun = (workspaceId: string, runId: string) =>
  api.delete(`/api/workspaces/${encodeURIComponent(workspaceId)}/runs/${encodeURIComponent(runId)}`);

export function useDeleteRun(workspaceId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (runId: string) => deleteRun(workspaceId, runId),
    onSuccess: (_v, runId) => {
      client.removeQueries({ queryKey: runDetailKey(workspaceId, runId) });
      return client.invalidateQueries({ queryKey: runListKey(workspaceId) });
    },
  });
}
