import { type ReactNode, useState } from 'react';
import { Link, useNavigate } from 'react-router';
import type { Membership } from '../../../../shared/schemas/workspace.ts';
import type { SharedObject, SharedSetupRevision } from '../../../../shared/schemas/share-link.ts';
import { hasRole } from '../../../../shared/schemas/workspace.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Loading } from '../../../components/ui/spinner.tsx';
import { formatDateTime } from '../../../lib/format.ts';
import { useCopyShared } from '../api/copy-shared.ts';
import { useShared } from '../api/get-shared.ts';

export interface SharedViewProps {
  token: string;
  /** The visitor's workspaces when signed in; null when signed out. */
  memberships: Membership[] | null;
  /** Draws the shared setup revision (the page passes the setup and damper components). */
  renderSetup: (view: SharedSetupRevision) => ReactNode;
  /** Draws any other kind of shared object (a study) with the copy control to place in it. */
  renderOther: (view: Exclude<SharedObject, SharedSetupRevision>, copyAction: ReactNode) => ReactNode;
}

/** Where a copied object opens. */
const pathOfCopy = (objectType: SharedObject['objectType'], workspaceId: string, id: string) =>
  objectType === 'study' ? `/w/${workspaceId}/studies/${id}` : `/w/${workspaceId}/corners/${id}`;

function CopyBox({ token, memberships, what }: { token: string; memberships: Membership[] | null; what: string }) {
  const copy = useCopyShared(token);
  const navigate = useNavigate();
  const writable = (memberships ?? []).filter((m) => hasRole(m.role, 'engineer'));
  const [target, setTarget] = useState(writable[0]?.workspaceId ?? '');

  if (!memberships) {
    return (
      <p className="text-sm text-ink-soft">
        <Link className="font-medium text-accent hover:underline" to={`/signin?next=${encodeURIComponent(`/shared/${token}`)}`}>
          Sign in
        </Link>{' '}
        to copy this {what} into a workspace of your own.
      </p>
    );
  }
  if (writable.length === 0) {
    return <p className="text-sm text-ink-soft">Copying needs the engineer role (or above) in one of your workspaces; you can read it here.</p>;
  }
  return (
    <form
      aria-label="Copy into my workspace"
      className="flex flex-wrap items-center gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        copy.mutate(target, { onSuccess: (c) => navigate(pathOfCopy(c.objectType, c.workspaceId, c.id)) });
      }}
    >
      <label htmlFor="copy-target" className="text-sm text-ink-soft">
        Copy into
      </label>
      <select id="copy-target" value={target} onChange={(e) => setTarget(e.target.value)} className="h-8 rounded-sm border border-rule-strong bg-paper-raised px-1.5 text-sm">
        {writable.map((m) => (
          <option key={m.workspaceId} value={m.workspaceId}>
            {m.workspaceName}
          </option>
        ))}
      </select>
      <Button type="submit" variant="primary" size="sm" className="h-8" busy={copy.isPending}>
        Copy into my workspace
      </Button>
      {copy.isError && (
        <span role="alert" className="text-sm text-danger">
          {copy.error.message}
        </span>
      )}
    </form>
  );
}

/**
 * The body of a shared page: says once that it is read-only and where it comes from, shows the
 * object, and offers a copy to signed-in engineers. A withdrawn or expired link gets a plain page.
 */
export function SharedView({ token, memberships, renderSetup, renderOther }: SharedViewProps) {
  const shared = useShared(token);
  if (shared.isPending) return <Loading what="the shared page" />;
  if (shared.isError) {
    const gone = shared.error.code === 'gone';
    return (
      <div className="mx-auto max-w-xl py-10">
        <h1 className="text-xl font-semibold">{gone ? 'This link no longer works' : shared.error.code === 'not_found' ? 'This link does not lead anywhere' : 'The shared page did not load'}</h1>
        <p className="mt-2 text-ink-soft">{shared.error.message}</p>
      </div>
    );
  }
  const view = shared.data;
  if (view.objectType !== 'setup_revision') return <>{renderOther(view, <CopyBox token={token} memberships={memberships} what="study" />)}</>;
  return (
    <>
      <div role="note" aria-label="Read-only" className="mb-5 rounded border border-rule bg-paper-sunk px-3 py-2 text-sm text-ink-soft">
        Read-only: shared from <strong className="font-semibold text-ink">{view.workspaceName}</strong> by {view.sharedBy}
        {view.expiresAt && (
          <>
            , until <span className="figures">{formatDateTime(view.expiresAt)}</span>
          </>
        )}
        . Nothing here can be changed.
      </div>
      <header className="mb-5 flex flex-wrap items-end justify-between gap-4 border-b border-rule pb-3">
        <div>
          <p className="text-xs font-medium tracking-wide text-ink-faint uppercase">Corner setup · revision {view.revision.number}</p>
          <h1 className="text-xl font-semibold">{view.setupName}</h1>
          <p className="mt-0.5 text-sm text-ink-soft">
            “{view.revision.message}” — {view.revision.authorName}, <span className="figures">{formatDateTime(view.revision.createdAt)}</span>
          </p>
        </div>
        <CopyBox token={token} memberships={memberships} what="setup" />
      </header>
      {renderSetup(view)}
    </>
  );
}

