import { Button } from '../../../components/ui/button.tsx';
import { type CellErrors, type Direction, type DraftRow, emptyRow } from '../model/draft.ts';

const cellClass = (bad: boolean) =>
  `figures h-7 w-20 rounded border bg-paper-raised px-2 text-right text-sm ${bad ? 'border-danger' : 'border-rule-strong'} focus-visible:border-accent disabled:bg-transparent disabled:border-transparent`;

/**
 * One direction's points, cell by cell: piston velocity (in the chosen unit) and force (N) at the damper, both
 * as magnitudes. A problem shows beside its row; the chart keeps the last valid curve meanwhile.
 */
export function PointsTable({
  direction,
  velocityUnit,
  rows,
  errors,
  readOnly,
  onChange,
}: {
  direction: Direction;
  /** Symbol of the unit the velocity cells hold. */
  velocityUnit: string;
  rows: DraftRow[];
  errors: CellErrors[Direction];
  readOnly?: boolean;
  onChange: (rows: DraftRow[]) => void;
}) {
  const set = (i: number, key: 'velocity' | 'force', text: string) => onChange(rows.map((r, j) => (j === i ? { ...r, [key]: text } : r)));
  const title = direction === 'compression' ? 'Compression' : 'Rebound';
  return (
    <div className="min-w-0">
      <table className="text-sm" aria-label={`${title} points`}>
        <caption className="mb-1 text-left text-sm font-semibold text-ink">{title}</caption>
        <thead>
          <tr className="text-xs text-ink-faint">
            <th className="w-6 text-left font-normal">#</th>
            <th className="px-1 text-right font-normal">Velocity [{velocityUnit}]</th>
            <th className="px-1 text-right font-normal">Force [N]</th>
            <th className="sr-only">Actions and problems</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((row, i) => {
            const err = errors[i] ?? {};
            const problem = [err.velocity, err.force].filter(Boolean).join('; ');
            return (
              <tr key={row.key} className="align-top">
                <td className="pt-1.5 text-xs text-ink-faint">{i + 1}</td>
                <td className="px-1 py-0.5">
                  <input
                    aria-label={`${direction} velocity, point ${i + 1}`}
                    aria-invalid={Boolean(err.velocity) || undefined}
                    inputMode="decimal"
                    className={cellClass(Boolean(err.velocity))}
                    value={row.velocity}
                    disabled={readOnly}
                    onChange={(e) => set(i, 'velocity', e.target.value)}
                  />
                </td>
                <td className="px-1 py-0.5">
                  <input
                    aria-label={`${direction} force, point ${i + 1}`}
                    aria-invalid={Boolean(err.force) || undefined}
                    inputMode="decimal"
                    className={cellClass(Boolean(err.force))}
                    value={row.force}
                    disabled={readOnly}
                    onChange={(e) => set(i, 'force', e.target.value)}
                  />
                </td>
                <td className="py-0.5 pl-1">
                  <div className="flex items-start gap-0.5">
                    {!readOnly && (
                      <>
                        <Button size="sm" variant="quiet" aria-label={`Add a ${direction} point after point ${i + 1}`} onClick={() => onChange([...rows.slice(0, i + 1), emptyRow(row), ...rows.slice(i + 1)])}>
                          +
                        </Button>
                        <Button size="sm" variant="quiet" aria-label={`Remove ${direction} point ${i + 1}`} disabled={rows.length <= 1} onClick={() => onChange(rows.filter((_, j) => j !== i))}>
                          −
                        </Button>
                      </>
                    )}
                    {problem && (
                      <span role="alert" className="max-w-48 pt-1 text-xs text-danger">
                        {problem}
                      </span>
                    )}
                  </div>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      {!readOnly && rows.length === 0 && (
        <Button size="sm" variant="secondary" onClick={() => onChange([emptyRow()])}>
          Add a point
        </Button>
      )}
    </div>
  );
}
