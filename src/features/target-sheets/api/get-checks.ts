import { queryOptions, useQuery } from '@tanstack/react-query';
import { ConformityChecksResponse } from '../../../../shared/schemas/target-sheet.ts';
import { api } from '../../../lib/api-client.ts';
import { checksKey, sheetPath } from './query-keys.ts';

export const getChecks = (workspaceId: string, sheetId: string) => api.get(`${sheetPath(workspaceId, sheetId)}/checks`, ConformityChecksResponse);

export const checksQueryOptions = (workspaceId: string, sheetId: string) =>
  queryOptions({ queryKey: checksKey(workspaceId, sheetId), queryFn: () => getChecks(workspaceId, sheetId) });

/** Dyno conformity checks of one sheet, newest first, with the measured points for the plot. */
export const useChecks = (workspaceId: string, sheetId: string) => useQuery(checksQueryOptions(workspaceId, sheetId));

/** Where a check's result downloads as CSV (a plain link: the browser sends the cookie). */
export const checkCsvHref = (workspaceId: string, sheetId: string, checkId: string) => `${sheetPath(workspaceId, sheetId)}/checks/${encodeURIComponent(checkId)}/csv`;

/** Where the target table downloads as CSV. */
export const sheetCsvHref = (workspaceId: string, sheetId: string) => `${sheetPath(workspaceId, sheetId)}/csv`;
