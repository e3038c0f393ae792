import { useMutation, useQueryClient } from '@tanstack/react-query';
import { type WorkspaceInfo, WorkspaceSettings } from '../../../../shared/schemas/workspace.ts';
import { api } from '../../../lib/api-client.ts';
import { workspaceInfoKey } from '../../../lib/queries/query-keys.ts';

export const updateWorkspaceSettings = (workspaceId: string, settings: WorkspaceSettings) =>
  api.put(`/api/workspaces/${encodeURIComponent(workspaceId)}/settings`, settings, WorkspaceSettings);

/** Admins only (the server refuses others); refreshes the workspace the pages read the rules from. */
export function useUpdateWorkspaceSettings(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (settings: WorkspaceSettings) => updateWorkspaceSettings(workspaceId, settings),
    // The saved rules are the answer itself: put them in place at once, then refetch to be sure.
    onSuccess: (settings) => queryClient.setQueryData(workspaceInfoKey(workspaceId), (info: WorkspaceInfo | undefined) => info && { ...info, settings }),
    onSettled: () => void queryClient.invalidateQueries({ queryKey: workspaceInfoKey(workspaceId) }),
  });
}
