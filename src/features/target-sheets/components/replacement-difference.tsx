import { Link } from 'react-router';
import type { TargetSheet } from '../../../../shared/schemas/target-sheet.ts';
import { Table, TBody, Td, Th, THead, Tr } from '../../../components/ui/table.tsx';
import { type DisplayUnit, formatDateTime } from '../../../lib/format.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { directionDifference, type PointDifference } from '../model/sheet-difference.ts';
import { speedText } from './target-table.tsx';

const n = (v: number) => String(Math.round(v * 10) / 10);
const band = (s: PointDifference['before']) => (s ? `${n(s.lower)} – ${n(s.upper)}` : '—');

function Direction({ title, rows, inForce, next, speedUnit }: { title: string; rows: PointDifference[]; inForce: string; next: string; speedUnit: DisplayUnit }) {
  return (
    <div className="min-w-0">
      <h4 className="mb-1 text-sm font-semibold">{title}</h4>
      <Table caption={`${title}: ${inForce} against ${next}`}>
        <THead>
          <tr>
            <Th numeric>Speed [{speedUnit.symbol}]</Th>
            <Th numeric>In force [N]</Th>
            <Th numeric>Band in force [N]</Th>
            <Th numeric>This sheet [N]</Th>
            <Th numeric>Band, this sheet [N]</Th>
            <Th numeric>Change</Th>
          </tr>
        </THead>
        <TBody>
          {rows.map((r) => (
            <Tr key={r.velocity} className={r.changed ? 'font-semibold' : 'text-ink-soft'}>
              <Td numeric>{speedText(r.velocity, speedUnit)}</Td>
              <Td numeric>{r.before ? n(r.before.force) : '—'}</Td>
              <Td numeric>{band(r.before)}</Td>
              <Td numeric>{r.after ? n(r.after.force) : '—'}</Td>
              <Td numeric>{band(r.after)}</Td>
              <Td numeric>
                {!r.before ? 'new speed' : !r.after ? 'dropped' : r.forceChangePct === null ? '—' : r.changed ? `${r.forceChangePct > 0 ? '+' : ''}${r.forceChangePct.toFixed(1)} %` : 'same'}
              </Td>
            </Tr>
          ))}
        </TBody>
      </Table>
    </div>
  );
}

/**
 * What releasing `sheet` changes: the released sheet in force for the same setup beside this one,
 * targets and bands per speed. Rows that differ are set in bold.
 */
export function ReplacementDifference({ sheet, inForce, workspaceId }: { sheet: TargetSheet; inForce: TargetSheet; workspaceId: string }) {
  const compression = directionDifference(inForce.compression, sheet.compression);
  const rebound = directionDifference(inForce.rebound, sheet.rebound);
  const changed = [...compression, ...rebound].filter((r) => r.changed).length;
  const speedUnit = useUnits().damperVelocity;
  return (
    <section aria-label="Against the sheet in force" className="space-y-3">
      <p className="text-sm text-ink-soft">
        Releasing {sheet.number} supersedes{' '}
        <Link className="text-accent underline-offset-2 hover:underline" to={`/w/${workspaceId}/sheets/${inForce.id}`}>
          {inForce.number}
        </Link>{' '}
        (revision {inForce.setupRevision}, released {inForce.decidedAt ? formatDateTime(inForce.decidedAt) : ''}
        {inForce.approver ? ` by ${inForce.approver.name}` : ''}). This sheet is from revision {sheet.setupRevision}.{' '}
        <strong className="text-ink">{changed === 0 ? 'No target or band differs.' : `${changed} ${changed === 1 ? 'speed differs' : 'speeds differ'}.`}</strong>
        {inForce.gasForce !== sheet.gasForce && (
          <>
            {' '}
            Gas force {n(inForce.gasForce)} N → <strong className="text-ink">{n(sheet.gasForce)} N</strong>.
          </>
        )}
      </p>
      <div className="grid gap-5 2xl:grid-cols-2">
        <Direction title="Compression" rows={compression} inForce={inForce.number} next={sheet.number} speedUnit={speedUnit} />
        <Direction title="Rebound" rows={rebound} inForce={inForce.number} next={sheet.number} speedUnit={speedUnit} />
      </div>
    </section>
  );
}
