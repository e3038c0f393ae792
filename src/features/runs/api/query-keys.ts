import { workspaceKey } from '../../../lib/queries/query-keys.ts';

export const runsKey = (workspaceId: string) => [...workspaceKey(workspaceId), 'runs'] as const;
export const runListKey = (workspaceId: string) => [...runsKey(workspaceId), 'list'] as const;
export const runDetailKey = (workspaceId: string, runId: string | undefined) => [...runsKey(workspaceId), 'detail', runId ?? null] as const;
