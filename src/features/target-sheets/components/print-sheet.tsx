import type { TargetSheet } from '../../../../shared/schemas/target-sheet.ts';
import { sheetCautions } from '../../../../shared/target-sheet/cautions.ts';
import { formatDateTime } from '../../../lib/format.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { BandPlot } from './band-plot.tsx';
import { SheetIdentity } from './sheet-identity.tsx';
import { TargetTable } from './target-table.tsx';
import './sheet-print.css';

/**
 * The sheet as the supplier receives it, on A4: identity (number, setup and revision, status,
 * author, approver, dates), both target tables, the band plot and the short cautions.
 */
export function PrintSheet({ sheet, workspaceId, printedAt }: { sheet: TargetSheet; workspaceId: string; printedAt: Date }) {
  const draft = sheet.status !== 'released';
  const speedUnit = useUnits().damperVelocity;
  return (
    <article className="rw-sheet-paper" aria-label={`Printable sheet ${sheet.number}`}>
      <header className="mb-3 flex items-end justify-between gap-4 border-b-2 border-ink pb-2">
        <div>
          <p className="text-[8pt] tracking-wide text-ink-soft uppercase">Ridewright · damper target sheet</p>
          <h1 className="figures text-[16pt] font-semibold">{sheet.number}</h1>
        </div>
        <p className={`text-right text-[11pt] font-semibold ${draft ? 'text-signal-ink' : ''}`}>
          {sheet.status === 'released' ? 'RELEASED' : `NOT RELEASED — ${sheet.status.replace('_', ' ').toUpperCase()}`}
        </p>
      </header>

      <div className="rw-print-block mb-3">
        <SheetIdentity sheet={sheet} workspaceId={workspaceId} links={false} />
      </div>

      <p className="rw-print-block mb-2">
        Gas force <strong className="figures">{sheet.gasForce} N</strong> (static, at the ride position). Target forces exclude it. Piston speeds in {speedUnit.symbol},
        forces in N; band = target ± max(tolerance × target, floor).
      </p>

      <div className="rw-print-block mb-3 grid grid-cols-2 gap-3">
        <TargetTable title="Compression" points={sheet.compression} compact />
        <TargetTable title="Rebound" points={sheet.rebound} compact />
      </div>

      <div className="rw-print-block mb-3">
        <h2 className="mb-1 text-[10pt] font-semibold">Targets and band (compression positive, rebound negative)</h2>
        <BandPlot compression={sheet.compression} rebound={sheet.rebound} height={250} liveLegend={false} />
      </div>

      {sheet.notes.trim() && (
        <div className="rw-print-block mb-3">
          <h2 className="text-[10pt] font-semibold">Notes</h2>
          <p className="whitespace-pre-wrap">{sheet.notes}</p>
        </div>
      )}

      <footer className="rw-print-block border-t border-ink pt-2 text-[8pt] leading-snug">
        <ul className="space-y-0.5">
          <li>{sheetCautions.simulation}</li>
          <li>{sheetCautions.gas}</li>
          <li>Released targets change parts fitted to vehicles: only a released sheet is a specification to build to.</li>
        </ul>
        <p className="mt-1 text-ink-soft">Printed {formatDateTime(printedAt.toISOString())}.</p>
      </footer>
    </article>
  );
}
