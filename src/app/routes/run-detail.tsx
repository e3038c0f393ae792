import { useMemo } from 'react';
import { Link, useNavigate, useParams } from 'react-router';
import { Button, ButtonLink } from '../../components/ui/button.tsx';
import { Notice } from '../../components/ui/notice.tsx';
import { QueryGuard } from '../../components/ui/query-guard.tsx';
import { PageHeader } from '../../components/ui/page-header.tsx';
import { useDeleteRun } from '../../features/runs/api/delete-run.ts';
import { useSavedRun } from '../../features/runs/api/get-run.ts';
import { ChartExportProvider } from '../../components/charts/export-context.tsx';
import { exportStem } from '../../lib/export-name.ts';
import { ExportButtons, runSubject, runTitle } from '../../features/runs/components/run-actions.tsx';
import { RunDashboard } from '../../features/runs/components/run-dashboard.tsx';
import { viewOfSaved } from '../../features/runs/model/run-view.ts';
import { formatDateTime } from '../../lib/format.ts';
import { useWorkspace } from '../../lib/workspace-context.tsx';
import { NotFoundRoute } from './not-found.tsx';

/** `/w/:workspaceId/runs/:runId`: a saved run, drawn from what was stored (nothing is run again). */
export function RunDetailRoute() {
  const workspace = useWorkspace();
  const { runId = '' } = useParams();
  const navigate = useNavigate();
  const saved = useSavedRun(workspace.id, runId);
  const remove = useDeleteRun(workspace.id);
  const view = useMemo(() => (saved.data ? viewOfSaved(saved.data) : null), [saved.data]);

  return (
    <QueryGuard query={saved} what="the saved run" notFound={<NotFoundRoute inShell />}>
      {(run) => {
        const runAgain = `/w/${workspace.id}/runs?setup=${run.setupId}&rev=${run.revisionNumber}`;

        return (
          <>
            <PageHeader
              eyebrow={
                <Link to={`/w/${workspace.id}/runs`} className="hover:text-ink">
                  Runs
                </Link>
              }
              title={run.name}
              detail={
                <>
                  {view?.ok ? runTitle(view.view, run.revisionNumber) : run.setupName} — saved {formatDateTime(run.createdAt)} by {run.createdBy.name}. Opened from the stored figures and traces; nothing was run again.
                </>
              }
              actions={
                <>
                  {view?.ok && <ExportButtons view={view.view} request={run.request} revision={run.revisionNumber} />}
                  <ButtonLink to={runAgain} size="sm">
                    Run again
                  </ButtonLink>
                  {workspace.can('engineer') && (
                    <Button
                      size="sm"
                      variant="danger"
                      busy={remove.isPending}
                      onClick={() => {
                        if (window.confirm(`Delete the saved run “${run.name}”?`)) remove.mutate(run.id, { onSuccess: () => navigate(`/w/${workspace.id}/runs`) });
                      }}
                    >
                      Delete
                    </Button>
                  )}
                </>
              }
            />
            {run.latestRevision > run.revisionNumber && (
              <Notice tone="signal" className="mb-4" title={`From revision ${run.revisionNumber}; the setup is now at r${run.latestRevision}.`}>
                These figures belong to the older revision. <Link className="underline" to={`/w/${workspace.id}/runs?setup=${run.setupId}&rev=${run.latestRevision}`}>Run the latest revision</Link> on the same road to see where it stands now.
              </Notice>
            )}
            {view && !view.ok && <Notice tone="danger">{view.reason}</Notice>}
            {view?.ok && (
              <>
                {view.view.thinned === 'bucket-extremes' && (
                  <p className="mb-3 text-xs text-ink-faint">
                    Traces are stored thinned to {run.traces.length} points per column (each time bucket keeps its lowest and highest value), from {run.traces.fullLength} samples. Figures are those of the full run; Traces CSV runs the stored inputs again in this browser to give every sample, evenly spaced.
                  </p>
                )}
                <ChartExportProvider value={{ stem: exportStem(runSubject(view.view, run.revisionNumber)), context: `${runTitle(view.view, run.revisionNumber)} · run saved ${formatDateTime(run.createdAt)}` }}>
                  <RunDashboard view={view.view} />
                </ChartExportProvider>
              </>
            )}
          </>
        );
      }}
    </QueryGuard>
  );
}
