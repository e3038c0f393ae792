import { useLocation, useNavigate } from 'react-router';
import type { Membership } from '../../../../shared/schemas/workspace.ts';

/**
 * Picks the workspace; the id lives in the URL (`/w/:workspaceId/...`), so switching keeps the
 * section you are in when the other workspace has it too.
 */
export function WorkspaceSwitcher({ memberships, currentId }: { memberships: Membership[]; currentId?: string }) {
  const navigate = useNavigate();
  const location = useLocation();
  const current = memberships.find((m) => m.workspaceId === currentId);

  if (memberships.length <= 1) {
    return <p className="truncate text-sm font-semibold text-ink">{current?.workspaceName ?? memberships[0]?.workspaceName}</p>;
  }

  const go = (id: string) => {
    const prefix = currentId ? `/w/${currentId}/` : null;
    const section = prefix && location.pathname.startsWith(prefix) ? location.pathname.slice(prefix.length).split('/')[0] : '';
    navigate(section ? `/w/${id}/${section}` : `/w/${id}`);
  };

  return (
    <label className="block">
      <span className="sr-only">Workspace</span>
      <select
        value={currentId ?? ''}
        onChange={(e) => go(e.target.value)}
        className="h-8 w-full truncate rounded border border-rule-strong bg-paper-raised px-1.5 text-sm font-semibold text-ink hover:border-ink-faint"
      >
        {!current && <option value="">Choose a workspace…</option>}
        {memberships.map((m) => (
          <option key={m.workspaceId} value={m.workspaceId}>
            {m.workspaceName}
          </option>
        ))}
      </select>
    </label>
  );
}
