import { createBrowserRouter, Outlet, type RouteObject } from 'react-router';
import { PageLoading } from './layouts/page-loading.tsx';
import { AppShell } from './layouts/app-shell.tsx';
import { RequireSignedIn } from './layouts/require-signed-in.tsx';
import { RouteError } from './layouts/route-error.tsx';
import { WorkspaceLayout } from './layouts/workspace-layout.tsx';
import { HomeRedirect } from './routes/home-redirect.tsx';
import { NotFoundRoute } from './routes/not-found.tsx';
import { WorkspaceHomeRoute } from './routes/workspace-home.tsx';
import { sections } from './sections.ts';

/**
 * The route tree. Features add routes through `src/app/sections/*.tsx`, not here. Pages load
 * with React Router's `lazy`, one chunk per page, so the first page brings only the shell, the
 * sign-in form and the workspace overview; a page's chunk loads while the previous page stays up.
 */
export const routes: RouteObject[] = [
  {
    element: <Outlet />,
    errorElement: <RouteError />,
    // shown while the first page's chunk loads
    HydrateFallback: PageLoading,
    children: [
      { path: 'signin', lazy: async () => ({ Component: (await import('./routes/sign-in.tsx')).SignInRoute }) },
      { path: 'signup', lazy: async () => ({ Component: (await import('./routes/sign-up.tsx')).SignUpRoute }) },
      { path: 'reset', lazy: async () => ({ Component: (await import('./routes/reset-request.tsx')).ResetRequestRoute }) },
      { path: 'reset/:token', lazy: async () => ({ Component: (await import('./routes/reset-confirm.tsx')).ResetConfirmRoute }) },
      { path: 'invite/:token', lazy: async () => ({ Component: (await import('./routes/accept-invite.tsx')).AcceptInviteRoute }) },
      { path: 'confirm/:token', lazy: async () => ({ Component: (await import('./routes/confirm-address.tsx')).ConfirmAddressRoute }) },
      ...sections.flatMap((s) => s.publicRoutes ?? []),
      {
        element: <RequireSignedIn />,
        children: [
          { index: true, element: <HomeRedirect /> },
          {
            element: <AppShell />,
            children: [
              {
                path: 'w/:workspaceId',
                element: <WorkspaceLayout />,
                children: [
                  { index: true, element: <WorkspaceHomeRoute /> },
                  ...sections.flatMap((s) => s.workspaceRoutes ?? []),
                  { path: '*', element: <NotFoundRoute inShell /> },
                ],
              },
              { path: 'account', lazy: async () => ({ Component: (await import('./routes/account.tsx')).AccountRoute }) },
              { path: 'outbox', lazy: async () => ({ Component: (await import('./routes/outbox.tsx')).OutboxRoute }) },
              ...sections.flatMap((s) => s.signedInRoutes ?? []),
            ],
          },
        ],
      },
      { path: '*', element: <NotFoundRoute /> },
    ],
  },
];

export const createRouter = () => createBrowserRouter(routes);
