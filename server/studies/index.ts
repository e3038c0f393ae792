// What other parts of the server may use from this domain; everything else stays inside it.
export { findStudy, findStudyById, insertStudy, insertStudyPointsOnce, listStudyPointIndices, listStudyPoints, upsertStudyPoints, withStudyBytes } from './studies.repository.ts';
export { closeStudyRunInTx, finishStudyRun, pointRow as studyPointRow } from './study-results.service.ts';
export { definitionOf, detailOf, studyRoadsOf } from './studies.service.ts';
