import { queryOptions, useQuery } from '@tanstack/react-query';
import { TargetSheetsResponse } from '../../../../shared/schemas/target-sheet.ts';
import { api } from '../../../lib/api-client.ts';
import { sheetListKey, sheetsPath } from './query-keys.ts';

export const getSheets = (workspaceId: string) => api.get(sheetsPath(workspaceId), TargetSheetsResponse);

export const sheetsQueryOptions = (workspaceId: string) => queryOptions({ queryKey: sheetListKey(workspaceId), queryFn: () => getSheets(workspaceId) });

/** Every target sheet of the workspace, newest change first. */
export const useSheets = (workspaceId: string) => useQuery(sheetsQueryOptions(workspaceId));
