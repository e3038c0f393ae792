import type { TargetSheetEvent } from '../../../../shared/schemas/target-sheet.ts';
import { formatDateTime } from '../../../lib/format.ts';

function verb(e: TargetSheetEvent): string {
  if (e.from === null) return 'drafted the sheet';
  if (e.to === 'in_review') return 'submitted it for review';
  if (e.to === 'released') return 'released it';
  if (e.to === 'returned') return 'sent it back';
  return 'reopened it as a draft';
}

/** Every change of status, oldest first: who, what, when, and why a sheet was sent back. */
export function SheetHistory({ history }: { history: TargetSheetEvent[] }) {
  return (
    <ol className="space-y-1.5 text-sm" aria-label="History">
      {history.map((e, i) => (
        <li key={i} className="flex flex-wrap gap-x-2">
          <span className="figures text-xs text-ink-faint">{formatDateTime(e.at)}</span>
          <span>
            <strong className="font-medium">{e.by.name}</strong> {verb(e)}
            {e.reason && <span className="text-ink-soft">: “{e.reason}”</span>}
          </span>
        </li>
      ))}
    </ol>
  );
}
