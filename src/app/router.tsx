import { createBrowserRouter, Outlet, type RouteObject } from 'react-router';
import { AppShell } from './layouts/app-shell.tsx';
import { RequireSignedIn } from './layouts/require-signed-in.tsx';
import { RouteError } from './layouts/route-error.tsx';
import { WorkspaceLayout } from './layouts/workspace-layout.tsx';
import { AcceptInviteRoute } from './routes/accept-invite.tsx';
import { AccountRoute } from './routes/account.tsx';
import { HomeRedirect } from './routes/home-redirect.tsx';
import { NotFoundRoute } from './routes/not-found.tsx';
import { ConfirmAddressRoute } from './routes/confirm-address.tsx';
import { OutboxRoute } from './routes/outbox.tsx';
import { ResetConfirmRoute } from './routes/reset-confirm.tsx';
import { ResetRequestRoute } from './routes/reset-request.tsx';
import { SignInRoute } from './routes/sign-in.tsx';
import { SignUpRoute } from './routes/sign-up.tsx';
import { WorkspaceHomeRoute } from './routes/workspace-home.tsx';
import { sections } from './sections.ts';

/** The route tree. Features add routes through `src/app/sections/*.tsx`, not here. */
export const routes: RouteObject[] = [
  {
    element: <Outlet />,
    errorElement: <RouteError />,
    children: [
      { path: 'signin', element: <SignInRoute /> },
      { path: 'signup', element: <SignUpRoute /> },
      { path: 'reset', element: <ResetRequestRoute /> },
      { path: 'reset/:token', element: <ResetConfirmRoute /> },
      { path: 'invite/:token', element: <AcceptInviteRoute /> },
      { path: 'confirm/:token', element: <ConfirmAddressRoute /> },
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
              { path: 'account', element: <AccountRoute /> },
              { path: 'outbox', element: <OutboxRoute /> },
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
