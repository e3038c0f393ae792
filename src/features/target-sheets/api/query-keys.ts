import type { QueryClient } from '@tanstack/react-query';
import { workspaceKey } from '../../../lib/queries/query-keys.ts';

/** Keys and paths of target-sheet data; everything sits under `[workspace, 'target-sheets']`. */
export const sheetsKey = (workspaceId: string) => [...workspaceKey(workspaceId), 'target-sheets'] as const;
export const sheetListKey = (workspaceId: string) => [...sheetsKey(workspaceId), 'list'] as const;
export const sheetKey = (workspaceId: string, sheetId: string) => [...sheetsKey(workspaceId), 'detail', sheetId] as const;
export const checksKey = (workspaceId: string, sheetId: string) => [...sheetKey(workspaceId, sheetId), 'checks'] as const;

export const sheetsPath = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}/target-sheets`;
export const sheetPath = (workspaceId: string, sheetId: string) => `${sheetsPath(workspaceId)}/${encodeURIComponent(sheetId)}`;

/** After any write to a sheet: every sheet view of the workspace (lists show status and links). */
export function invalidateSheets(queryClient: QueryClient, workspaceId: string): Promise<void> {
  return queryClient.invalidateQueries({ queryKey: sheetsKey(workspaceId) });
}
