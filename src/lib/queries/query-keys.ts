/**
 * Cache keys more than one feature touches. Everything that belongs to one workspace starts
 * with `workspaceKey(id)`, so invalidating that prefix refreshes the whole workspace.
 */
export const meKey = ['auth', 'me'] as const;

export const workspaceKey = (workspaceId: string) => ['workspaces', workspaceId] as const;

export const workspaceInfoKey = (workspaceId: string) => [...workspaceKey(workspaceId), 'info'] as const;
