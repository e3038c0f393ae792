import { Link } from 'react-router';
import { EmptyState } from '../../../components/ui/empty-state.tsx';
import { Notice } from '../../../components/ui/notice.tsx';
import { Loading } from '../../../components/ui/spinner.tsx';
import { useDeleteRun } from '../api/delete-run.ts';
import { useRuns } from '../api/get-runs.ts';
import { SavedRunsTable } from './saved-runs-table.tsx';

/**
 * Saved runs of the workspace, or of one setup (`setupId`), with delete for engineers. A page
 * that shows one setup (the corner bench) can mount it with that setup's id.
 */
export function SetupRunsList({ workspaceId, setupId, canDelete }: { workspaceId: string; setupId?: string; canDelete: boolean }) {
  const runs = useRuns(workspaceId, setupId);
  const remove = useDeleteRun(workspaceId);
  if (runs.isPending) return <Loading what="saved runs" />;
  if (runs.isError) return <Notice tone="danger">{runs.error.message}</Notice>;
  if (runs.data.runs.length === 0) {
    return (
      <EmptyState
        title={setupId ? 'No saved runs of this setup yet' : 'No saved runs yet'}
        action={
          setupId ? (
            <Link className="text-sm font-medium text-accent underline" to={`/w/${workspaceId}/runs?setup=${setupId}`}>
              Run this setup
            </Link>
          ) : undefined
        }
      >
        A saved run keeps its inputs, figures and traces, so it opens again without running.
      </EmptyState>
    );
  }
  return (
    <SavedRunsTable
      workspaceId={workspaceId}
      runs={runs.data.runs}
      canDelete={canDelete}
      deleting={remove.isPending ? remove.variables : undefined}
      onDelete={(run) => {
        if (window.confirm(`Delete the saved run “${run.name}”? Its figures and traces go with it.`)) remove.mutate(run.id);
      }}
    />
  );
}
