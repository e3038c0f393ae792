import { useState } from 'react';
import type { CreatedShareLink, ShareLink } from '../../../../shared/schemas/share-link.ts';
import { Button } from '../../../components/ui/button.tsx';
import { FreshShareLink, MakeShareLink } from '../../../components/ui/share-link.tsx';
import { Notice } from '../../../components/ui/notice.tsx';
import { Loading } from '../../../components/ui/spinner.tsx';
import { Tag } from '../../../components/ui/tag.tsx';
import { useToast } from '../../../components/ui/toast.tsx';
import { formatDateTime } from '../../../lib/format.ts';
import { useCreateShareLink } from '../api/create-share-link.ts';
import { useShareLinks } from '../api/get-share-links.ts';
import { useRevokeShareLink } from '../api/revoke-share-link.ts';

function LinkRow({ link, canWrite, busy, onRevoke }: { link: ShareLink; canWrite: boolean; busy: boolean; onRevoke: () => void }) {
  return (
    <tr className="border-b border-rule/60 last:border-0" aria-label={`Link to ${link.label}`}>
      <td className="px-2 py-1.5">
        <span className="text-ink">{link.label}</span>
        <span className="block text-xs text-ink-faint">
          {link.createdBy.name} · <span className="figures">{formatDateTime(link.createdAt)}</span>
        </span>
      </td>
      <td className="px-2 py-1.5 text-xs text-ink-soft">
        {link.state === 'active' && (link.expiresAt ? <>until <span className="figures">{formatDateTime(link.expiresAt)}</span></> : 'no expiry')}
        {link.state === 'expired' && <Tag tone="signal">expired</Tag>}
        {link.state === 'revoked' && <Tag>withdrawn</Tag>}
      </td>
      <td className="px-2 py-1.5 text-right">
        {canWrite && link.state === 'active' && (
          <Button size="sm" variant="danger" busy={busy} onClick={onRevoke} aria-label={`Withdraw link to ${link.label}`}>
            Withdraw
          </Button>
        )}
      </td>
    </tr>
  );
}

export interface SharePanelProps {
  workspaceId: string;
  setupId: string;
  /** The revision a new link will show. */
  revision: { id: string; number: number };
  canWrite: boolean;
}

/**
 * Read-only links to this setup's revisions: make one for the revision on screen (optionally
 * with an expiry), copy it once, see who made which, withdraw any of them.
 */
export function SharePanel({ workspaceId, setupId, revision, canWrite }: SharePanelProps) {
  const links = useShareLinks(workspaceId, setupId);
  const create = useCreateShareLink(workspaceId);
  const revoke = useRevokeShareLink(workspaceId);
  const toast = useToast();
  const [created, setCreated] = useState<CreatedShareLink | null>(null);
  const [error, setError] = useState('');

  const make = (expiresAt: string | null) => {
    setError('');
    create.mutate({ objectType: 'setup_revision', objectId: revision.id, expiresAt }, { onSuccess: setCreated, onError: (e) => setError(e.fieldMessage('expiresAt') ?? e.message) });
  };

  return (
    <div>
      {created && <FreshShareLink label={created.link.label} path={created.path} expiresAt={created.link.expiresAt} onDone={() => setCreated(null)} />}
      {canWrite && !created && (
        <div className="mb-3">
          <MakeShareLink what={`revision ${revision.number}`} busy={create.isPending} error={error} onMake={make} />
        </div>
      )}
      {links.isPending ? (
        <Loading what="links" />
      ) : links.isError ? (
        <Notice tone="danger">{links.error.message}</Notice>
      ) : links.data.links.length === 0 ? (
        <p className="text-sm text-ink-faint">No read-only links to this setup.</p>
      ) : (
        <div className="overflow-x-auto rounded border border-rule bg-paper-raised">
          <table className="w-full text-sm" aria-label="Read-only links">
            <tbody>
              {links.data.links.map((l) => (
                <LinkRow
                  key={l.id}
                  link={l}
                  canWrite={canWrite}
                  busy={revoke.isPending && revoke.variables === l.id}
                  onRevoke={() => revoke.mutate(l.id, { onSuccess: () => toast.show('Link withdrawn: it no longer opens.'), onError: (e) => toast.show(e.message, 'danger') })}
                />
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
