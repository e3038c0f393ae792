import { Link } from 'react-router';
import type { CornerAnalysis, VehicleDetail } from '../../../../shared/schemas/vehicle.ts';
import { FLAT_RIDE_RATIO_BAND } from '../../../../shared/schemas/vehicle.ts';
import { Figure } from '../../../components/ui/figure.tsx';
import { formatSig } from '../../../lib/format.ts';
import { RatioGauge } from './ratio-gauge.tsx';

function Row({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <tr className="border-b border-rule/50 last:border-0">
      <th scope="row" className="py-1 pr-3 text-left font-normal text-ink-soft">
        {label}
      </th>
      <td className="py-1 text-right">{children}</td>
    </tr>
  );
}

function CornerColumn({ workspaceId, title, analysis, slot }: { workspaceId: string; title: string; analysis: CornerAnalysis | null; slot: VehicleDetail['front'] }) {
  return (
    <section aria-label={`${title} corner`} className="min-w-0 rounded border border-rule bg-paper-raised px-4 py-3">
      <h2 className="text-2xs font-semibold tracking-wider text-ink-faint uppercase">{title}</h2>
      {!slot ? (
        <p className="mt-2 text-sm text-ink-faint">No setup in this corner yet.</p>
      ) : (
        <>
          <Link to={`/w/${workspaceId}/corners/${slot.id}`} className="mt-0.5 block font-medium text-ink hover:text-accent hover:underline">
            {slot.name} <span className="figures text-xs font-normal text-ink-faint">r{slot.latestRevision}</span>
          </Link>
          {!analysis ? (
            <p className="mt-2 text-sm text-ink-soft">The linear analysis cannot resolve this corner (its damper or rates are far outside what a road car uses), so it has no modal figures.</p>
          ) : (
            <table className="mt-2 w-full text-sm">
              <tbody>
                <Row label="Body, natural">
                  <Figure value={analysis.modal.body.naturalHz} unit="Hz" label={`${title} body frequency`} />
                </Row>
                <Row label="Body, damped">
                  <Figure value={analysis.modal.body.dampedHz} unit="Hz" />
                </Row>
                <Row label="Body damping ratio">
                  <Figure value={analysis.modal.body.dampingRatio} digits={2} />
                </Row>
                <Row label="Wheel hop, natural">
                  <Figure value={analysis.modal.wheel.naturalHz} unit="Hz" label={`${title} wheel-hop frequency`} />
                </Row>
                <Row label="Wheel-hop damping ratio">
                  <Figure value={analysis.modal.wheel.dampingRatio} digits={2} />
                </Row>
                <Row label="Hand estimate √(k_ride/ms)/2π">
                  <Figure value={analysis.modal.classic.bodyHz} unit="Hz" />
                </Row>
                <Row label="Wheel rate">
                  <Figure value={analysis.wheelRate} unit="Npermm" />
                </Row>
                <Row label="Sprung mass">
                  <Figure value={analysis.sprungMass} unit="kg" />
                </Row>
              </tbody>
            </table>
          )}
        </>
      )}
    </section>
  );
}

/** Both corners' modes side by side and the rear/front body-frequency ratio with the flat-ride rule of thumb. */
export function VehicleSummaryPanel({ workspaceId, vehicle }: { workspaceId: string; vehicle: VehicleDetail }) {
  const { front, rear } = vehicle.analysis;
  return (
    <div className="grid gap-4 lg:grid-cols-[1fr_1fr_minmax(15rem,0.9fr)]">
      <CornerColumn workspaceId={workspaceId} title="Front" analysis={front} slot={vehicle.front} />
      <CornerColumn workspaceId={workspaceId} title="Rear" analysis={rear} slot={vehicle.rear} />
      <section aria-label="Front and rear compared" className="rounded border border-rule bg-paper-raised px-4 py-3">
        <h2 className="text-2xs font-semibold tracking-wider text-ink-faint uppercase">Rear / front body frequency</h2>
        {vehicle.bodyRatio === null ? (
          <p className="mt-2 text-sm text-ink-faint">
            {vehicle.front && vehicle.rear ? 'No ratio: a corner has no modal figures.' : 'Both corners are needed for the ratio.'}
          </p>
        ) : (
          <>
            <p className="mt-1 text-2xl">
              <Figure value={vehicle.bodyRatio} digits={3} label="Rear to front body frequency ratio" />
            </p>
            <RatioGauge ratio={vehicle.bodyRatio} />
            <p className="mt-2 text-xs leading-relaxed text-ink-soft">
              Flat-ride practice (a rule of thumb, common practice): the rear body frequency a little above the front — roughly{' '}
              <span className="figures">
                {formatSig(FLAT_RIDE_RATIO_BAND.low, 2)}–{formatSig(FLAT_RIDE_RATIO_BAND.high, 2)}
              </span>{' '}
              — so the rear, reaching a bump later, catches up with the front and the body settles level instead of pitching.
              {vehicle.bodyRatio < FLAT_RIDE_RATIO_BAND.low && ' Here the rear is below the front.'}
              {vehicle.bodyRatio > FLAT_RIDE_RATIO_BAND.high && ' Here the rear is well above the front.'}
            </p>
          </>
        )}
        <p className="mt-2 text-2xs text-ink-faint">Body mode natural frequency |λ|/2π of each corner's latest revision, from the linear two-mass corner.</p>
      </section>
    </div>
  );
}
