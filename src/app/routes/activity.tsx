import { Button } from '../../components/ui/button.tsx';
import { EmptyState } from '../../components/ui/empty-state.tsx';
import { Notice } from '../../components/ui/notice.tsx';
import { PageHeader } from '../../components/ui/page-header.tsx';
import { QueryGuard } from '../../components/ui/query-guard.tsx';
import { useAudit } from '../../features/activity/api/get-audit.ts';
import { AuditTable } from '../../features/activity/components/audit-table.tsx';
import { useWorkspace } from '../../lib/workspace-context.tsx';

export function ActivityRoute() {
  const workspace = useWorkspace();
  const audit = useAudit(workspace.id);

  const body = !workspace.can('admin') ? (
    <Notice>Only admins can read the activity log of a workspace.</Notice>
  ) : (
    <QueryGuard query={audit} what="activity">
      {(data) => {
        const entries = data.pages.flatMap((p) => p.entries);
        return entries.length === 0 ? (
          <EmptyState title="No changes recorded yet" />
        ) : (
          <>
            <AuditTable entries={entries} />
            <div className="mt-3 flex items-center gap-3 text-sm text-ink-faint">
              <span>
                <span className="figures text-ink-soft">{entries.length}</span> {entries.length === 1 ? 'entry' : 'entries'} shown
              </span>
              {audit.hasNextPage && (
                <Button size="sm" busy={audit.isFetchingNextPage} onClick={() => void audit.fetchNextPage()}>
                  Show older
                </Button>
              )}
            </div>
          </>
        );
      }}
    </QueryGuard>
  );

  return (
    <>
      <PageHeader title="Activity" detail="Every change made in this workspace: who made it, what it was, and when." />
      {body}
    </>
  );
}
