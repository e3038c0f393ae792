/**
 * `npm run bench`: medians over repeated runs of the reference problems (bench/problems.ts).
 * Pass `--quick` for fewer repeats. Timings depend on the machine and its load; nothing here
 * is asserted, the table is for reading.
 */
import { Setup } from '../shared/schemas/setup.ts';
import { Road } from '../shared/schemas/road.ts';
import { integrateCorner } from '../shared/sim/integrate.ts';
import { computeMetrics } from '../shared/sim/metrics/compute-metrics.ts';
import { cornerModel, staticEquilibrium } from '../shared/sim/quarter-car.ts';
import { buildRoad } from '../shared/sim/roads/index.ts';
import { clearIsoRoadCache } from '../shared/sim/roads/iso8608.ts';
import { runCorner } from '../shared/sim/run-corner.ts';
import { figuresFromMetrics } from '../shared/study/figures.ts';
import { createStudyRunner } from '../shared/study/run-jobs.ts';
import { worstDifference } from '../shared/sim/metrics/figure-differences.ts';
import type { IntegratorName } from '../shared/schemas/run.ts';
import { runVehicle } from '../shared/sim/vehicle/run-vehicle.ts';
import { DURATION, isoC, vehicleRun, linearSetup, nonLinearSetup, request, SPEED, studyContext, sweepJobs, sweepRequests } from './problems.ts';
import { median, timeIt, type Timings } from './stats.ts';
import { startPool } from './sweep.ts';

const quick = process.argv.includes('--quick');
const REPEATS = quick ? 3 : 9;
const SWEEP_REPEATS = quick ? 1 : 3;

const rows: Array<[string, string, string]> = [];
const row = (what: string, value: string, note = '') => {
  rows.push([what, value, note]);
  process.stderr.write(`  ${what}: ${value}\n`);
};

/** "cpu / wall" medians in ms. */
const ms = (t: Timings) => `${median(t.cpu).toFixed(1)} / ${median(t.wall).toFixed(1)}`;
const perSecond = (t: Timings) => `${(median(t.cpu) / DURATION).toFixed(3)} / ${(median(t.wall) / DURATION).toFixed(3)}`;

function prepare(setupDoc: unknown) {
  const setup = Setup.parse(setupDoc);
  const st = staticEquilibrium(setup);
  if (!st.ok) throw new Error(st.reason);
  const road = buildRoad(Road.parse(isoC), SPEED, DURATION, setup.tyreFootprint);
  if (!road.ok) throw new Error(road.reason);
  return { setup, statics: st.state, model: cornerModel(setup, st.state), road: road.road };
}

