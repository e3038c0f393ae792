// What other parts of the server may use from this domain; everything else stays inside it.
export { analyseSetup, parseStoredSetup } from './corner-figures.ts';
export { findRevision, findRevisionById, findRevisionInWorkspace, findSetup, findSlotHolder, latestRevisionNumber, listSetupSummaries, listSetupSummariesOfVehicles, type SetupSummaryRow, updateSetupRow } from './setups.repository.ts';
export { addRevisionInTx, insertNewSetupInTx, placeInSlotInTx, toSummary } from './setups.service.ts';
