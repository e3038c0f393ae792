import type { StudyDefinition } from '../schemas/study.ts';
import type { StudyPointResult, StudyPointValues, StudyRunOutcome, StudyViolation } from '../schemas/study-result.ts';
import { ensembleFigures } from './ensemble.ts';

const pct = (x: number) => `${(100 * x).toFixed(1)} %`;
const where = (run: StudyRunOutcome, roadName: (i: number) => string) => `on ${roadName(run.roadIndex)} at ${run.speed} m/s${run.seedIndex ? ` (seed ${run.seedIndex + 1})` : ''}`;

/**
 * Limits checked run by run: a point is feasible only when every road and speed meets every
 * limit, whatever the aggregation chosen for the figures. A limit that needs a figure the run
 * lacks (stroke used without a stroke in the setup) fails as not checkable rather than passing.
 */
export function runViolations(def: Pick<StudyDefinition, 'constraints'>, run: StudyRunOutcome, roadName: (i: number) => string = (i) => `road ${i + 1}`): StudyViolation[] {
  const at = { roadIndex: run.roadIndex, speed: run.speed };
  if (!run.figures) return [{ kind: 'runFailed', limit: null, value: null, ...at, message: `the run ${where(run, roadName)} failed: ${run.error ?? 'no reason given'}` }];
  const f = run.figures;
  const c = def.constraints;
  const out: StudyViolation[] = [];
  if (c.maxStrokeUsed !== undefined) {
    if (f.strokeUsed === undefined) {
      out.push({ kind: 'notCheckable', limit: c.maxStrokeUsed, value: null, ...at, message: 'the setup gives no available stroke, so stroke used cannot be checked' });
    } else if (f.strokeUsed > c.maxStrokeUsed) {
      out.push({ kind: 'maxStrokeUsed', limit: c.maxStrokeUsed, value: f.strokeUsed, ...at, message: `uses ${pct(f.strokeUsed)} of the stroke ${where(run, roadName)} (limit ${pct(c.maxStrokeUsed)})` });
    }
  }
  if (c.maxLiftOffFraction !== undefined && f.liftOffFraction !== undefined && f.liftOffFraction > c.maxLiftOffFraction) {
    out.push({ kind: 'maxLiftOffFraction', limit: c.maxLiftOffFraction, value: f.liftOffFraction, ...at, message: `wheel off the road ${pct(f.liftOffFraction)} of the time ${where(run, roadName)} (limit ${pct(c.maxLiftOffFraction)})` });
  }
  if (c.minTyreLoad !== undefined && f.tyreLoadMin !== undefined && f.tyreLoadMin < c.minTyreLoad) {
    out.push({ kind: 'minTyreLoad', limit: c.minTyreLoad, value: f.tyreLoadMin, ...at, message: `tyre load falls to ${Math.round(f.tyreLoadMin)} N ${where(run, roadName)} (limit ${Math.round(c.minTyreLoad)} N)` });
  }
  const sag = f.staticSag;
  const mm = (x: number) => `${(1000 * x).toFixed(0)} mm`;
  for (const [kind, limit, breaks, words] of [
    ['minStaticSag', c.minStaticSag, (s: number, l: number) => s < l, 'least'],
    ['maxStaticSag', c.maxStaticSag, (s: number, l: number) => s > l, 'most'],
  ] as const) {
    if (limit === undefined) continue;
    if (sag === undefined) out.push({ kind: 'notCheckable', limit, value: null, ...at, message: 'the run kept no static sag, so the sag limit cannot be checked' });
    else if (breaks(sag, limit)) out.push({ kind, limit, value: sag, ...at, message: `static sag ${mm(sag)} (${words} allowed ${mm(limit)})` });
  }
  return out;
}

/**
 * One point's result from its runs: figures aggregated over the successful runs (over several
 * seeds: the mean over the seeds, with the spread), the objective values in the definition's
 * order, and feasibility with every reason — every run of every seed must meet the limits. Pass `setupError` when
 * the swept values could not make a valid setup (the point then has no runs).
 */
export function evaluatePoint(
  def: Pick<StudyDefinition, 'aggregate' | 'objectives' | 'constraints'> & { seeds?: number },
  point: { index: number; values: StudyPointValues },
  runs: readonly StudyRunOutcome[],
  opts: { setupError?: string; roadName?: (i: number) => string } = {},
): StudyPointResult {
  const violations: StudyViolation[] = opts.setupError
    ? [{ kind: 'setupInvalid', limit: null, value: null, roadIndex: null, speed: null, message: opts.setupError }]
    : runs.flatMap((r) => runViolations(def, r, opts.roadName));
  const { figures, spread } = ensembleFigures(runs, def.aggregate, def.seeds ?? 1);
  return {
    index: point.index,
    values: point.values,
    runs: [...runs],
    figures,
    ...(spread ? { spread } : {}),
    objectives: def.objectives.map((o) => figures[o.figure] ?? null),
    feasible: violations.length === 0 && runs.length > 0,
    violations,
  };
}
