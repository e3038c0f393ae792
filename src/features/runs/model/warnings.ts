import type { Metrics } from '../../../../shared/schemas/metrics.ts';
import { type DisplayUnit, formatQuantityText, units } from '../../../lib/format.ts';

/** Stroke use above this share of the available travel is flagged (common practice margin, not a standard). */
export const STROKE_WARNING_SHARE = 0.9;

export interface RunWarning {
  key: 'lift-off' | 'bump-stop' | 'rebound-stop' | 'stroke-compression' | 'stroke-extension' | 'end-of-stroke' | 'beyond-table-compression' | 'beyond-table-rebound';
  text: string;
}

/** Things an engineer must not miss in a run, each in one plain sentence; damper speeds in `vu`. */
export function runWarnings(m: Metrics, vu: DisplayUnit = units.mps): RunWarning[] {
  const out: RunWarning[] = [];
  if (m.liftOffFraction > 0) {
    out.push({ key: 'lift-off', text: `The wheel left the road for ${formatQuantityText(m.liftOffFraction, 'percent')} of the analysed time.` });
  }
  if (m.bumpStopTime > 0) out.push({ key: 'bump-stop', text: `The bump stop was touched for ${formatQuantityText(m.bumpStopTime, 's')}.` });
  if (m.reboundStopTime > 0) out.push({ key: 'rebound-stop', text: `The rebound stop was touched for ${formatQuantityText(m.reboundStopTime, 's')}.` });
  if ((m.strokeUsedCompression ?? 0) > STROKE_WARNING_SHARE) {
    out.push({ key: 'stroke-compression', text: `${formatQuantityText(m.strokeUsedCompression ?? 0, 'percent')} of the compression stroke was used.` });
  }
  if ((m.strokeUsedExtension ?? 0) > STROKE_WARNING_SHARE) {
    out.push({ key: 'stroke-extension', text: `${formatQuantityText(m.strokeUsedExtension ?? 0, 'percent')} of the extension stroke was used.` });
  }
  const bottomed = (m.endOfStrokeDepthCompression ?? 0) > 0;
  const toppedOut = (m.endOfStrokeDepthExtension ?? 0) > 0;
  if (bottomed || toppedOut) {
    const ends = [bottomed && 'compression', toppedOut && 'extension'].filter(Boolean).join(' and ');
    out.push({
      key: 'end-of-stroke',
      text:
        `The suspension reached the end of its stroke in ${ends}: the hard limit took up to ${formatQuantityText(m.endOfStrokeForcePeak ?? 0, 'kN')} ` +
        `and ${formatQuantityText(m.endOfStrokeEnergyPeak ?? 0, 'J')}. Forces and accelerations here depend on the limit's stiffness, not on the setup.`,
    });
  }
  const beyond = (peak: number | undefined, end: number | undefined) => peak !== undefined && end !== undefined && peak > end;
  if (beyond(m.damperSpeedPeakCompression, m.damperTableEndCompression)) {
    out.push({
      key: 'beyond-table-compression',
      text: `Damper speed reached ${formatQuantityText(m.damperSpeedPeakCompression ?? 0, vu)} in compression; the table ends at ${formatQuantityText(m.damperTableEndCompression ?? 0, vu)}, so forces above it are extrapolated.`,
    });
  }
  if (beyond(m.damperSpeedPeakRebound, m.damperTableEndRebound)) {
    out.push({
      key: 'beyond-table-rebound',
      text: `Damper speed reached ${formatQuantityText(m.damperSpeedPeakRebound ?? 0, vu)} in rebound; the table ends at ${formatQuantityText(m.damperTableEndRebound ?? 0, vu)}, so forces above it are extrapolated.`,
    });
  }
  return out;
}
