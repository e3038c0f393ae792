// What other parts of the server may use from this domain; everything else stays inside it.
export { findStudy, findStudyById, insertStudy, listStudyPoints, upsertStudyPoints, withStudyBytes } from './studies.repository.ts';
export { definitionOf, detailOf, studyRoadsOf } from './studies.service.ts';
