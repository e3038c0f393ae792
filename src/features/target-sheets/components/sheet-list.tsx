import { Link } from 'react-router';
import type { TargetSheet } from '../../../../shared/schemas/target-sheet.ts';
import { Table, TBody, Td, Th, THead, Tr } from '../../../components/ui/table.tsx';
import { formatDateTime } from '../../../lib/format.ts';
import { StatusTag } from './status-tag.tsx';

/** Sheets of the workspace: number, setup and revision, status, who and when, replacements. */
export function SheetList({ sheets, workspaceId }: { sheets: TargetSheet[]; workspaceId: string }) {
  return (
    <Table caption="Target sheets">
      <THead>
        <tr>
          <Th>Sheet</Th>
          <Th>Setup</Th>
          <Th numeric>Revision</Th>
          <Th>Status</Th>
          <Th>Author</Th>
          <Th>Approved by</Th>
          <Th>Last change</Th>
        </tr>
      </THead>
      <TBody>
        {sheets.map((s) => (
          <Tr key={s.id}>
            <Td>
              <Link className="figures font-medium text-accent underline-offset-2 hover:underline" to={`/w/${workspaceId}/sheets/${s.id}`}>
                {s.number}
              </Link>
              {s.supersededBy && <span className="ml-2 text-xs text-ink-faint">superseded by {s.supersededBy.number}</span>}
            </Td>
            <Td>{s.setupName}</Td>
            <Td numeric>{s.setupRevision}</Td>
            <Td>
              <StatusTag status={s.status} />
            </Td>
            <Td>{s.author.name}</Td>
            <Td>{s.status === 'released' && s.approver ? s.approver.name : '—'}</Td>
            <Td className="text-ink-soft">{formatDateTime(s.updatedAt)}</Td>
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}
