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
import type { TraceColumns } from '../shared/sim/trace.ts';
import { createStudyRunner } from '../shared/study/run-jobs.ts';
import { integrateFixedStep, sampleRoad, stepPlanFor } from '../shared/study/fixed-step.ts';
import { DURATION, isoC, linearSetup, nonLinearSetup, request, SPEED, studyContext, sweepJobs, sweepRequests } from './problems.ts';
import { rk4Corner } from './rk4.ts';
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

function metricsOf(trace: TraceColumns, staticTyreLoad: number) {
  const m = computeMetrics(trace, { settleTime: 2, staticTyreLoad });
  return { bodyAccelRms: m.bodyAccelRms, bodyAccelWkRms: m.bodyAccelWkRms, bodyAccelPeak: m.bodyAccelPeak, tyreLoadRms: m.tyreLoadRms, travelRms: m.travelRms, travelMaxCompression: m.travelMaxCompression, damperVelocityRms: m.damperVelocityRms };
}

function worstDifference(a: Record<string, number>, ref: Record<string, number>) {
  let worst = { key: '', rel: 0 };
  for (const k of Object.keys(ref)) {
    const rel = Math.abs(a[k] / ref[k] - 1);
    if (rel > worst.rel) worst = { key: k, rel };
  }
  return `${(worst.rel * 100).toFixed(3)} % (${worst.key})`;
}

async function main() {
  process.stderr.write(`Ridewright benchmark (${quick ? 'quick' : 'full'}): ISO 8608 class C, seed 7, ${SPEED} m/s, ${DURATION} s\n`);

  // 1. Integration cost per simulated second, road prepared beforehand.
  for (const [label, doc] of [
    ['linear corner', linearSetup],
    ['non-linear corner', nonLinearSetup],
  ] as const) {
    const p = prepare(doc);
    let stats = { steps: 0, rhsEvaluations: 0, rejectedSteps: 0, segments: 0 };
    const times = timeIt(() => {
      const r = integrateCorner(p.model, p.road, { duration: DURATION, outputRate: 500 });
      if (!r.ok) throw new Error(r.reason);
      stats = r.stats;
    }, REPEATS);
    row(`odex, ${label}: ms per simulated second`, perSecond(times), `${stats.steps} steps, ${stats.rejectedSteps} rejected, ${stats.rhsEvaluations} RHS evaluations, ${stats.segments} pieces`);
  }

  // 2. One 60 s non-linear run end to end: validation, road generation (no cached road),
  //    integration, all metrics, modal analysis.
  const e2e = timeIt(() => {
    clearIsoRoadCache();
    const out = runCorner(request(nonLinearSetup));
    if (!out.ok) throw new Error(out.reason);
  }, REPEATS);
  row('60 s non-linear run end to end (ms, median)', ms(e2e), `wall min ${Math.min(...e2e.wall).toFixed(1)}, max ${Math.max(...e2e.wall).toFixed(1)}`);
  const roadGen = timeIt(() => {
    clearIsoRoadCache();
    prepare(nonLinearSetup);
  }, REPEATS);
  const p0 = prepare(nonLinearSetup);
  const r0 = integrateCorner(p0.model, p0.road, { duration: DURATION, outputRate: 500 });
  if (!r0.ok) throw new Error(r0.reason);
  const metricTimes = timeIt(() => computeMetrics(r0.trace, { settleTime: 2, staticTyreLoad: p0.statics.tyreLoad }), REPEATS);
  row('  of which road generation (ms, median)', ms(roadGen));
  row('  of which metrics (ms, median)', ms(metricTimes));
  const warm = timeIt(() => {
    const out = runCorner(request(nonLinearSetup));
    if (!out.ok) throw new Error(out.reason);
  }, REPEATS);
  row('60 s non-linear run, road already generated (ms, median)', ms(warm), 'as in a study, where a worker keeps its road');

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
  row('400 runs on 2 worker threads (s, median)', (median(sweepTimes) / 1000).toFixed(2), `runCorner (odex); workers started beforehand (${(startup / 1000).toFixed(2)} s to start); ${failures} failed runs`);

  // 3b. The study path: what a study worker runs for each point (fixed-step RK4 on a road
  //     sampled once per road and speed, shared/study/fixed-step.ts), alone and over 2 threads.
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
  row('60 s non-linear run, study path, first of a study (ms, median)', ms(studyFirst), 'fixed-step RK4; road generated and sampled');
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

  // 4. Fixed-step RK4 at 1 kHz on the non-linear problem, against odex at its default tolerance,
  //    both compared with odex at a tolerance of 1e-8.
  const p = prepare(nonLinearSetup);
  const ref = integrateCorner(p.model, p.road, { duration: DURATION, outputRate: 500, tolerance: 1e-8 });
  const def = integrateCorner(p.model, p.road, { duration: DURATION, outputRate: 500 });
  if (!ref.ok || !def.ok) throw new Error('reference run failed');
  let rk = rk4Corner(p.model, p.road, DURATION);
  const rkTimes = timeIt(() => {
    rk = rk4Corner(p.model, p.road, DURATION);
  }, REPEATS);
  const odexTimes = timeIt(() => integrateCorner(p.model, p.road, { duration: DURATION, outputRate: 500 }), REPEATS);
  const mRef = metricsOf(ref.trace, p.statics.tyreLoad);
  row('RK4 1 kHz, non-linear: ms per simulated second', perSecond(rkTimes), `${rk.rhsEvaluations} RHS evaluations`);
  row('RK4 1 kHz: worst metric difference from odex at 1e-8', worstDifference(metricsOf(rk.trace, p.statics.tyreLoad), mRef));
  row('odex default (1e-4): ms per simulated second', perSecond(odexTimes), `${def.stats.rhsEvaluations} RHS evaluations`);
  row('odex default (1e-4): worst metric difference from odex at 1e-8', worstDifference(metricsOf(def.trace, p.statics.tyreLoad), mRef));
  const plan = stepPlanFor(p.setup);
  const fixed = integrateFixedStep(p.setup, sampleRoad(p.road, DURATION, plan), DURATION);
  if (!fixed.ok) throw new Error(fixed.reason);
  row('study path (fixed-step RK4): worst metric difference from odex at 1e-8', worstDifference(metricsOf(fixed.trace, p.statics.tyreLoad), mRef), `${plan.outputsPerStep === 2 ? 'one RK4 step per two output samples' : `${plan.substeps} RK4 steps per output sample`}`);

  const w0 = Math.max(...rows.map((r) => r[0].length));
  const w1 = Math.max(...rows.map((r) => r[1].length));
  const lines = rows.map(([a, b, c]) => `${a.padEnd(w0)}  ${b.padStart(w1)}  ${c}`);
  process.stdout.write(`\nSingle-thread figures are "CPU / wall" medians: CPU time is the cost on one core, wall time also\ncounts waiting for the CPU when the machine is shared. The sweep is wall time.\n`);
  process.stdout.write(`\n${'figure'.padEnd(w0)}  ${'value'.padStart(w1)}  note\n${'-'.repeat(w0 + w1 + 8)}\n${lines.join('\n')}\n`);
  process.stdout.write(`\nrepeats: ${REPEATS} (sweep ${SWEEP_REPEATS}); Node ${process.version}; load average ${(await import('node:os')).loadavg().map((x) => x.toFixed(1)).join(' ')}\n`);
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
