import { setupKey, setupPath } from '../../../lib/queries/setups.ts';

/** Dyno files sit under the setup's key prefix, so a setup refresh refreshes them too. */
export const dynoFilesKey = (workspaceId: string, setupId: string) => [...setupKey(workspaceId, setupId), 'dyno-files'] as const;
export const dynoFilesPath = (workspaceId: string, setupId: string) => `${setupPath(workspaceId, setupId)}/dyno-files`;
