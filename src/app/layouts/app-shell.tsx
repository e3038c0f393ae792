import { Outlet, useMatch, useNavigate } from 'react-router';
import { useConfig } from '../../features/auth/api/get-config.ts';
import { useMe } from '../../features/auth/api/get-me.ts';
import { useSignOut } from '../../features/auth/api/sign-out.ts';
import { lastWorkspace } from '../../features/workspaces/last-workspace.ts';
import { Rail } from './rail.tsx';

/** The signed-in frame: rail on the left, the page on the right. */
export function AppShell() {
  const me = useMe().data;
  const config = useConfig().data;
  const signOut = useSignOut();
  const navigate = useNavigate();
  const match = useMatch('/w/:workspaceId/*');
  if (!me) return null;

  const inWorkspace = Boolean(match?.params.workspaceId);
  const remembered = lastWorkspace();
  const fallback = me.memberships.find((m) => m.workspaceId === remembered) ?? me.memberships[0];
  const workspaceId = match?.params.workspaceId ?? fallback?.workspaceId;
  // the outbox exists only while the local mail sink runs, which demo mode implies
  const showOutbox = Boolean(config?.demoMode) && me.memberships.some((m) => m.role === 'admin');

  return (
    <div className="flex min-h-screen flex-col md:flex-row">
      <Rail
        me={me}
        workspaceId={workspaceId}
        inWorkspace={inWorkspace}
        showOutbox={showOutbox}
        signingOut={signOut.isPending}
        onSignOut={() => signOut.mutate(undefined, { onSettled: () => navigate('/signin', { replace: true }) })}
      />
      <main className="min-w-0 flex-1">
        <Outlet />
      </main>
    </div>
  );
}

/** Page body width and padding, shared by every page inside the shell. */
export function PageBody({ children }: { children: React.ReactNode }) {
  return <div className="mx-auto w-full max-w-6xl px-5 py-6 lg:px-8">{children}</div>;
}
