import { FLAT_RIDE_RATIO_BAND } from '../../../../shared/schemas/vehicle.ts';
import { formatSig } from '../../../lib/format.ts';

const MIN = 0.8;
const MAX = 1.4;
const at = (x: number) => `${(100 * (Math.min(MAX, Math.max(MIN, x)) - MIN)) / (MAX - MIN)}%`;

/**
 * Rear/front body-frequency ratio on a short scale from 0.8 to 1.4, with the flat-ride band
 * shaded. A rule of thumb, not a limit.
 */
export function RatioGauge({ ratio }: { ratio: number }) {
  const inBand = ratio >= FLAT_RIDE_RATIO_BAND.low && ratio <= FLAT_RIDE_RATIO_BAND.high;
  return (
    <figure aria-label={`Rear to front body frequency ratio ${formatSig(ratio, 3)}`} className="w-full">
      <div className="relative h-6">
        <div className="absolute inset-x-0 top-3 h-px bg-rule-strong" />
        <div className="absolute top-1.5 h-3 bg-accent-wash" style={{ left: at(FLAT_RIDE_RATIO_BAND.low), width: `calc(${at(FLAT_RIDE_RATIO_BAND.high)} - ${at(FLAT_RIDE_RATIO_BAND.low)})` }} />
        {[0.8, 0.9, 1.0, 1.1, 1.2, 1.3, 1.4].map((t) => (
          <div key={t} className="absolute top-2 h-2 w-px bg-rule-strong" style={{ left: at(t) }} />
        ))}
        <div className={`absolute top-0 h-6 w-0.5 ${inBand ? 'bg-accent' : 'bg-signal'}`} style={{ left: at(ratio) }} />
      </div>
      <div className="figures relative h-4 text-2xs text-ink-faint">
        {[0.8, 1.0, 1.2, 1.4].map((t) => (
          <span key={t} className={`absolute ${t === MIN ? '' : t === MAX ? '-translate-x-full' : '-translate-x-1/2'}`} style={{ left: at(t) }}>
            {t.toFixed(1)}
          </span>
        ))}
      </div>
    </figure>
  );
}
