import { createBrowserRouter, Navigate, type RouteObject } from 'react-router-dom';
import { RouteErrorBoundary } from './components/error-view';
import { PageSkeleton } from './components/skeleton';
import { requireSession, redirectIfSignedIn } from './routes/guards';

/**
 * Every screen is its own chunk, loaded when its route is first matched
 * (React Router's `lazy`): the sign-in page loads neither the signed-in
 * screens nor the engine, and the workbench brings @hoopline/calc with it.
 * Loaders stay here (guards.ts is small), so a redirect never waits for a
 * screen's code. `pnpm --filter @hoopline/web check:bundle` (run by
 * scripts/test.sh) keeps the sign-in page's first script within its budget.
 */

/** Shown while the first route's code and loader resolve (React Router's HydrateFallback). */
function FirstLoad() {
  return (
    <main className="mx-auto max-w-5xl p-6">
      <PageSkeleton label="Loading Hoopline" />
    </main>
  );
}

export const routes: RouteObject[] = [
  {
    errorElement: <RouteErrorBoundary />,
    HydrateFallback: FirstLoad,
    children: [
      {
        path: '/sign-in',
        loader: redirectIfSignedIn,
        lazy: () => import('./routes/sign-in').then((m) => ({ Component: m.SignInRoute })),
      },
      {
        path: '/invitation/:token',
        lazy: () =>
          import('./routes/accept-invitation').then((m) => ({
            Component: m.AcceptInvitationRoute,
          })),
      },
      {
        path: '/reset-password',
        lazy: () =>
          import('./routes/reset-password').then((m) => ({ Component: m.RequestResetRoute })),
      },
      {
        path: '/reset-password/:token',
        lazy: () =>
          import('./routes/reset-password').then((m) => ({ Component: m.CompleteResetRoute })),
      },
      // Public: what a sheet's QR code opens; no sign-in, no app navigation.
      {
        path: '/verify',
        lazy: () => import('./routes/verify').then((m) => ({ Component: m.VerifyRoute })),
      },
      {
        path: '/verify/:code',
        lazy: () => import('./routes/verify').then((m) => ({ Component: m.VerifyRoute })),
      },
      {
        path: '/',
        id: 'session',
        loader: requireSession,
        lazy: () => import('./routes/app-layout').then((m) => ({ Component: m.AppLayout })),
        errorElement: <RouteErrorBoundary />,
        children: [
          {
            errorElement: <RouteErrorBoundary />,
            children: [
              { index: true, element: <Navigate to="/projects" replace /> },
              {
                path: 'projects',
                lazy: () =>
                  import('./routes/projects').then((m) => ({ Component: m.ProjectsRoute })),
              },
              {
                path: 'projects/new',
                lazy: () =>
                  import('./routes/project-new').then((m) => ({ Component: m.NewProjectRoute })),
              },
              {
                path: 'projects/:projectId',
                lazy: () => import('./routes/project').then((m) => ({ Component: m.ProjectRoute })),
              },
              {
                path: 'projects/:projectId/settings',
                lazy: () =>
                  import('./routes/project-settings').then((m) => ({
                    Component: m.ProjectSettingsRoute,
                  })),
              },
              {
                path: 'projects/:projectId/members',
                lazy: () =>
                  import('./routes/project-members').then((m) => ({
                    Component: m.ProjectMembersRoute,
                  })),
              },
              {
                path: 'projects/:projectId/components/new',
                lazy: () =>
                  import('./routes/component-new').then((m) => ({
                    Component: m.NewComponentRoute,
                  })),
              },
              {
                path: 'components/:componentId',
                lazy: () =>
                  import('./routes/component').then((m) => ({ Component: m.ComponentRoute })),
              },
              {
                path: 'components/:componentId/revisions',
                lazy: () =>
                  import('./routes/revisions').then((m) => ({ Component: m.RevisionsRoute })),
              },
              {
                path: 'components/:componentId/compare',
                lazy: () => import('./routes/compare').then((m) => ({ Component: m.CompareRoute })),
              },
              {
                path: 'revisions/:revisionId',
                lazy: () =>
                  import('./routes/revision').then((m) => ({ Component: m.RevisionRoute })),
              },
              {
                path: 'check-queue',
                lazy: () =>
                  import('./routes/check-queue').then((m) => ({ Component: m.CheckQueueRoute })),
              },
              {
                path: 'returned',
                lazy: () =>
                  import('./routes/returned').then((m) => ({ Component: m.ReturnedRoute })),
              },
              {
                path: 'issued',
                lazy: () => import('./routes/issued').then((m) => ({ Component: m.IssuedRoute })),
              },
              {
                path: 'people',
                lazy: () => import('./routes/people').then((m) => ({ Component: m.PeopleRoute })),
              },
              {
                path: 'audit-log',
                lazy: () =>
                  import('./routes/audit-log').then((m) => ({ Component: m.AuditLogRoute })),
              },
              {
                path: 'account',
                lazy: () => import('./routes/account').then((m) => ({ Component: m.AccountRoute })),
              },
              {
                path: '*',
                lazy: () =>
                  import('./routes/not-found').then((m) => ({ Component: m.NotFoundRoute })),
              },
            ],
          },
        ],
      },
    ],
  },
];

export const router = createBrowserRouter(routes);
