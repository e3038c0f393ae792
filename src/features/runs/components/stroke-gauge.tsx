import type { Metrics } from '../../../../shared/schemas/metrics.ts';
import type { Setup } from '../../../../shared/schemas/setup.ts';
import { formatQuantityText } from '../../../lib/format.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';

/**
 * Travel against the stroke the package allows: extension to the left of the static position,
 * compression to the right, the used part filled, stop clearances as ticks. Only drawn when the
 * setup states its stroke.
 */
export function StrokeGauge({ metrics, setup }: { metrics: Metrics; setup: Setup }) {
  const { length } = useUnits();
  const stroke = setup.stroke;
  const text = (m: number) => formatQuantityText(m, length);
  if (!stroke) return <p className="mt-1 text-xs text-ink-faint">No stroke given in the setup: stroke use is not known.</p>;
  const total = stroke.compression + stroke.extension;
  const pos = (travel: number) => (100 * (stroke.extension + travel)) / total;
  const zero = pos(0);
  const comp = Math.min(metrics.travelMaxCompression, stroke.compression * 1.05);
  const ext = Math.min(metrics.travelMaxExtension, stroke.extension * 1.05);
  const hot = (share?: number) => (share ?? 0) > 0.9;
  return (
    <figure className="mt-2" aria-label="Travel used against the available stroke">
      <div className="relative h-5 rounded-sm border border-rule-strong bg-paper-sunk">
        <div className={`absolute inset-y-0 ${hot(metrics.strokeUsedExtension) ? 'bg-signal/70' : 'bg-ink-soft/45'}`} style={{ left: `${pos(-ext)}%`, width: `${zero - pos(-ext)}%` }} />
        <div className={`absolute inset-y-0 ${hot(metrics.strokeUsedCompression) ? 'bg-signal/70' : 'bg-ink-soft/70'}`} style={{ left: `${zero}%`, width: `${pos(comp) - zero}%` }} />
        <div className="absolute -inset-y-1 w-0 border-l-2 border-ink" style={{ left: `${zero}%` }} title="static ride position" />
        {setup.bumpStop && <div className="absolute -inset-y-1 w-0 border-l border-dashed border-signal" style={{ left: `${pos(setup.bumpStop.clearance)}%` }} title="bump stop touches" />}
        {setup.reboundStop && <div className="absolute -inset-y-1 w-0 border-l border-dashed border-signal" style={{ left: `${pos(-setup.reboundStop.clearance)}%` }} title="rebound stop touches" />}
      </div>
      <div className="mt-0.5 flex justify-between text-2xs text-ink-faint">
        <span className="figures">−{text(stroke.extension)} ext.</span>
        <span>static</span>
        <span className="figures">comp. {text(stroke.compression)}</span>
      </div>
      <figcaption className="sr-only">
        Extension used {text(metrics.travelMaxExtension)} of {text(stroke.extension)}; compression used {text(metrics.travelMaxCompression)} of {text(stroke.compression)}.
      </figcaption>
    </figure>
  );
}
