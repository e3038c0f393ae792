import { NavLink, Link } from 'react-router';
import type { Me } from '../../../shared/schemas/account.ts';
import { hasRole } from '../../../shared/schemas/workspace.ts';
import { WorkspaceSwitcher } from '../../features/workspaces/components/workspace-switcher.tsx';
import { Wordmark } from '../brand.tsx';
import { navEntries } from '../sections.ts';

const itemClass = ({ isActive }: { isActive: boolean }) =>
  `flex h-8 items-center rounded px-2.5 text-sm transition-colors ${
    isActive ? 'bg-paper-raised font-semibold text-ink shadow-[inset_3px_0_0_var(--color-accent)]' : 'text-ink-soft hover:bg-paper-raised/60 hover:text-ink'
  }`;

export interface RailProps {
  me: Me;
  /** Workspace in the URL, or the one last used when the page is outside any workspace. */
  workspaceId?: string;
  inWorkspace: boolean;
  showOutbox: boolean;
  onSignOut: () => void;
  signingOut: boolean;
}

/** The slim left rail: where you are, the sections you may open, and who you are. */
export function Rail({ me, workspaceId, inWorkspace, showOutbox, onSignOut, signingOut }: RailProps) {
  const membership = me.memberships.find((m) => m.workspaceId === workspaceId);
  const entries = membership ? navEntries.filter((e) => !e.minRole || hasRole(membership.role, e.minRole)) : [];

  return (
    <aside className="flex flex-col border-rule bg-paper-sunk md:sticky md:top-0 md:h-screen md:w-52 md:shrink-0 md:border-r lg:w-56">
      <div className="px-4 pt-4 pb-3">
        <Link to={workspaceId ? `/w/${workspaceId}` : '/'} className="inline-block rounded-sm">
          <Wordmark />
        </Link>
      </div>
      <div className="px-3 pb-3">
        <p className="mb-1 px-1 text-2xs font-medium tracking-wider text-ink-faint uppercase">Workspace</p>
        <WorkspaceSwitcher memberships={me.memberships} currentId={inWorkspace ? workspaceId : undefined} />
      </div>
      <nav aria-label="Sections" className="flex-1 overflow-y-auto px-3">
        <ul className="flex flex-row flex-wrap gap-0.5 md:flex-col">
          {workspaceId && membership && (
            <li>
              <NavLink to={`/w/${workspaceId}`} end className={itemClass}>
                Overview
              </NavLink>
            </li>
          )}
          {entries.map((entry) => (
            <li key={entry.path}>
              <NavLink to={`/w/${workspaceId}/${entry.path}`} className={itemClass}>
                {entry.label}
              </NavLink>
            </li>
          ))}
        </ul>
      </nav>
      <div className="border-t border-rule px-3 py-3">
        <p className="truncate px-1 text-sm font-medium text-ink">{me.user.name}</p>
        <p className="mb-2 truncate px-1 text-xs text-ink-faint">{me.user.email}</p>
        <ul className="flex flex-row flex-wrap gap-0.5 md:flex-col">
          <li>
            <NavLink to="/account" className={itemClass}>
              Account
            </NavLink>
          </li>
          {showOutbox && (
            <li>
              <NavLink to="/outbox" className={itemClass}>
                Outbox
              </NavLink>
            </li>
          )}
          <li>
            <button type="button" onClick={onSignOut} disabled={signingOut} className={`${itemClass({ isActive: false })} w-full text-left`}>
              {signingOut ? 'Signing out…' : 'Sign out'}
            </button>
          </li>
        </ul>
      </div>
    </aside>
  );
}
