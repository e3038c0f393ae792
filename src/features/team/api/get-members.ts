import { queryOptions, useQuery } from '@tanstack/react-query';
import { MembersResponse } from '../../../../shared/schemas/workspace.ts';
import { api } from '../../../lib/api-client.ts';
import { membersQueryKey } from './query-keys.ts';

export const getMembers = (workspaceId: string) => api.get(`/api/workspaces/${encodeURIComponent(workspaceId)}/members`, MembersResponse);

/** Members, and (for admins) pending invitations. */
export const membersQueryOptions = (workspaceId: string) =>
  queryOptions({ queryKey: membersQueryKey(workspaceId), queryFn: () => getMembers(workspaceId) });

export const useMembers = (workspaceId: string) => useQuery(membersQueryOptions(workspaceId));
