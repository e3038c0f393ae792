import { useMutation } from '@tanstack/react-query';
import { CreatedShareLink } from '../../../../shared/schemas/share-link.ts';
import { api } from '../../../lib/api-client.ts';

/** A read-only link to a study, through the workspace's share links (the token is in this answer only); null `expiresAt` lasts until withdrawn. */
export const shareStudy = (workspaceId: string, studyId: string, expiresAt: string | null) =>
  api.post(`/api/workspaces/${encodeURIComponent(workspaceId)}/share-links`, { objectType: 'study', objectId: studyId, expiresAt }, CreatedShareLink);

export function useShareStudy(workspaceId: string, studyId: string) {
  return useMutation({ mutationFn: (expiresAt: string | null) => shareStudy(workspaceId, studyId, expiresAt) });
}
