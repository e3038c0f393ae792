import type { ModalResult } from '../../../../shared/schemas/modal.ts';
import { Figure } from '../../../components/ui/figure.tsx';
import { speedsInWords } from '../../../lib/units/unit-table.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';

/**
 * Modes of the linearised corner: the exact figures from the eigenvalues beside the classic
 * single-mode hand estimates, and the equivalent damping the linearisation used, stated.
 */
export function ModalTable({ modal }: { modal: ModalResult }) {
  const cell = 'px-2 py-1 text-right';
  const vu = useUnits().damperVelocity;
  return (
    <div>
      <table className="w-full text-sm" aria-label="Modes of the linearised corner">
        <thead>
          <tr className="border-b border-rule text-2xs text-ink-faint">
            <th className="py-1 text-left font-medium" />
            <th className={`${cell} font-medium`} title="|λ|/2π from the 4×4 state matrix">exact</th>
            <th className={`${cell} font-medium`} title="Im λ / 2π">damped</th>
            <th className={`${cell} font-medium`} title="from the 2×2 mass and stiffness matrices, no damping">undamped</th>
            <th className={`${cell} font-medium`} title="single-mode hand estimate">classic</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-rule/70">
          <tr>
            <th scope="row" className="py-1 text-left font-normal text-ink-soft">Body, Hz</th>
            <td className={cell}><Figure value={modal.body.naturalHz} label="body natural frequency" /></td>
            <td className={cell}><Figure value={modal.body.dampedHz} label="body damped frequency" /></td>
            <td className={cell}><Figure value={modal.bodyUndampedHz} label="body undamped frequency" /></td>
            <td className={cell}><Figure value={modal.classic.bodyHz} label="body frequency, classic estimate" /></td>
          </tr>
          <tr>
            <th scope="row" className="py-1 text-left font-normal text-ink-soft">Wheel hop, Hz</th>
            <td className={cell}><Figure value={modal.wheel.naturalHz} label="wheel-hop natural frequency" /></td>
            <td className={cell}><Figure value={modal.wheel.dampedHz} label="wheel-hop damped frequency" /></td>
            <td className={cell}><Figure value={modal.wheelUndampedHz} label="wheel-hop undamped frequency" /></td>
            <td className={cell}><Figure value={modal.classic.wheelHz} label="wheel-hop frequency, classic estimate" /></td>
          </tr>
          <tr>
            <th scope="row" className="py-1 text-left font-normal text-ink-soft">Body damping ratio</th>
            <td className={cell}><Figure value={modal.body.dampingRatio} label="body damping ratio" /></td>
            <td className={cell} />
            <td className={cell} />
            <td className={cell}><Figure value={modal.classic.bodyDampingRatio} label="body damping ratio, classic estimate" /></td>
          </tr>
          <tr>
            <th scope="row" className="py-1 text-left font-normal text-ink-soft">Wheel-hop damping ratio</th>
            <td className={cell}><Figure value={modal.wheel.dampingRatio} label="wheel-hop damping ratio" /></td>
            <td className={cell} colSpan={3} />
          </tr>
        </tbody>
      </table>
      <p className="mt-2 text-xs leading-snug text-ink-soft">
        Linearised at static equilibrium. The damper curves enter as one coefficient at the wheel,{' '}
        <Figure value={modal.equivalentDamping.wheelDamping} unit="Nspm" label="equivalent wheel damping" />: {speedsInWords(modal.equivalentDamping.definition, vu)}. Classic estimates: f = √(k_ride/ms)/2π with
        k_ride = ks·kt/(ks+kt), f_wheel = √((ks+kt)/mu)/2π, ζ = c/(2√(ks·ms)).
      </p>
    </div>
  );
}
