import { setupPath } from '../../../lib/queries/setups.ts';

/**
 * Where a revision downloads as its setup file. A plain link does it: the server answers with
 * `Content-Disposition: attachment` and the session cookie comes along.
 */
export const exportRevisionUrl = (workspaceId: string, setupId: string, number: number) => `${setupPath(workspaceId, setupId)}/revisions/${number}/export`;
