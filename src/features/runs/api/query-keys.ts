import { workspaceKey } from '../../../lib/queries/query-keys.ts';

export const runsKey = (workspaceId: string) => [...workspaceKey(workspaceId), 'runs'] as const;
