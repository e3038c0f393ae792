import { queryOptions, useQuery } from '@tanstack/react-query';
import { WorkspaceInfo } from '../../../../shared/schemas/workspace.ts';
import { api } from '../../../lib/api-client.ts';
import { workspaceInfoKey } from '../../../lib/queries/query-keys.ts';

export const getWorkspace = (workspaceId: string) => api.get(`/api/workspaces/${encodeURIComponent(workspaceId)}`, WorkspaceInfo);

/** Name of the workspace and the caller's role in it; `not_found` when the caller is not a member. */
export const workspaceQueryOptions = (workspaceId: string) =>
  queryOptions({ queryKey: workspaceInfoKey(workspaceId), queryFn: () => getWorkspace(workspaceId) });

export const useWorkspaceInfo = (workspaceId: string) => useQuery(workspaceQueryOptions(workspaceId));
