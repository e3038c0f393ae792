import type { Metrics } from '../../../../shared/schemas/metrics.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { runWarnings } from '../model/warnings.ts';

/** Lift-off, stop contact and near-full stroke, in the signal colour; nothing when all is clear. */
export function RunWarnings({ metrics }: { metrics: Metrics }) {
  const warnings = runWarnings(metrics, useUnits().damperVelocity);
  if (warnings.length === 0) return null;
  return (
    <ul aria-label="Warnings" className="mb-4 flex flex-wrap gap-x-5 gap-y-1 rounded border border-signal/35 bg-signal-wash px-3 py-2 text-sm text-signal-ink">
      {warnings.map((w) => (
        <li key={w.key} data-warning={w.key} className="flex items-center gap-1.5">
          <svg viewBox="0 0 16 16" className="size-3.5 shrink-0 text-signal" aria-hidden="true">
            <path d="M8 1.5 15 14H1Z" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinejoin="round" />
            <path d="M8 6v4M8 11.6v.4" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
          </svg>
          {w.text}
        </li>
      ))}
    </ul>
  );
}
