import type { Metrics } from '../../schemas/metrics.ts';

/**
 * How far one run's figures are from a reference run's, figure by figure, each relative to a
 * scale that fits it: the figure itself for levels, peaks and energies; the whole (1) for
 * shares of time and of the damper speed histogram; the analysed time for times spent on a
 * stop; the static load for the minimum tyre load (0 whenever the wheel lifts); the travel's RMS
 * for the mean travel (near 0 on a symmetric or short run, so its own size is no scale). Used to hold
 * one integrator to another (tests, `npm run bench`).
 */
export interface FigureDifference {
  /** `travelRms`, `damperVelocityBands.low`, `damperVelocityHistogram.12`, … */
  key: string;
  /** |a − ref| / scale. */
  relative: number;
}

const SHARES = new Set(['liftOffFraction', 'damperVelocityBands.low', 'damperVelocityBands.mid', 'damperVelocityBands.high', 'damperVelocityBands.compression']);

/** Every numeric figure of a metrics object, flattened, with the histogram as shares of its samples. */
export function metricFigures(m: Metrics): Record<string, number> {
  const out: Record<string, number> = {};
  for (const [k, v] of Object.entries(m)) if (typeof v === 'number') out[k] = v;
  for (const [k, v] of Object.entries(m.damperVelocityBands)) if (k.endsWith('Edge') === false) out[`damperVelocityBands.${k}`] = v;
  const total = m.damperVelocityHistogram.counts.reduce((s, c) => s + c, 0) || 1;
  m.damperVelocityHistogram.counts.forEach((c, i) => (out[`damperVelocityHistogram.${i}`] = c / total));
  return out;
}

export function figureDifferences(a: Metrics, ref: Metrics): FigureDifference[] {
  const fa = metricFigures(a);
  const fr = metricFigures(ref);
  const scaleOf = (k: string, v: number) =>
    SHARES.has(k) || k.startsWith('damperVelocityHistogram.') ? 1 : k.endsWith('StopTime') ? ref.analysedTime : k === 'tyreLoadMin' ? ref.tyreLoadStatic : k === 'travelMean' ? ref.travelRms : Math.abs(v);
  return Object.keys(fr).map((key) => ({ key, relative: Math.abs((fa[key] ?? NaN) - fr[key]) / Math.max(scaleOf(key, fr[key]), 1e-300) }));
}

/** The largest difference (NaN counts as largest: a figure one run lacks). */
export function worstDifference(a: Metrics, ref: Metrics): FigureDifference {
  let worst: FigureDifference = { key: '', relative: 0 };
  for (const d of figureDifferences(a, ref)) if (!(d.relative <= worst.relative)) worst = d;
  return worst;
}
