import type { ModalResult } from '../../../../shared/schemas/modal.ts';
import { DEFAULT_FIT_MAX_SPEED, leastSquaresWords } from '../../../../shared/sim/damper-equivalent.ts';
import { GRAVITY } from '../../../../shared/sim/quarter-car.ts';
import { listText } from '../../../lib/units/unit-table.ts';
import { Figure } from '../../../components/ui/figure.tsx';
import { useUnits } from '../../../lib/units/use-units.tsx';

export interface CornerFiguresStripProps {
  modal: ModalResult;
  /** Wheel rate of the linear analysis (spring × MR² plus gas rate), N/m. */
  wheelRate: number;
  sprungMass: number;
  /** The figures belong to an earlier state than the one on screen (the draft has a problem). */
  stale?: boolean;
}

function Cell({ label, children, note }: { label: string; children: React.ReactNode; note?: string }) {
  return (
    <div className="min-w-0 px-3 py-1.5">
      <dt className="truncate text-2xs tracking-wide text-ink-faint uppercase">{label}</dt>
      <dd className="text-base">{children}</dd>
      {note && <dd className="text-2xs leading-tight text-ink-faint">{note}</dd>}
    </div>
  );
}

/**
 * The corner's linear figures in one band: body and wheel-hop modes, the ride rate behind them
 * and the static sag. From the simulation core's modal analysis of the setup as shown.
 */
export function CornerFiguresStrip({ modal, wheelRate, sprungMass, stale = false }: CornerFiguresStripProps) {
  const { length, rate, damperVelocity } = useUnits();
  const sag = (sprungMass * GRAVITY) / wheelRate;
  return (
    <section aria-label="Corner figures" className={`rounded border border-rule bg-paper-raised ${stale ? 'opacity-60' : ''}`}>
      <dl className="grid grid-cols-3 [&>div]:border-rule [&>div:nth-child(-n+3)]:border-b [&>div:not(:nth-child(3n+1))]:border-l">
        <Cell label="Body mode" note={`damped ${modal.body.dampedHz.toFixed(2)} Hz · hand estimate ${modal.classic.bodyHz.toFixed(2)} Hz`}>
          <Figure value={modal.body.naturalHz} unit="Hz" label="Body natural frequency" />
        </Cell>
        <Cell label="Body damping ratio" note={`hand estimate c/(2√(ks·ms)) ${modal.classic.bodyDampingRatio.toFixed(2)}`}>
          <Figure value={modal.body.dampingRatio} digits={2} label="Body damping ratio" />
        </Cell>
        <Cell label="Static sag" note="sprung weight over wheel rate">
          <Figure value={sag} unit={length} label="Static sag" />
        </Cell>
        <Cell label="Wheel hop" note={`hand estimate ${modal.classic.wheelHz.toFixed(1)} Hz`}>
          <Figure value={modal.wheel.naturalHz} unit="Hz" label="Wheel-hop natural frequency" />
        </Cell>
        <Cell label="Wheel-hop damping ratio">
          <Figure value={modal.wheel.dampingRatio} digits={2} label="Wheel-hop damping ratio" />
        </Cell>
        <Cell label="Wheel rate" note="spring × MR², with the gas rate at static">
          <Figure value={wheelRate} unit={rate} label="Wheel rate" />
        </Cell>
      </dl>
      <p className="border-t border-rule px-3 py-1 text-2xs text-ink-faint">
        {stale ? 'Showing the last valid state: fix the marked fields to update. ' : ''}Linear analysis at static; damping as the {leastSquaresWords(listText([DEFAULT_FIT_MAX_SPEED], damperVelocity))}.
      </p>
    </section>
  );
}
