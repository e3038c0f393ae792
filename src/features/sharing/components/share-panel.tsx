import { useState } from 'react';
import type { CreatedShareLink, ShareLink } from '../../../../shared/schemas/share-link.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Notice } from '../../../components/ui/notice.tsx';
import { Loading } from '../../../components/ui/spinner.tsx';
import { Tag } from '../../../components/ui/tag.tsx';
import { useToast } from '../../../components/ui/toast.tsx';
import { formatDateTime } from '../../../lib/format.ts';
import { useCreateShareLink } from '../api/create-share-link.ts';
import { useShareLinks } from '../api/get-share-links.ts';
import { useRevokeShareLink } from '../api/revoke-share-link.ts';

type Expiry = 'never' | '1' | '7' | '30' | 'date';

function expiryOf(choice: Expiry, date: string): string | null | 'invalid' {
  if (choice === 'never') return null;
  if (choice === 'date') {
    const d = new Date(`${date}T23:59:59`);
    return Number.isNaN(d.getTime()) ? 'invalid' : d.toISOString();
  }
  return new Date(Date.now() + Number(choice) * 86_400_000).toISOString();
}

async function copyToClipboard(text: string): Promise<boolean> {
  try {
    await navigator.clipboard.writeText(text);
    return true;
  } catch {
    return false;
  }
}

/** The new link, shown this once: the server keeps only a hash of the token. */
function FreshLink({ created, onDone }: { created: CreatedShareLink; onDone: () => void }) {
  const url = `${window.location.origin}${created.path}`;
  const [copied, setCopied] = useState(false);
  return (
    <div role="status" className="mb-3 rounded border border-accent/40 bg-accent-wash/60 px-3 py-2">
      <p className="text-sm font-semibold text-accent-strong">Read-only link to {created.link.label}</p>
      <div className="mt-1.5 flex gap-2">
        <input aria-label="Share link" readOnly value={url} onFocus={(e) => e.target.select()} className="figures h-8 min-w-0 flex-1 rounded-sm border border-rule-strong bg-paper-raised px-2 text-xs" />
        <Button size="sm" className="h-8" onClick={() => void copyToClipboard(url).then(setCopied)}>
          {copied ? 'Copied' : 'Copy link'}
        </Button>
      </div>
      <p className="mt-1.5 text-xs text-ink-soft">
        Copy it now: it is shown only once. Anyone holding it can read this revision, signed in or not, until it {created.link.expiresAt ? `expires on ${formatDateTime(created.link.expiresAt)} or ` : ''}is withdrawn.{' '}
        <button type="button" className="text-accent underline" onClick={onDone}>
          Done
        </button>
      </p>
    </div>
  );
}

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
  const [expiry, setExpiry] = useState<Expiry>('never');
  const [date, setDate] = useState('');
  const [created, setCreated] = useState<CreatedShareLink | null>(null);
  const [error, setError] = useState('');

  const make = () => {
    setError('');
    const expiresAt = expiryOf(expiry, date);
    if (expiresAt === 'invalid') return setError('Pick the last day the link should work.');
    create.mutate({ objectType: 'setup_revision', objectId: revision.id, expiresAt }, { onSuccess: setCreated, onError: (e) => setError(e.fieldMessage('expiresAt') ?? e.message) });
  };

  return (
    <div>
      {created && <FreshLink created={created} onDone={() => setCreated(null)} />}
      {canWrite && !created && (
        <div className="mb-3 flex flex-wrap items-center gap-2 text-sm">
          <span className="text-ink-soft">Share revision {revision.number} read-only,</span>
          <select aria-label="Link expiry" value={expiry} onChange={(e) => setExpiry(e.target.value as Expiry)} className="h-8 rounded-sm border border-rule-strong bg-paper-raised px-1.5">
            <option value="never">until withdrawn</option>
            <option value="1">for 1 day</option>
            <option value="7">for 7 days</option>
            <option value="30">for 30 days</option>
            <option value="date">until a date…</option>
          </select>
          {expiry === 'date' && <input type="date" aria-label="Last day" value={date} onChange={(e) => setDate(e.target.value)} className="h-8 rounded-sm border border-rule-strong bg-paper-raised px-1.5" />}
          <Button variant="primary" size="sm" className="h-8" busy={create.isPending} onClick={make}>
            Make read-only link
          </Button>
          {error && <span role="alert" className="text-sm text-danger">{error}</span>}
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
