import type { Setup } from '../../../../shared/schemas/setup.ts';
import { formatSig } from '../../../lib/format.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { sheetRows } from '../model/setup-diff.ts';

/** The setup's values as a read-only spec sheet (viewers, shared links); curves are shown by the damper panel. */
export function SetupSheet({ setup }: { setup: Setup }) {
  const rows = sheetRows(setup, useUnits());
  return (
    <div role="group" aria-label="Setup values (read-only)">
      <table className="w-full text-sm">
        <caption className="sr-only">Setup values</caption>
        <tbody>
          {rows.map((r) => (
            <tr key={r.path} className="border-b border-rule/50 last:border-0">
              <th scope="row" className="py-[3px] pr-3 text-left font-normal text-ink-soft">
                {r.label}
              </th>
              <td className="py-[3px] text-right whitespace-nowrap">
                {typeof r.value === 'number' && r.unit ? (
                  <>
                    <span className="figures text-ink">{formatSig(r.unit.fromSI(r.value), 3)}</span>
                    {r.unit.symbol && <span className="ml-1 text-xs font-light text-ink-faint">{r.unit.symbol}</span>}
                  </>
                ) : (
                  <span className="text-ink">{String(r.value)}</span>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      {setup.notes && <p className="mt-3 border-l-2 border-rule-strong pl-2 text-sm whitespace-pre-line text-ink-soft">{setup.notes}</p>}
    </div>
  );
}
