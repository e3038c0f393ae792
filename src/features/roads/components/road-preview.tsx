import { useMemo } from 'react';
import type { RoadFigures } from '../../../../shared/schemas/road-record.ts';
import type { Road } from '../../../../shared/schemas/road.ts';
import { Figure } from '../../../components/ui/figure.tsx';
import { Notice } from '../../../components/ui/notice.tsx';
import { formatSig } from '../../../lib/format.ts';
import { roadPreview } from '../model/preview.ts';
import { RoadProfileChart } from './road-profile-chart.tsx';
import { RoadPsdChart } from './road-psd-chart.tsx';

function Fig({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div className="flex items-baseline justify-between gap-3 border-b border-rule/60 py-1 last:border-0">
      <dt className="text-sm text-ink-soft">{label}</dt>
      <dd className="text-right text-sm">{children}</dd>
    </div>
  );
}

/** The road's stored figures: length, grid, fitted ISO 8608 class and waviness. */
export function RoadFiguresList({ figures }: { figures: RoadFigures }) {
  return (
    <dl aria-label="Road figures" className="rounded border border-rule bg-paper-raised px-3 py-2">
      {figures.length !== null && (
        <Fig label="Length">
          <Figure value={figures.length} unit="m" digits={figures.length >= 1000 ? 4 : 3} label="profile length" />
        </Fig>
      )}
      {figures.spacing !== null && (
        <Fig label="Sample spacing">
          <Figure value={figures.spacing} unit="mm" label="sample spacing" />
        </Fig>
      )}
      {figures.points !== null && <Fig label="Points uploaded">{<span className="figures">{figures.points}</span>}</Fig>}
      {figures.iso && (
        <>
          <Fig label="Fitted ISO 8608 class">
            <span className="figures font-semibold" data-testid="fitted-iso-class">
              {figures.iso.className}
            </span>
          </Fig>
          <Fig label="Gd(n₀) at 0.1 cycle/m">
            <span className="figures">{formatSig(figures.iso.gdn0 * 1e6, 3)}</span> <span className="text-ink-faint">×10⁻⁶ m³</span>
          </Fig>
          <Fig label="Waviness w">
            <Figure value={figures.iso.waviness} label="waviness" />
          </Fig>
          <Fig label="Band fitted">
            <span className="figures">
              {formatSig(figures.iso.nMin, 2)}–{formatSig(figures.iso.nMax, 3)}
            </span>{' '}
            <span className="text-ink-faint">cycle/m</span>
          </Fig>
        </>
      )}
      {figures.note && <p className="py-1 text-xs text-ink-faint">{figures.note}</p>}
    </dl>
  );
}

/** Profile and (for random and measured roads) the PSD against the ISO 8608 classes. */
export function RoadPreview({ road, figures }: { road: Road; figures: RoadFigures | null }) {
  const preview = useMemo(() => roadPreview(road, figures?.iso ?? null), [road, figures]);
  if (!preview.ok) return <Notice tone="danger">{preview.reason}</Notice>;
  return (
    <div className="grid gap-3">
      <section aria-label="Profile" className="rounded border border-rule bg-paper-raised px-3 pt-2 pb-1">
        <h3 className="text-sm font-semibold text-ink">Profile</h3>
        <p className="text-2xs text-ink-faint">
          {road.kind === 'sweep' ? 'Elevation against time (a sweep is defined in time).' : 'Elevation along the road, as a point contact would follow it.'}
          {road.kind === 'measured' && ' Resampled and detrended as the simulation reads it.'}
        </p>
        <RoadProfileChart profile={preview.profile} />
      </section>
      {preview.psd ? (
        <section aria-label="Spectrum" className="rounded border border-rule bg-paper-raised px-3 pt-2 pb-1">
          <h3 className="text-sm font-semibold text-ink">Displacement PSD against the ISO 8608 classes</h3>
          <p className="text-2xs text-ink-faint">Welch estimate, log-log. Shaded strips: classes A (smoothest) to H, each from half to twice its Gd(n₀), drawn with waviness 2.</p>
          <RoadPsdChart psd={preview.psd} />
        </section>
      ) : (
        <p className="text-xs text-ink-faint">No spectrum for a single event, a sine or a sweep: the ISO 8608 classes describe random roads.</p>
      )}
    </div>
  );
}
