import { DEFAULT_FIT_MAX_SPEED, leastSquaresWords } from '../../../../shared/sim/damper-equivalent.ts';
import { Figure } from '../../../components/ui/figure.tsx';
import { listText } from '../../../lib/units/unit-table.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import type { DampingFigures } from '../model/figures.ts';

function Row({ label, children, note }: { label: string; children: React.ReactNode; note?: string }) {
  return (
    <div className="flex min-w-0 items-baseline justify-between gap-3 border-b border-rule/60 py-1">
      <dt className="min-w-0 text-sm text-ink-soft">
        {label}
        {note && <span className="block text-2xs text-ink-faint">{note}</span>}
      </dt>
      <dd className="shrink-0 text-right whitespace-nowrap">{children}</dd>
    </div>
  );
}

/** The figures that follow the curve as it is edited. */
export function DampingFiguresPanel({ figures, motionRatio }: { figures: DampingFigures; motionRatio: number }) {
  const vu = useUnits().damperVelocity;
  return (
    <section aria-label="Damping figures" className="@container min-w-0 rounded border border-rule bg-paper-raised px-3 py-2">
      <h3 className="text-sm font-semibold text-ink">Equivalent damping</h3>
      <p className="mb-1 text-2xs text-ink-faint">Linear coefficient: {leastSquaresWords(listText([DEFAULT_FIT_MAX_SPEED], vu))}.</p>
      <dl className="grid gap-x-8 @3xl:grid-cols-2">
        <Row label="At the damper">
          <Figure value={figures.atDamper} unit="Nspm" label="equivalent coefficient at the damper" />
        </Row>
        <Row label="Compression / rebound">
          <Figure value={figures.compression} unit="Nspm" label="compression coefficient" /> <span className="text-ink-faint">/</span>{' '}
          <Figure value={figures.rebound} unit="Nspm" label="rebound coefficient" />
        </Row>
        <Row label="At the wheel" note={`× MR² (MR ${motionRatio})`}>
          <Figure value={figures.atWheel} unit="Nspm" label="equivalent coefficient at the wheel" />
        </Row>
        <Row label="Body damping ratio ζ" note="estimate c / (2√(ks·ms))">
          <Figure value={figures.classicZeta} label="body damping ratio, single-mass estimate" />
        </Row>
        {figures.exactZeta !== null && (
          <Row label="Body damping ratio ζ" note="body mode of the two-mass corner">
            <Figure value={figures.exactZeta} label="body damping ratio, two-mass corner" />
          </Row>
        )}
      </dl>
    </section>
  );
}
