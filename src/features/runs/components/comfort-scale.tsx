import type { ComfortGrading } from '../../../../shared/schemas/metrics.ts';
import { comfortBands } from '../../../../shared/sim/metrics/iso2631.ts';
import { formatSig } from '../../../lib/format.ts';

const LOW = 0.1;
const HIGH = 4;
/** Position on a log axis from LOW to HIGH, in % of the width. */
const at = (aw: number) => (100 * Math.log(Math.min(HIGH, Math.max(LOW, aw)) / LOW)) / Math.log(HIGH / LOW);
const TICKS = [0.1, 0.315, 0.63, 1, 1.6, 2.5, 4];

/**
 * The ISO 2631-1 Annex C reactions as overlapping lanes on a log axis, with the run's aw
 * marked. The standard's bands overlap; drawing each on its own lane shows where two apply.
 */
export function ComfortScale({ aw, grading }: { aw: number; grading: ComfortGrading }) {
  const x = at(aw);
  const many = grading.bands.length > 1;
  return (
    <figure className="mt-1.5" aria-label="Comfort reaction scale, ISO 2631-1 Annex C">
      <div className="relative h-[86px]">
        {comfortBands.map((band, i) => {
          const hit = grading.bands.includes(band.label);
          const left = at(Math.max(band.from, LOW));
          const right = at(Number.isFinite(band.to) ? band.to : HIGH);
          return (
            <div
              key={band.label}
              title={`${band.label}: ${band.from}–${Number.isFinite(band.to) ? band.to : '∞'} m/s²`}
              className={`absolute flex h-[12px] items-center overflow-hidden rounded-[1px] px-1 text-[10px] leading-none whitespace-nowrap ${hit ? 'bg-comfort/80 font-semibold text-paper-raised' : 'bg-comfort/12 text-comfort/80'}`}
              style={{ left: `${left}%`, width: `${Math.max(0.5, right - left)}%`, top: `${i * 13}px` }}
            >
              {i === 0 && band.label}
            </div>
          );
        })}
        {comfortBands.slice(1).map((band, j) => (
          <span
            key={`${band.label}-label`}
            aria-hidden="true"
            className={`absolute flex h-[12px] items-center pr-1 text-[10px] leading-none whitespace-nowrap ${grading.bands.includes(band.label) ? 'font-semibold text-comfort' : 'text-ink-faint'}`}
            style={{ right: `${100 - at(band.from)}%`, top: `${(j + 1) * 13}px` }}
          >
            {band.label}
          </span>
        ))}
        <div className="absolute top-[-3px] bottom-[8px] w-0 border-l-2 border-ink" style={{ left: `${x}%` }} aria-hidden="true" />
        <div className="figures absolute bottom-[-6px] -translate-x-1/2 text-2xs font-semibold text-ink" style={{ left: `${x}%` }}>
          {formatSig(aw)}
        </div>
      </div>
      <div className="relative mt-2 h-3 border-t border-rule text-2xs text-ink-faint">
        {TICKS.map((t) => (
          <span key={t} className="figures absolute -translate-x-1/2" style={{ left: `${at(t)}%` }}>
            {t}
          </span>
        ))}
      </div>
      <figcaption className="mt-2 text-xs text-ink-soft">
        ISO 2631-1 reaction: <strong className="font-semibold text-comfort">{grading.bands.join(' / ')}</strong>
        {many && <span className="text-ink-faint"> — the standard’s bands overlap here; both apply.</span>}
      </figcaption>
    </figure>
  );
}
