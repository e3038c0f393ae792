import type { MatrixEntries } from '../helpers/route-matrix.ts';
import { apiTokensEntries } from './api-tokens-entries.ts';
import { fleetEntries } from './fleet-entries.ts';
import { drivesEntries } from './drives-entries.ts';
import { platformEntries } from './platform-entries.ts';
import { roadsDynoEntries } from './roads-dyno-entries.ts';
import { runsEntries } from './runs-entries.ts';
import { setupsEntries } from './setups-entries.ts';
import { studiesEntries } from './studies-entries.ts';
import { targetSheetsEntries } from './target-sheets-entries.ts';

/**
 * Every matrix entry. A feature that registers routes adds `tests/api/matrix/<feature>-entries.ts`
 * and spreads it here; the route × role test fails for any route without an entry.
 */
export const allEntries: MatrixEntries = {
  ...platformEntries,
  ...runsEntries,
  ...roadsDynoEntries,
  ...setupsEntries,
  ...studiesEntries,
  ...fleetEntries,
  ...targetSheetsEntries,
  ...apiTokensEntries,
  ...drivesEntries,
};
