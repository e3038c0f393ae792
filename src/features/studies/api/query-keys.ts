import { workspaceKey } from '../../../lib/queries/query-keys.ts';

/** Cache keys of the studies feature: every study query sits under the workspace's `studies` prefix. */
export const studiesKey = (workspaceId: string) => [...workspaceKey(workspaceId), 'studies'] as const;
export const studyKey = (workspaceId: string, studyId: string) => [...studiesKey(workspaceId), studyId] as const;

export const studiesPath = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}/studies`;
export const studyPath = (workspaceId: string, studyId: string) => `${studiesPath(workspaceId)}/${encodeURIComponent(studyId)}`;
