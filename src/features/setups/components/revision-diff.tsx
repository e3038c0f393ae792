import type { SetupRevision } from '../../../../shared/schemas/setup-record.ts';
import { formatSig } from '../../../lib/format.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { type DiffRow, diffSetups } from '../model/setup-diff.ts';

function Value({ row, value }: { row: DiffRow; value: number | string | undefined }) {
  if (value === undefined) return <span className="text-ink-faint">—</span>;
  if (typeof value === 'string') return <span className="whitespace-pre-line">{value}</span>;
  const shown = row.unit ? row.unit.fromSI(value) : value;
  return (
    <>
      <span className="figures">{formatSig(shown, 4)}</span>
      {row.unit?.symbol && <span className="ml-1 text-xs font-light text-ink-faint">{row.unit.symbol}</span>}
    </>
  );
}

function Change({ row }: { row: DiffRow }) {
  if (typeof row.before !== 'number' || typeof row.after !== 'number') return null;
  const rel = row.before !== 0 ? (row.after - row.before) / Math.abs(row.before) : Number.NaN;
  if (!Number.isFinite(rel)) return null;
  const text = `${rel > 0 ? '+' : '−'}${formatSig(Math.abs(rel) * 100, 2)} %`;
  return <span className={`figures text-xs ${rel > 0 ? 'text-accent-strong' : 'text-signal-ink'}`}>{text}</span>;
}

/** Field-by-field difference from revision A to revision B, every changed value with its unit. */
export function RevisionDiff({ a, b }: { a: SetupRevision; b: SetupRevision }) {
  const rows = diffSetups(a.document, b.document, useUnits());
  return (
    <div className="overflow-x-auto rounded border border-rule bg-paper-raised">
      <table className="w-full text-sm" aria-label={`Differences from revision ${a.number} to revision ${b.number}`}>
        <thead className="border-b border-rule-strong bg-paper-sunk/70 text-left text-xs text-ink-soft">
          <tr>
            <th scope="col" className="h-7 px-3 font-semibold">
              Field
            </th>
            <th scope="col" className="px-3 text-right font-semibold">
              r{a.number}
            </th>
            <th scope="col" className="px-3 text-right font-semibold">
              r{b.number}
            </th>
            <th scope="col" className="px-3 text-right font-semibold">
              change
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.length === 0 ? (
            <tr>
              <td colSpan={4} className="px-3 py-2 text-ink-faint">
                The two revisions hold the same values.
              </td>
            </tr>
          ) : (
            rows.map((row) => (
              <tr key={row.path} className="border-b border-rule/60 last:border-0">
                <th scope="row" className="px-3 py-1 text-left font-normal text-ink">
                  {row.label}
                </th>
                <td className="px-3 py-1 text-right text-ink-soft">
                  <Value row={row} value={row.before} />
                </td>
                <td className="px-3 py-1 text-right text-ink">
                  <Value row={row} value={row.after} />
                </td>
                <td className="px-3 py-1 text-right">
                  <Change row={row} />
                </td>
              </tr>
            ))
          )}
        </tbody>
      </table>
    </div>
  );
}
