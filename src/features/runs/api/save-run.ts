import { useMutation, useQueryClient } from '@tanstack/react-query';
import { RunSummary, type SaveRunInputIn } from '../../../../shared/schemas/run-record.ts';
import { api } from '../../../lib/api-client.ts';
import { runListKey } from './query-keys.ts';

export const saveRun = (workspaceId: string, input: SaveRunInputIn) =>
  api.post(`/api/workspaces/${encodeURIComponent(workspaceId)}/runs`, input, RunSummary);

/** Saves a run; the runs lists refresh. */
export function useSaveRun(workspaceId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: SaveRunInputIn) => saveRun(workspaceId, input),
    onSuccess: () => client.invalidateQueries({ queryKey: runListKey(workspaceId) }),
  });
}