async function main() {
  process.stderr.write(`Ridewright benchmark (${quick ? 'quick' : 'full'}): ISO 8608 class C, seed 7, ${SPEED} m/s, ${DURATION} s\n`);

  // 1. Integration cost per simulated second, road prepared beforehand, for each path.
  const paths: Array<[string, IntegratorName]> = [
    ['rk4 (default)', 'rk4'],
    ['odex 1e-4', 'odex'],
  ];
  for (const [label, doc] of [
    ['linear corner', linearSetup],
    ['non-linear corner', nonLinearSetup],
  ] as const) {
    const p = prepare(doc);
    for (const [name, integrator] of paths) {
      let stats = { steps: 0, rhsEvaluations: 0, rejectedSteps: 0, segments: 0 };
      const times = timeIt(() => {
        const r = integrateCorner(p.model, p.road, { duration: DURATION, outputRate: 500, integrator });
        if (!r.ok) throw new Error(r.reason);
        stats = r.stats;
      }, REPEATS);
      row(`${name}, ${label}: integration, ms per simulated second`, perSecond(times), `${stats.steps} steps, ${stats.rejectedSteps} rejected, ${stats.rhsEvaluations} RHS evaluations, ${stats.segments} pieces`);
    }
  }

  // 2. One 60 s non-linear run end to end: validation, road generation (no cached road),
  //    integration, all metrics, modal analysis; what `npm run sim` does, for each path.
  for (const [name, integrator] of paths) {
    const e2e = timeIt(() => {
      clearIsoRoadCache();
      const out = runCorner(request(nonLinearSetup, { integrator }));
      if (!out.ok) throw new Error(out.reason);
    }, REPEATS);
    row(`${name}: 60 s non-linear run end to end (ms, median)`, ms(e2e), `${perSecond(e2e)} ms per simulated second; wall min ${Math.min(...e2e.wall).toFixed(1)}, max ${Math.max(...e2e.wall).toFixed(1)}`);
  }
  const roadGen = timeIt(() => {
    clearIsoRoadCache();
    prepare(nonLinearSetup);
  }, REPEATS);
  const p0 = prepare(nonLinearSetup);
  const r0 = integrateCorner(p0.model, p0.road, { duration: DURATION, outputRate: 500, integrator: 'odex' });
  if (!r0.ok) throw new Error(r0.reason);
  const metricTimes = timeIt(() => computeMetrics(r0.trace, { settleTime: 2, staticTyreLoad: p0.statics.tyreLoad }), REPEATS);
  row('  of which road generation (ms, median)', ms(roadGen));
  row('  of which metrics (ms, median)', ms(metricTimes));
  const warm = timeIt(() => {
    const out = runCorner(request(nonLinearSetup));
    if (!out.ok) throw new Error(out.reason);
  }, REPEATS);
  row('60 s non-linear run, road already generated (ms, median)', ms(warm), 'default path; as in a live run that keeps its road');
  benchVehicle();

  // 3. 400 runs over 2 worker threads.
  const requests = sweepRequests();
  const t0 = performance.now();
  const pool = await startPool(2);
  const startup = performance.now() - t0;
  const sweepTimes: number[] = [];
  let failures = 0;
  for (let i = 0; i < SWEEP_REPEATS; i++) {
    const s0 = performance.now();
    const results = await pool.run(requests);
    sweepTimes.push(performance.now() - s0);
    failures = results.filter((r) => 'error' in r).length;
  }
  row('400 runs on 2 worker threads (s, median)', (median(sweepTimes) / 1000).toFixed(2), `runCorner (default path, road rebuilt per run from the cache); workers started beforehand (${(startup / 1000).toFixed(2)} s to start); ${failures} failed runs`);

  // 3b. The study path: the same integrator, what a study worker runs for each point, with the
  //     road sampled once per road, speed and step and shared by every point.
  const studyCtx = studyContext();
  const jobs = sweepJobs();
  const baseJob = { pointIndex: 0, values: {}, roadIndex: 0, speed: SPEED };
  const studyFirst = timeIt(() => {
    clearIsoRoadCache();
    const out = createStudyRunner(studyCtx).run(baseJob);
    if (!out.run.figures) throw new Error(out.run.error ?? 'study run failed');
  }, REPEATS);
  const runner = createStudyRunner(studyCtx);
  runner.run(baseJob);
  let k = 0;
  const studyWarm = timeIt(() => {
    const out = runner.run(jobs[k++ % jobs.length]);
    if (!out.run.figures) throw new Error(out.run.error ?? 'study run failed');
  }, REPEATS);
  row('60 s non-linear run, study path, first of a study (ms, median)', ms(studyFirst), 'road generated and sampled');
  row('60 s non-linear run, study path, road kept (ms, median)', ms(studyWarm), 'every later run of the same road and speed');
  const studyTimes: number[] = [];
  for (let i = 0; i < SWEEP_REPEATS; i++) {
    const s0 = performance.now();
    const results = await pool.runStudy(jobs);
    studyTimes.push(performance.now() - s0);
    failures = results.filter((r) => 'error' in r).length;
  }
  await pool.close();
  row('400 runs on 2 worker threads, study path (s, median)', (median(studyTimes) / 1000).toFixed(2), `as a study runs them; ${failures} failed runs`);

  // 4. Accuracy: every figure of each path against odex at a tolerance of 1e-8 (the worst one,
  //    scaled as in shared/sim/metrics/figure-differences.ts).
  const reference = runCorner(request(nonLinearSetup, { integrator: 'odex', tolerance: 1e-8 }));
  if (!reference.ok) throw new Error(reference.reason);
  for (const [name, integrator] of paths) {
    const out = runCorner(request(nonLinearSetup, { integrator }));
    if (!out.ok) throw new Error(out.reason);
    const w = worstDifference(out.result.metrics, reference.result.metrics);
    row(`${name}: worst figure difference from odex at 1e-8`, `${(w.relative * 100).toFixed(3)} %`, `${w.key}; ${out.result.timing.rhsEvaluations} RHS evaluations`);
  }
  const studyOut = createStudyRunner(studyCtx).run(baseJob);
  const refFigures = figuresFromMetrics(reference.result.metrics);
  let worstStudy = { key: '', rel: 0 };
  for (const [key, v] of Object.entries(studyOut.run.figures ?? {})) {
    const r = refFigures[key as keyof typeof refFigures];
    if (typeof v !== 'number' || typeof r !== 'number' || r === 0) continue;
    const rel = Math.abs(v / r - 1);
    if (rel > worstStudy.rel) worstStudy = { key, rel };
  }
  row('study path: worst study figure difference from odex at 1e-8', `${(worstStudy.rel * 100).toFixed(3)} %`, worstStudy.key);

  const w0 = Math.max(...rows.map((r) => r[0].length));
  const w1 = Math.max(...rows.map((r) => r[1].length));
  const lines = rows.map(([a, b, c]) => `${a.padEnd(w0)}  ${b.padStart(w1)}  ${c}`);
  process.stdout.write(`\nSingle-thread figures are "CPU / wall" medians: CPU time is the cost on one core, wall time also\ncounts waiting for the CPU when the machine is shared. The sweep is wall time.\n`);
  process.stdout.write(`\n${'figure'.padEnd(w0)}  ${'value'.padStart(w1)}  note\n${'-'.repeat(w0 + w1 + 8)}\n${lines.join('\n')}\n`);
  process.stdout.write(`\nrepeats: ${REPEATS} (sweep ${SWEEP_REPEATS}); Node ${process.version}; load average ${(await import('node:os')).loadavg().map((x) => x.toFixed(1)).join(' ')}\n`);
}

/** The Pipit hatchback (both non-linear corners) over the same road: a whole vehicle run. */
function benchVehicle() {
  const vehicleRequest = { ...vehicleRun(), road: isoC, speed: SPEED, duration: DURATION };
  let last: ReturnType<typeof runVehicle> | undefined;
  const times = timeIt(() => {
    last = runVehicle(vehicleRequest);
    if (!last.ok) throw new Error(last.reason);
  }, REPEATS);
  const t = last?.ok ? last.result.timing : undefined;
  row(
    '60 s vehicle run (pitch plane, two non-linear axles), road already generated (ms, median)',
    ms(times),
    t ? `integration ${t.integrateMs.toFixed(0)} ms of the last; ${t.steps} steps, ${t.rejectedSteps} rejected, ${t.rhsEvaluations} RHS evaluations` : '',
  );
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
