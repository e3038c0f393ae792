import { type FinishStudyRunInput, StudyDetail } from '../../../../shared/schemas/study-record.ts';
import { api } from '../../../lib/api-client.ts';
import { studyPath } from './query-keys.ts';

/** Closes a run: the server rebuilds the summary from every saved point and answers with the study. */
export const finishStudyRun = (workspaceId: string, studyId: string, input: FinishStudyRunInput) => api.put(`${studyPath(workspaceId, studyId)}/results`, input, StudyDetail);
