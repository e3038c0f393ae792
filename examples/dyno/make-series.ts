// Writes pipit-front-sine-record.csv from the curve in shared/dyno/example-record.ts.
// Run: npx tsx examples/dyno/make-series.ts
import { writeFileSync } from 'node:fs';
import { exampleRecordCsv } from '../../shared/dyno/example-record.ts';

writeFileSync(new URL('./pipit-front-sine-record.csv', import.meta.url), exampleRecordCsv());
