import { useMutation, useQueryClient } from '@tanstack/react-query';
import { OpenedStudyPoint } from '../../../../shared/schemas/study-record.ts';
import { api } from '../../../lib/api-client.ts';
import { setupsKey } from '../../../lib/queries/setups.ts';
import { studyPath } from './query-keys.ts';

export const openPointAsSetup = (workspaceId: string, studyId: string, index: number, message?: string) =>
  api.post(`${studyPath(workspaceId, studyId)}/points/${index}/open-as-setup`, message ? { message } : {}, OpenedStudyPoint);

/** A point saved as the next revision of the base setup; the setups caches refresh. */
export function useOpenPointAsSetup(workspaceId: string, studyId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (index: number) => openPointAsSetup(workspaceId, studyId, index),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: setupsKey(workspaceId) }),
  });
}
