import { queryOptions, useQuery } from '@tanstack/react-query';
import { TargetSheetDetail } from '../../../../shared/schemas/target-sheet.ts';
import { api } from '../../../lib/api-client.ts';
import { sheetKey, sheetPath } from './query-keys.ts';

export const getSheet = (workspaceId: string, sheetId: string) => api.get(sheetPath(workspaceId, sheetId), TargetSheetDetail);

export const sheetQueryOptions = (workspaceId: string, sheetId: string) =>
  queryOptions({ queryKey: sheetKey(workspaceId, sheetId), queryFn: () => getSheet(workspaceId, sheetId) });

/** One sheet with its history of status changes. */
export const useSheet = (workspaceId: string, sheetId: string) => useQuery(sheetQueryOptions(workspaceId, sheetId));
