// Writes pipit-front-lane-drive.csv: a synthetic drive of the Brume Pipit front corner (an invented
// car of the invented maker Tallis & Brume Motor Works) over the invented test lane
// (examples/tallis-lane.csv), made by the model with the "as built" parameters below, at a speed
// swinging between 11 and 15 m/s, 200 samples per second, 3 % seeded Gaussian noise on every signal.
// Fitting examples/pipit-front.setup.json to it should find those parameters again.
// Run: npx tsx examples/drive/make-drive.ts
import { readFileSync, writeFileSync } from 'node:fs';
import { driveCsv, syntheticDrive } from '../../shared/drive/synthetic-drive.ts';
import { Setup } from '../../shared/schemas/setup.ts';
import { parseMeasuredCsv } from '../../shared/sim/roads/measured-csv.ts';

const SEED = 20261205;
const read = (name: string) => readFileSync(new URL(`../${name}`, import.meta.url), 'utf8');

const drawing = Setup.parse(JSON.parse(read('pipit-front.setup.json')));
// The corner as built differs from the drawing: a stiffer spring, a lighter hub, softer rebound.
const asBuilt = Setup.parse({
  ...drawing,
  springRate: 34_500,
  unsprungMass: 35,
  damper: { ...drawing.damper, rebound: drawing.damper.rebound.map(([v, f]) => [v, Math.round(f * 0.85 * 10) / 10] as [number, number]) },
});
const lane = parseMeasuredCsv(read('tallis-lane.csv'));
if (!lane.ok) throw new Error(lane.reason);
const drive = syntheticDrive({
  setup: asBuilt,
  road: { kind: 'measured', name: 'Tallis test lane', points: lane.profile.points, detrend: 'linear' },
  duration: 20,
  rate: 200,
  speed: 13,
  speedSwing: 2,
  noise: 0.03,
  seed: SEED,
});
if (!drive.ok) throw new Error(drive.reason);
const note = `Synthetic drive, Brume Pipit front corner over the Tallis test lane; made by examples/drive/make-drive.ts, seed ${SEED}; invented data`;
writeFileSync(new URL('./pipit-front-lane-drive.csv', import.meta.url), driveCsv(drive.data, note));
