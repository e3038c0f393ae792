import { workspaceKey } from '../../../lib/queries/query-keys.ts';

export const membersQueryKey = (workspaceId: string) => [...workspaceKey(workspaceId), 'members'] as const;
