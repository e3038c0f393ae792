import { z } from 'zod';
import type { StudyPointUpload } from '../../../../shared/schemas/study-record.ts';
import { api } from '../../../lib/api-client.ts';
import { studyPath } from './query-keys.ts';

const Saved = z.object({ saved: z.number().int() });

/** Saves one slice of a run's finished points (the server judges them again). Used by the run hook, not a mutation of its own. */
export const saveStudyPoints = (workspaceId: string, studyId: string, points: StudyPointUpload[]) => api.post(`${studyPath(workspaceId, studyId)}/points`, { points }, Saved);
