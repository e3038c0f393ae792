import type { ReactNode } from 'react';
import { Link } from 'react-router';
import type { TargetSheet } from '../../../../shared/schemas/target-sheet.ts';
import { formatDateTime } from '../../../lib/format.ts';
import { StatusTag } from './status-tag.tsx';

function Item({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="min-w-0">
      <dt className="text-xs text-ink-faint">{term}</dt>
      <dd className="text-sm text-ink">{children}</dd>
    </div>
  );
}

/**
 * Who and what a sheet is: number, setup and revision, status, author, approver, dates and the
 * sheets it replaces or that replaced it. `links` off renders plain text (print).
 */
export function SheetIdentity({ sheet, workspaceId, links = true, replaces = null }: { sheet: TargetSheet; workspaceId: string; links?: boolean; replaces?: TargetSheet | null }) {
  const to = (id: string, text: string) => (links ? <Link className="text-accent underline-offset-2 hover:underline" to={`/w/${workspaceId}/sheets/${id}`}>{text}</Link> : text);
  // The last decision: a release, or a return (kept after the sheet was reopened).
  const decidedWord = sheet.status === 'released' ? 'Approved by' : sheet.status === 'returned' ? 'Sent back by' : sheet.approver ? 'Last sent back by' : 'Approved by';
  return (
    <dl className="grid grid-cols-2 gap-x-6 gap-y-2 sm:grid-cols-4" aria-label="Sheet identity">
      <Item term="Sheet number">
        <span className="figures">{sheet.number}</span>
      </Item>
      <Item term="Setup and revision">
        {links ? (
          <Link className="text-accent underline-offset-2 hover:underline" to={`/w/${workspaceId}/corners/${sheet.setupId}`}>
            {sheet.setupName}
          </Link>
        ) : (
          sheet.setupName
        )}
        , revision {sheet.setupRevision}
      </Item>
      <Item term="Status">
        <StatusTag status={sheet.status} />
      </Item>
      <Item term="Author">{sheet.author.name}</Item>
      <Item term="Drafted">{formatDateTime(sheet.createdAt)}</Item>
      <Item term="Submitted">{sheet.submittedAt ? formatDateTime(sheet.submittedAt) : '—'}</Item>
      <Item term={decidedWord}>{sheet.approver ? sheet.approver.name : '—'}</Item>
      <Item term={sheet.status === 'released' ? 'Released' : 'Decided'}>{sheet.decidedAt ? formatDateTime(sheet.decidedAt) : '—'}</Item>
      {sheet.status === 'released' && sheet.supersedes && <Item term="Replaced">{to(sheet.supersedes.id, sheet.supersedes.number)}</Item>}
      {sheet.status !== 'released' && replaces && <Item term="Supersedes when released">{to(replaces.id, replaces.number)}</Item>}
      {sheet.status === 'released' && sheet.releaseComment && (
        <div className="col-span-2 min-w-0 sm:col-span-4">
          <dt className="text-xs text-ink-faint">Release comment</dt>
          <dd className="text-sm whitespace-pre-wrap text-ink">{sheet.releaseComment}</dd>
        </div>
      )}
      {sheet.supersededBy && <Item term="Superseded by">{to(sheet.supersededBy.id, sheet.supersededBy.number)}</Item>}
    </dl>
  );
}
