import type { DynoPeakPoints, DynoPoint } from '../schemas/dyno.ts';
import type { ConformityReport, DamperCheck, DirectionCheck, PointCheck, TargetPoint, TargetSheetContent } from '../schemas/target-sheet.ts';
import { interpolateMeasured, mergeSameVelocity } from '../dyno/peak-points.ts';
import { toleranceBand, withinBand } from './band.ts';

/** Shown beside results so nobody has to guess how a measured force was read. */
export const conformityMethod =
  'Measured force at each reference speed by straight-line interpolation between the neighbouring measured points (repeats at one speed averaged); a reference speed outside the measured range is not measured and fails.';

/** Checks one direction's reference points against that direction's measured peak points. */
export function checkDirection(targets: readonly TargetPoint[], measured: readonly DynoPoint[]): DirectionCheck {
  const pts = mergeSameVelocity(measured);
  const points: PointCheck[] = targets.map((t) => {
    const band = toleranceBand(t);
    const m = interpolateMeasured(pts, t.velocity);
    if (m === undefined) {
      return { velocity: t.velocity, target: t.force, lower: band.lower, upper: band.upper, measured: null, deviation: null, deviationPct: null, pass: false, verdict: 'not-measured' };
    }
    const pass = withinBand(band, m);
    const deviation = m - t.force;
    return {
      velocity: t.velocity,
      target: t.force,
      lower: band.lower,
      upper: band.upper,
      measured: m,
      deviation,
      deviationPct: t.force !== 0 ? (100 * deviation) / t.force : null,
      pass,
      verdict: pass ? 'within' : m < t.force ? 'below' : 'above',
    };
  });
  return { points, pass: points.every((p) => p.pass) };
}

/** Checks one measured damper (peak points in SI, as `parseDynoCsv`/`seriesToPeaks` give) against a sheet. */
export function checkDamper(label: string, sheet: Pick<TargetSheetContent, 'compression' | 'rebound'>, peaks: DynoPeakPoints): DamperCheck {
  const compression = checkDirection(sheet.compression, peaks.compression);
  const rebound = checkDirection(sheet.rebound, peaks.rebound);
  return { label, compression, rebound, pass: compression.pass && rebound.pass };
}

/** Checks every damper of an upload; the verdict passes only when every point of every damper does. */
export function checkConformity(
  sheet: Pick<TargetSheetContent, 'compression' | 'rebound'>,
  dampers: readonly { label: string; peaks: DynoPeakPoints }[],
): ConformityReport {
  const checked = dampers.map((d) => checkDamper(d.label, sheet, d.peaks));
  const passed = checked.filter((d) => d.pass).length;
  return {
    dampers: checked,
    verdict: checked.length > 0 && passed === checked.length ? 'pass' : 'fail',
    passed,
    failed: checked.length - passed,
    method: conformityMethod,
  };
}
