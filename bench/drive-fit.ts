/**
 * `npm run bench:drive`: the drive fit of the example (examples/drive/), timed over repeated runs
 * (medians), with how far each fitted value lands from the value the drive was made with.
 * Nothing is asserted; the checks are in tests/reference/drive-fit.test.ts.
 */
import { readFileSync } from 'node:fs';
import { fitDrive } from '../shared/drive/fit-drive.ts';
import { parseDriveCsv } from '../shared/drive/parse-drive-csv.ts';
import { Setup } from '../shared/schemas/setup.ts';
import { parseMeasuredCsv } from '../shared/sim/roads/measured-csv.ts';
import { median } from './stats.ts';

const quick = process.argv.includes('--quick');
const REPEATS = quick ? 2 : 5;
const read = (name: string) => readFileSync(new URL(`../examples/${name}`, import.meta.url), 'utf8');

const drawing = Setup.parse(JSON.parse(read('pipit-front.setup.json')));
const drive = parseDriveCsv(read('drive/pipit-front-lane-drive.csv'));
if (!drive.ok) throw new Error(drive.errors[0].message);
const lane = parseMeasuredCsv(read('tallis-lane.csv'));
if (!lane.ok) throw new Error(lane.reason);
// The values examples/drive/make-drive.ts made the drive with.
const madeWith: Record<string, number> = { unsprungMass: 35, springRate: 34_500, tyreRate: drawing.tyreRate, compressionScale: 1, reboundScale: 0.85 };

const wall: number[] = [];
let last: ReturnType<typeof fitDrive> | null = null;
for (let i = 0; i < REPEATS + 1; i++) {
  const t0 = performance.now();
  last = fitDrive({
    setup: drawing,
    data: drive.data,
    road: { kind: 'profile', road: { kind: 'measured', name: 'Tallis test lane', points: lane.profile.points } },
    parameters: ['unsprungMass', 'springRate', 'tyreRate', 'compressionScale', 'reboundScale'],
  });
  // the first run warms the JIT and is not counted
  if (i > 0) wall.push(performance.now() - t0);
}
if (!last?.ok) throw new Error(last?.reason ?? 'no fit');
const out = {
  drive: `${drive.summary.duration.toFixed(0)} s at ${drive.summary.rate.toFixed(0)} Hz, ${last.channels.length} signals, ${last.parameters.length} parameters`,
  fitWallMsMedian: Math.round(median(wall)),
  iterations: last.iterations,
  simulations: last.simulations,
  msPerSimulation: Math.round(median(wall) / last.simulations),
  parameters: last.parameters.map((p) => ({ key: p.key, fitted: Number(p.value.toPrecision(5)), madeWith: madeWith[p.key], errorPercent: Number((((p.value - madeWith[p.key]) / madeWith[p.key]) * 100).toFixed(3)), halfWidth95: p.halfWidth && Number(p.halfWidth.toPrecision(2)) })),
  normalisedError: Object.fromEntries(last.channels.map((c) => [c.channel, Number(c.error.toFixed(4))])),
  coherence: Object.fromEntries(last.channels.map((c) => [c.channel, Number(c.coherence.toFixed(3))])),
};
process.stdout.write(`${JSON.stringify(out, null, 2)}\n`);
