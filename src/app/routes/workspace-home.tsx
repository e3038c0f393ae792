import { Link } from 'react-router';
import { hasRole } from '../../../shared/schemas/workspace.ts';
import { PageHeader, Section } from '../../components/ui/page-header.tsx';
import { Loading } from '../../components/ui/spinner.tsx';
import { Tag } from '../../components/ui/tag.tsx';
import { useAudit } from '../../features/activity/api/get-audit.ts';
import { useMembers } from '../../features/team/api/get-members.ts';
import { roleWords, withArticle } from '../../features/team/components/role-words.ts';
import { formatDateTime } from '../../lib/format.ts';
import { useWorkspace } from '../../lib/workspace-context.tsx';
import { navEntries } from '../sections.ts';

function People({ workspaceId }: { workspaceId: string }) {
  const members = useMembers(workspaceId);
  if (!members.data) return <Loading what="members" />;
  return (
    <ul className="divide-y divide-rule/80 rounded border border-rule bg-paper-raised">
      {members.data.members.map((m) => (
        <li key={m.userId} className="flex items-center justify-between gap-3 px-3 py-1.5 text-sm">
          <span className="truncate">{m.name}</span>
          <Tag tone={m.role === 'admin' ? 'accent' : 'plain'}>{m.role}</Tag>
        </li>
      ))}
    </ul>
  );
}

function LatestChanges({ workspaceId }: { workspaceId: string }) {
  const audit = useAudit(workspaceId);
  const entries = audit.data?.pages[0]?.entries.slice(0, 6);
  if (!entries) return <Loading what="activity" />;
  if (entries.length === 0) return <p className="text-sm text-ink-faint">Nothing has changed yet.</p>;
  return (
    <ol className="flex flex-col gap-2">
      {entries.map((e) => (
        <li key={e.id} className="text-sm">
          <span className="text-ink">{e.summary}</span>
          <span className="figures block text-xs text-ink-faint">
            {e.actor.name} · {formatDateTime(e.at)}
          </span>
        </li>
      ))}
    </ol>
  );
}

export function WorkspaceHomeRoute() {
  const workspace = useWorkspace();
  const open = navEntries.filter((e) => !e.minRole || hasRole(workspace.role, e.minRole));

  return (
    <>
      <PageHeader title="Overview" detail={`You are ${withArticle(workspace.role)} here. ${roleWords[workspace.role]}`} />
      <div className="grid grid-cols-1 gap-x-8 lg:grid-cols-[2fr_1fr]">
        <Section title="On this bench">
          <ul className="grid grid-cols-1 gap-3 sm:grid-cols-2">
            {open.map((entry) => (
              <li key={entry.path}>
                <Link
                  to={`/w/${workspace.id}/${entry.path}`}
                  className="group block h-full rounded border border-rule bg-paper-raised px-4 py-3 transition-colors hover:border-accent/50 hover:bg-white"
                >
                  <span className="font-semibold text-ink group-hover:text-accent">{entry.label}</span>
                  {entry.blurb && <span className="mt-0.5 block text-sm text-ink-soft">{entry.blurb}</span>}
                </Link>
              </li>
            ))}
          </ul>
        </Section>
        <div>
          <Section title="People">
            <People workspaceId={workspace.id} />
          </Section>
          {workspace.can('admin') && (
            <Section title="Latest changes">
              <LatestChanges workspaceId={workspace.id} />
            </Section>
          )}
        </div>
      </div>
    </>
  );
}
