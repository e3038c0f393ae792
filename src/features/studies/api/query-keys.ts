import type { QueryClient } from '@tanstack/react-query';
import type { StudyDetail } from '../../../../shared/schemas/study-record.ts';
import { workspaceKey } from '../../../lib/queries/query-keys.ts';

/** Cache keys of the studies feature: every study query sits under the workspace's `studies` prefix. */
export const studiesKey = (workspaceId: string) => [...workspaceKey(workspaceId), 'studies'] as const;
export const studyListKey = (workspaceId: string) => [...studiesKey(workspaceId), 'list'] as const;
export const studyKey = (workspaceId: string, studyId: string) => [...studiesKey(workspaceId), studyId] as const;
export const studyDetailKey = (workspaceId: string, studyId: string) => [...studyKey(workspaceId, studyId), 'detail'] as const;

export const studiesPath = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}/studies`;
export const studyPath = (workspaceId: string, studyId: string) => `${studiesPath(workspaceId)}/${encodeURIComponent(studyId)}`;

/** After the server answers with a study (created, run saved, baseline moved): cache it, refresh the list. */
export function rememberStudy(queryClient: QueryClient, workspaceId: string, detail: StudyDetail): void {
  queryClient.setQueryData(studyDetailKey(workspaceId, detail.id), detail);
  void queryClient.invalidateQueries({ queryKey: studyListKey(workspaceId) });
}
