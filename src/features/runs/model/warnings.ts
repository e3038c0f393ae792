import type { Metrics } from '../../../../shared/schemas/metrics.ts';
import { formatQuantityText } from '../../../lib/format.ts';

/** Stroke use above this share of the available travel is flagged (common practice margin, not a standard). */
export const STROKE_WARNING_SHARE = 0.9;

export interface RunWarning {
  key: 'lift-off' | 'bump-stop' | 'rebound-stop' | 'stroke-compression' | 'stroke-extension';
  text: string;
}

/** Things an engineer must not miss in a run, each in one plain sentence. */
export function runWarnings(m: Metrics): RunWarning[] {
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
  return out;
}
