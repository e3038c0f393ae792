import { useEffect } from 'react';
import { Outlet, useParams } from 'react-router';
import { ReadOnlyBanner } from '../../components/ui/read-only-banner.tsx';
import { Loading } from '../../components/ui/spinner.tsx';
import { Notice } from '../../components/ui/notice.tsx';
import { useWorkspaceInfo } from '../../features/workspaces/api/get-workspace.ts';
import { rememberWorkspace } from '../../features/workspaces/last-workspace.ts';
import { WorkspaceProvider } from '../../lib/workspace-context.tsx';
import { NotFoundRoute } from '../routes/not-found.tsx';
import { PageBody } from './app-shell.tsx';

/** `/w/:workspaceId`: checks membership, states the role, and gives pages the workspace. */
export function WorkspaceLayout() {
  const { workspaceId = '' } = useParams();
  const info = useWorkspaceInfo(workspaceId);

  useEffect(() => {
    if (info.data) rememberWorkspace(info.data.id);
  }, [info.data]);

  if (info.isPending) {
    return (
      <PageBody>
        <Loading what="workspace" />
      </PageBody>
    );
  }
  if (info.isError) {
    if (info.error.code === 'not_found' || info.error.code === 'forbidden') return <NotFoundRoute inShell />;
    return (
      <PageBody>
        <Notice tone="danger" title="This workspace did not load">
          {info.error.message}
        </Notice>
      </PageBody>
    );
  }

  const workspace = info.data;
  return (
    <WorkspaceProvider workspace={workspace}>
      <div className="flex items-center justify-between gap-4 border-b border-rule bg-paper-raised/70 px-5 py-2 text-sm lg:px-8">
        <span className="truncate font-medium text-ink">{workspace.name}</span>
        <span className="shrink-0 text-ink-soft">
          Your role: <strong className="font-semibold text-ink">{workspace.role}</strong>
        </span>
      </div>
      {workspace.role === 'viewer' && <ReadOnlyBanner />}
      <PageBody>
        <Outlet />
      </PageBody>
    </WorkspaceProvider>
  );
}
