import { setupKey, setupPath } from '../../../lib/queries/setups.ts';

/** Drives sit under the setup's key prefix, so a setup refresh refreshes them too. */
export const drivesKey = (workspaceId: string, setupId: string) => [...setupKey(workspaceId, setupId), 'drives'] as const;
export const drivesPath = (workspaceId: string, setupId: string) => `${setupPath(workspaceId, setupId)}/drives`;
