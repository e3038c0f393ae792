import { useMutation, useQueryClient } from '@tanstack/react-query';
import { WorkspaceSettings } from '../../../../shared/schemas/workspace.ts';
import { api } from '../../../lib/api-client.ts';
import { workspaceInfoKey } from '../../../lib/query-keys.ts';

export const updateWorkspaceSettings = (workspaceId: string, settings: WorkspaceSettings) =>
  api.put(`/api/workspaces/${encodeURIComponent(workspaceId)}/settings`, settings, WorkspaceSettings);

/** Admins only (the server refuses others); refreshes the workspace the pages read the rules from. */
export function useUpdateWorkspaceSettings(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (settings: WorkspaceSettings) => updateWorkspaceSettings(workspaceId, settings),
    onSettled: () => void queryClient.invalidateQueries({ queryKey: workspaceInfoKey(workspaceId) }),
  });
}
