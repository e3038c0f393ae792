// Entry of the server's worker threads: registers tsx (as `node --import tsx` does for the
// server itself), then hands over the task module's functions by name.
import { register } from 'tsx/esm/api';

register();
const tasks = await import('./heavy-tasks.ts');
export const { measuredUpload, roadFigures, dynoRead, dynoFit, sheetCheckFiles, studyRunFigures, driveRead } = tasks;
